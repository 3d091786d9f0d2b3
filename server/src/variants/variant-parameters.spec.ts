import request from 'supertest';
import { partDocumentSchema } from '@tumblewise/shared';
import { Variant } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let designer: Awaited<ReturnType<typeof signUp>>;
let base = '';

beforeAll(async () => {
  t = await startTestApp();
  designer = await signUp(t.app);
  base = `/api/v1/workspaces/${designer.workspace.id}`;
});
afterAll(async () => {
  await t.close();
});

const RHO = 2700;
// Two invented bars of a Kestrel Bay practice frame whose length is one named parameter.
const frame = (length: number) => ({
  name: 'Kestrel Bay frame',
  parameters: { barLength: length },
  primitives: [
    { id: 'left', shape: 'box', size: [0.02, 0.03, { param: 'barLength' }], density: RHO, position: [-0.1, 0, 0] },
    { id: 'right', shape: 'box', size: [0.04, 0.01, { param: 'barLength' }], density: RHO, position: [0.1, 0, 0] },
  ],
  spin: { axis: [0, 0, 1], rate: 20 },
});
/** Rectangular prism m = ρ·a·b·c for each bar (Machinery's Handbook, volumes of solids). */
const massOf = (length: number) => RHO * (0.02 * 0.03 + 0.04 * 0.01) * length;

async function newPart(): Promise<string> {
  const project = await request(t.app)
    .post(`${base}/projects`)
    .set(bearer(designer.accessToken))
    .send({ name: 'Frame project', category: 'other' })
    .expect(201);
  const part = await request(t.app)
    .post(`${base}/projects/${project.body.id}/parts`)
    .set(bearer(designer.accessToken))
    .send({ name: 'Frame', draft: frame(0.3) })
    .expect(201);
  return part.body.id as string;
}

describe('part documents with named parameters', () => {
  it('saves a variant as sent and analyses it with the references resolved; the validated form saves too', async () => {
    const partId = await newPart();
    const saved = await request(t.app)
      .post(`${base}/parts/${partId}/variants`)
      .set(bearer(designer.accessToken))
      .send({ label: 'L 300', document: frame(0.3) })
      .expect(201);
    expect(saved.body.document).toEqual(frame(0.3));
    expect(saved.body.report.mass).toBeCloseTo(massOf(0.3), 12);
    const loaded = await request(t.app).get(`${base}/variants/${saved.body.id}`).set(bearer(designer.accessToken)).expect(200);
    expect(loaded.body.document).toEqual(frame(0.3));
    // The engine's validated form (numbers plus refs) is accepted as it is and gives the same report.
    const validated = partDocumentSchema.parse(frame(0.45));
    const again = await request(t.app)
      .post(`${base}/parts/${partId}/variants`)
      .set(bearer(designer.accessToken))
      .send({ label: 'L 450', document: JSON.parse(JSON.stringify(validated)) })
      .expect(201);
    expect(again.body.report.mass).toBeCloseTo(massOf(0.45), 12);
  });

  it('refuses an unknown parameter and a reference that breaks its field’s rule, naming the field and saving nothing', async () => {
    const partId = await newPart();
    const unknown = frame(0.3) as { primitives: Record<string, unknown>[] };
    unknown.primitives.push({ id: 'hoop', shape: 'torus', majorRadius: { param: 'hoopRadius' }, minorRadius: 0.01, density: 1000 });
    const res = await request(t.app)
      .post(`${base}/parts/${partId}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: unknown })
      .expect(400);
    expect(res.body.error.field).toBe('primitives[2].majorRadius');
    expect(res.body.error.message).toMatch(/refers to an unknown parameter "hoopRadius"/);
    const negative = await request(t.app)
      .post(`${base}/parts/${partId}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: frame(-0.3) })
      .expect(400);
    expect(negative.body.error.field).toBe('primitives[0].size[2]');
    expect(negative.body.error.message).toMatch(/must be greater than zero/);
    expect(await Variant.count({ where: { partId } })).toBe(0);
  });

  it('analyses a document with parameters live, and answers 400 naming the field of a broken reference', async () => {
    const live = await request(t.app).post('/api/v1/analyze').set(bearer(designer.accessToken)).send(frame(0.2)).expect(200);
    expect(live.body.mass).toBeCloseTo(massOf(0.2), 12);
    const broken = { ...frame(0.2), parameters: { barLength: 0.2, '1st': 3 } };
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(designer.accessToken)).send(broken).expect(400);
    expect(res.body.error.field).toBe('parameters.1st');
  });

  it('describes parameters and references in the OpenAPI document', async () => {
    const res = await request(t.app).get('/api/v1/openapi.json').expect(200);
    const schema = res.body.paths['/api/v1/analyze'].post.requestBody.content['application/json'].schema;
    expect(schema.properties.parameters).toMatchObject({ type: 'object', additionalProperties: { type: 'number' } });
    const torus = schema.properties.primitives.items.oneOf.find(
      (s: { properties: { shape: { enum?: string[] } } }) => s.properties.shape.enum?.[0] === 'torus',
    );
    expect(torus.properties.majorRadius.anyOf.map((s: { type: string }) => s.type)).toEqual(['number', 'object']);
  });
});
