import http from 'node:http';
import type { AddressInfo } from 'node:net';
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
afterAll(async () => {
  await t.close();
});

describe('POST /analyze', () => {
  it('needs a signed-in user', async () => {
    await request(t.app).post('/api/v1/analyze').send(racket).expect(401);
  });

  it('answers the engine’s own spin report, computed on a worker thread', async () => {
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(racket).expect(200);
    // The API adds nothing and loses nothing: the same report as the engine called in-process.
    expect(res.body).toEqual(JSON.parse(JSON.stringify(analyzePart(racket))));
    expect(res.body).toMatchObject({
      mass: expect.any(Number),
      principal: { moments: expect.any(Array) },
      spin: { verdict: expect.stringMatching(/^(steady|watch|flip-prone)$/) },
    });
  });

  it('refuses a bad document with 400 naming the field by its JSON path', async () => {
    const bad = structuredClone(racket) as { primitives: { radius?: number; shape: string }[] };
    const first = bad.primitives.findIndex((p) => p.radius !== undefined);
    bad.primitives[first].radius = -0.01;
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(bad).expect(400);
    expect(res.body.error.field).toBe(`primitives[${first}].radius`);
    const unknownShape = structuredClone(racket) as { primitives: { shape: string }[] };
    unknownShape.primitives[0].shape = 'banana';
    expect((await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(unknownShape).expect(400)).body.error.field).toMatch(
      /^primitives\[0\]/,
    );
    expect((await request(t.app).post('/api/v1/analyze').set(bearer(token)).send({}).expect(400)).body.error.code).toBe('invalid_input');
  });

  it('refuses a flight time that is not a positive number of seconds up to 600, naming `flightTime`', async () => {
    for (const flightTime of [0, -1, 601, 'soon']) {
      const res = await request(t.app)
        .post('/api/v1/analyze')
        .set(bearer(token))
        .send({ ...racket, flightTime })
        .expect(400);
      expect(res.body.error).toMatchObject({ code: 'invalid_input', field: 'flightTime' });
    }
    const ok = await request(t.app)
      .post('/api/v1/analyze')
      .set(bearer(token))
      .send({ ...racket, flightTime: 0.1 })
      .expect(200);
    expect(ok.body.spin).toMatchObject({ flightTime: 0.1, flightTimeSource: 'part', verdict: 'watch' });
  });

  it('refuses a body that is not JSON, or not sent as JSON, saying so', async () => {
    const broken = await request(t.app)
      .post('/api/v1/analyze')
      .set(bearer(token))
      .set('content-type', 'application/json')
      .send('{"primitives": [')
      .expect(400);
    expect(broken.body.error).toMatchObject({ code: 'invalid_json', message: 'The request body is not valid JSON.' });
    const asText = await request(t.app)
      .post('/api/v1/analyze')
      .set(bearer(token))
      .set('content-type', 'text/plain')
      .send(JSON.stringify(racket))
      .expect(400);
    expect(asText.body.error).toMatchObject({ field: 'body', message: expect.stringContaining('application/json') });
  });

  it('answers the report as JSON with its content type', async () => {
    const res = await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(racket).expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/json; charset=utf-8$/);
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
    const res = await request(t.app)
      .post('/api/v1/simulate')
      .set(bearer(token))
      .send({ part: racket, misalignmentDeg: 2, seconds: 1, sampleRate: 50 })
      .expect(200);
    expect(res.body.times).toHaveLength(51);
    // Identity attitude at t = 0 (q and −q are the same rotation).
    expect(Math.abs(res.body.attitude[0][3])).toBeCloseTo(1, 12);
    expect(res.body.omega).toHaveLength(51);
  });

  it('refuses bad input naming the field', async () => {
    const res = await request(t.app)
      .post('/api/v1/simulate')
      .set(bearer(token))
      .send({ moments: [3, 2, 1], rate: 5, seconds: -1, sampleRate: 10 })
      .expect(400);
    expect(res.body.error.field).toBe('seconds');
  });

  it('keeps answering other requests while a long simulation runs', async () => {
    const order: string[] = [];
    // A few million integrator steps: a second or more of work on the worker thread.
    const long = request(t.app)
      .post('/api/v1/simulate')
      .set(bearer(token))
      .send({ moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 400, misalignmentDeg: 1, seconds: 600, sampleRate: 1 })
      .then((res) => {
        order.push('simulation');
        return res;
      });
    await new Promise((r) => setTimeout(r, 200));
    const health = await request(t.app).get('/api/v1/health');
    order.push('health');
    expect(health.status).toBe(200);
    const done = await long;
    expect(done.status).toBe(200);
    expect(order).toEqual(['health', 'simulation']);
  });
});

