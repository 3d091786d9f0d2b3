import request from 'supertest';
import { analyzePart } from '@tumblewise/engine';
import racket from '../../../shared/src/engine/examples/junior-racket.json';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let token = '';
beforeAll(async () => {
  t = await startTestApp();
  token = (await signUp(t.app)).accessToken;
});
afterAll(async () => { await t.close(); });

describe('POST /analyze', () => {
  it('needs a signed-in user', async () => {
    await request(t.app).post('/api/v1/analyze').send(racket).expect(401);
  });

  it('answers the engine’s own spin report, computed on a worker thread', async () => {
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(racket).expect(200);
    // The API adds nothing and loses nothing: the same report as the engine called in-process.
    expect(res.body).toEqual(JSON.parse(JSON.stringify(analyzePart(racket))));
    expect(res.body).toMatchObject({ mass: expect.any(Number), principal: { moments: expect.any(Array) }, spin: { verdict: expect.stringMatching(/^(steady|watch|flip-prone)$/) } });
  });

  it('refuses a bad document with 400 naming the field by its JSON path', async () => {
    const bad = structuredClone(racket) as { primitives: { radius?: number; shape: string }[] };
    const first = bad.primitives.findIndex((p) => p.radius !== undefined);
    bad.primitives[first].radius = -0.01;
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(bad).expect(400);
    expect(res.body.error.field).toBe(`primitives[${first}].radius`);
    const unknownShape = structuredClone(racket) as { primitives: { shape: string }[] };
    unknownShape.primitives[0].shape = 'banana';
    expect((await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(unknownShape).expect(400)).body.error.field).toMatch(/^primitives\[0\]/);
    expect((await request(t.app).post('/api/v1/analyze').set(bearer(token)).send({}).expect(400)).body.error.code).toBe('invalid_input');
  });

  it('answers 422 for a well-formed part that cannot be analysed (a removal larger than the solid)', async () => {
    const part = {
      name: 'Hollowed to nothing',
      primitives: [
        { id: 'solid', shape: 'cylinder', radius: 0.01, length: 0.1, position: [0, 0, 0], density: 700, mode: 'add' },
        { id: 'bore', shape: 'cylinder', radius: 0.02, length: 0.2, position: [0, 0, 0], density: 700, mode: 'remove' },
      ],
      spin: { axis: [0, 0, 1], rate: 10 },
    };
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(part).expect(422);
    expect(res.body.error.code).toBe('unanalysable');
  });
});

describe('POST /simulate', () => {
  it('answers sampled motion for a part', async () => {
    const res = await request(t.app).post('/api/v1/simulate').set(bearer(token)).send({ part: racket, misalignmentDeg: 2, seconds: 1, sampleRate: 50 }).expect(200);
    expect(res.body.times).toHaveLength(51);
    // Identity attitude at t = 0 (q and −q are the same rotation).
    expect(Math.abs(res.body.attitude[0][3])).toBeCloseTo(1, 12);
    expect(res.body.omega).toHaveLength(51);
  });

  it('refuses bad input naming the field', async () => {
    const res = await request(t.app).post('/api/v1/simulate').set(bearer(token)).send({ moments: [3, 2, 1], rate: 5, seconds: -1, sampleRate: 10 }).expect(400);
    expect(res.body.error.field).toBe('seconds');
  });

  it('keeps answering other requests while a long simulation runs', async () => {
    const order: string[] = [];
    // A few million integrator steps: a second or more of work on the worker thread.
    const long = request(t.app).post('/api/v1/simulate').set(bearer(token))
      .send({ moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 400, misalignmentDeg: 1, seconds: 600, sampleRate: 1 })
      .then((res) => { order.push('simulation'); return res; });
    await new Promise((r) => setTimeout(r, 200));
    const health = await request(t.app).get('/api/v1/health');
    order.push('health');
    expect(health.status).toBe(200);
    const done = await long;
    expect(done.status).toBe(200);
    expect(order).toEqual(['health', 'simulation']);
  });
});
