import { Measurement, Part, ReviewEntry, User, Variant } from '../models/init-models';
import { startTestApp, type TestApp } from '../test-support/test-app';
import { DEMO_USERS, seedDemo } from './demo-seed';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

it('seeds the invented demo workspace once: members of each role, designs, a review in progress, rig data', async () => {
  expect(await seedDemo(t.ctx)).toBe(true);
  expect(await seedDemo(t.ctx)).toBe(false);
  expect(await User.count({ where: { email: DEMO_USERS.map((u) => u.email) } })).toBe(DEMO_USERS.length);
  const frame = await Part.findOne({ where: { name: 'Frame' } });
  const variants = await Variant.findAll({ where: { partId: frame!.id }, order: [['number', 'ASC']] });
  const verdicts = variants.map((v) => (v.report as { spin: { verdict: string } }).spin.verdict);
  expect(verdicts[0]).toBe('flip-prone'); // flip-prone on purpose
  expect(verdicts[1]).toBe('steady'); // and the fixed one
  expect(variants[1].status).toBe('in_review');
  expect(await ReviewEntry.count({ where: { variantId: variants[1].id } })).toBe(2);
  expect(await Measurement.count({ where: { variantId: variants[1].id } })).toBe(2);
  expect(await Part.count()).toBe(4);
  for (const v of await Variant.findAll()) {
    expect(JSON.stringify(v.report)).not.toMatch(/NaN|Infinity/);
  }
});