describe('a client that goes away', () => {
  let server: http.Server;
  let port = 0;
  beforeAll(async () => {
    server = await new Promise<http.Server>((resolve) => {
      const s = t.app.listen(0, '127.0.0.1', () => resolve(s));
    });
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise((r) => server.close(r));
  });
  afterEach(() => jest.restoreAllMocks());

  const post = (path: string, body: unknown, agent?: http.Agent) => {
    const text = JSON.stringify(body);
    return http
      .request({
        host: '127.0.0.1',
        port,
        path,
        method: 'POST',
        agent,
        headers: { ...bearer(token), 'content-type': 'application/json', 'content-length': Buffer.byteLength(text) },
      })
      .end(text);
  };

  it('cancels its computation on the worker', async () => {
    const run = jest.spyOn(t.ctx.compute, 'run');
    const req = post('/api/v1/simulate', {
      moments: [6.5, 5, 2.5],
      axis: 'intermediate',
      rate: 400,
      misalignmentDeg: 1,
      seconds: 600,
      sampleRate: 1,
    });
    req.on('error', () => undefined);
    while (run.mock.calls.length === 0) await new Promise((r) => setTimeout(r, 20));
    req.destroy();
    await expect(run.mock.results[0].value).rejects.toMatchObject({ status: 499, code: 'cancelled' });
  });

  it('lets an analysis it gave up on finish on the same worker thread, and answers cancelled', async () => {
    const pool = (t.ctx.compute as unknown as { analyses: { threads: { threadId: number }[] } }).analyses;
    // Thousands of primitives: tens of milliseconds of parsing and schema checks on the worker, so the client leaves while it runs.
    const big = {
      ...racket,
      primitives: Array.from({ length: 5000 }, (_, i) => ({
        id: `s${i}`,
        shape: 'sphere',
        radius: 0.01,
        density: 500,
        position: [0, 0, i * 0.001],
      })),
    };
    await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(big).expect(200);
    const before = pool.threads.map((w) => w.threadId);
    expect(before.length).toBeGreaterThan(0);
    const run = jest.spyOn(t.ctx.compute, 'analyzeJson');
    const req = post('/api/v1/analyze', big);
    req.on('error', () => undefined);
    while (run.mock.calls.length === 0) await new Promise((r) => setTimeout(r, 5));
    await new Promise((r) => setTimeout(r, 15));
    req.destroy();
    await expect(run.mock.results[0].value).rejects.toMatchObject({ status: 499, code: 'cancelled' });
    await request(t.app).post('/api/v1/analyze').set(bearer(token)).send(big).expect(200);
    expect(pool.threads.map((w) => w.threadId)).toEqual(before);
  });

  it('cancels nothing that was answered, however many requests one kept-alive connection carries', async () => {
    const run = jest.spyOn(t.ctx.compute, 'analyzeJson');
    const warnings: string[] = [];
    const onWarning = (w: Error) => warnings.push(w.name);
    process.on('warning', onWarning);
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    try {
      for (let i = 0; i < 15; i++) {
        const status = await new Promise<number>((resolve, reject) => {
          post('/api/v1/analyze', racket, agent)
            .on('response', (res) => {
              res.resume();
              res.on('end', () => resolve(res.statusCode!));
            })
            .on('error', reject);
        });
        expect(status).toBe(200);
      }
    } finally {
      agent.destroy();
    }
    await new Promise((r) => setTimeout(r, 100));
    process.off('warning', onWarning);
    expect(run).toHaveBeenCalledTimes(15);
    expect(run.mock.calls.map(([, , signal]) => signal?.aborted)).toEqual(Array(15).fill(false));
    expect(warnings).not.toContain('MaxListenersExceededWarning');
  });
});
