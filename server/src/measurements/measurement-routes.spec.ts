import request from 'supertest';
import { Measurement } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let url = '';
let report: { principal: { moments: number[] }; trade: { swingweight: number | null } };

beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t.app);
  const base = `/api/v1/workspaces/${owner.workspace.id}`;
  const project = await request(t.app).post(`${base}/projects`).set(bearer(owner.accessToken)).send({ name: 'Rig', category: 'bat' }).expect(201);
  const part = await request(t.app).post(`${base}/projects/${project.body.id}/parts`).set(bearer(owner.accessToken)).send({ name: 'Bar' }).expect(201);
  // A bar 0.8 m long, 0.03 m square, 700 kg/m³, grip at its end along z.
  const doc = {
    primitives: [{ id: 'bar', shape: 'box', size: [0.03, 0.03, 0.8], position: [0, 0, 0.4], density: 700 }],
    spin: { axis: [1, 0, 0], rate: 10 }, grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
  };
  const v = await request(t.app).post(`${base}/parts/${part.body.id}/variants`).set(bearer(owner.accessToken)).send({ document: doc }).expect(201);
  report = v.body.report;
  url = `${base}/variants/${v.body.id}/measurements`;
});
afterAll(async () => { await t.close(); });

it('imports a CSV, converts units through mathjs and shows predicted against measured', async () => {
  const I1 = report.principal.moments[0];
  const inGcm2 = I1 * 1e7 * 1.02; // 2 % above the prediction, written in g·cm² (1 kg·m² = 10⁷ g·cm²)
  const csv = `axis,value,unit,method\nmajor,${inGcm2},g·cm²,compound pendulum\nswing,${report.trade.swingweight},kg*m^2,compound pendulum\nend-over-end (rig B),0.0123,kg·m²,trifilar pendulum\n`;
  const res = await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send(csv).expect(201);
  expect(res.body).toHaveLength(3);
  expect(res.body[0].value).toBeCloseTo(I1 * 1.02, 12);
  expect(res.body[0].differencePercent).toBeCloseTo(2, 9);
  expect(res.body[1].differencePercent).toBeCloseTo(0, 9);
  expect(res.body[2]).toMatchObject({ predicted: null, differencePercent: null, enteredUnit: 'kg·m²' });
  const list = await request(t.app).get(url).set(bearer(owner.accessToken)).expect(200);
  expect(list.body).toHaveLength(3);
});

it('reports bad rows by line number and imports nothing', async () => {
  const before = await Measurement.count();
  const csv = 'axis,value,unit,method\nmajor,0.01,kg·m²,pendulum\nminor,-3,kg·m²,pendulum\n,0.2,furlongs,\nswing,abc,g·cm²,rig\n';
  const res = await request(t.app).post(url).set(bearer(owner.accessToken)).attach('file', Buffer.from(csv), 'rig.csv').expect(400);
  expect(res.body.error.field).toBe('file');
  expect(res.body.error.message).toMatch(/line 3: value "-3" must be a positive number/);
  expect(res.body.error.message).toMatch(/line 4: axis must be/);
  expect(res.body.error.message).toMatch(/line 4: unit "furlongs"/);
  expect(res.body.error.message).toMatch(/line 5: value "abc"/);
  expect(res.body.error.message).not.toMatch(/line 2/);
  expect(await Measurement.count()).toBe(before);
});

it('refuses a wrong header, an empty file and a missing file', async () => {
  expect((await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send('a,b,c,d\n1,2,3,4\n').expect(400)).body.error.message).toMatch(/line 1: the header must be axis,value,unit,method/);
  expect((await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send('').expect(400)).body.error.message).toMatch(/empty|required/);
  await request(t.app).post(url).set(bearer(owner.accessToken)).send({}).expect(400);
});
