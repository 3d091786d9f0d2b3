import request from 'supertest';
import racket from '../../../shared/src/engine/examples/junior-racket.json';
import { ScatterStudy } from '../models/init-models';
import { eventually } from '../test-support/eventually';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let base = '';
let variantId = '';
beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t.app);
  base = `/api/v1/workspaces/${owner.workspace.id}`;
  const project = await request(t.app)
    .post(`${base}/projects`)
    .set(bearer(owner.accessToken))
    .send({ name: 'Scatter', category: 'racket' })
    .expect(201);
  const part = await request(t.app)
    .post(`${base}/projects/${project.body.id}/parts`)
    .set(bearer(owner.accessToken))
    .send({ name: 'Racket' })
    .expect(201);
  variantId = (
    await request(t.app)
      .post(`${base}/parts/${part.body.id}/variants`)
      .set(bearer(owner.accessToken))
      .send({ document: racket })
      .expect(201)
  ).body.id;
});
afterAll(async () => {
  await t.close();
}, 30000);

async function until(studyId: string, done: (s: { state: string; progress: number }) => boolean, seen: string[] = []) {
  const probe = async () => {
    const s = (await request(t.app).get(`${base}/scatter/${studyId}`).set(bearer(owner.accessToken)).expect(200)).body;
    if (seen[seen.length - 1] !== `${s.state}`) seen.push(s.state);
    return s as { state: string; progress: number };
  };
  return eventually(probe, done, { what: 'the study reaching that state', timeoutMs: 30_000, intervalMs: 10 });
}

it('runs a study as a job: queued → running with progress → done, reproducible by seed', async () => {
  const started = await request(t.app)
    .post(`${base}/scatter`)
    .set(bearer(owner.accessToken))
    .send({ variantId, samples: 20000, seed: 7, tolerances: { hoop: { density: 0.08 } } })
    .expect(202);
  expect(started.body).toMatchObject({ state: 'queued', progress: 0, samples: 20000, seed: 7 });
  const seen: string[] = [];
  let sawProgress = false;
  const done = await until(
    started.body.id,
    (s) => {
      if (s.state === 'running' && s.progress > 0 && s.progress < 1) sawProgress = true;
      return s.state === 'done' || s.state === 'failed';
    },
    seen,
  );
  expect(done.state).toBe('done');
  expect(seen[0]).toBe('queued');
  expect(seen).toContain('running');
  expect(sawProgress).toBe(true);
  expect(done.progress).toBe(1);
  const result = (done as unknown as { result: { samples: number; verdictChangedShare: number; sensitivities: unknown[] } }).result;
  expect(result.samples).toBe(20000);
  expect(result.verdictChangedShare).toBeGreaterThanOrEqual(0);
  expect(result.sensitivities.length).toBeGreaterThan(0);

  const again = await request(t.app)
    .post(`${base}/scatter`)
    .set(bearer(owner.accessToken))
    .send({ variantId, samples: 20000, seed: 7, tolerances: { hoop: { density: 0.08 } } })
    .expect(202);
  const second = await until(again.body.id, (s) => s.state === 'done');
  expect((second as unknown as { result: unknown }).result).toEqual(result);
});

it('cancels a running study', async () => {
  const started = await request(t.app)
    .post(`${base}/scatter`)
    .set(bearer(owner.accessToken))
    .send({ variantId, samples: 20000, seed: 1 })
    .expect(202);
  await until(started.body.id, (s) => s.state === 'running');
  const cancelled = await request(t.app).post(`${base}/scatter/${started.body.id}/cancel`).set(bearer(owner.accessToken)).expect(200);
  expect(cancelled.body.state).toBe('cancelled');
  await new Promise((r) => setTimeout(r, 800));
  const after = await ScatterStudy.findByPk(started.body.id);
  expect(after!.state).toBe('cancelled');
  expect(after!.result).toBeNull();
  await request(t.app).post(`${base}/scatter/${started.body.id}/cancel`).set(bearer(owner.accessToken)).expect(409);
});

it('a failing job reports why', async () => {
  // Valid for the schema, but the material cannot be resolved: the engine refuses it in the job.
  const part = {
    ...racket,
    primitives: [
      ...racket.primitives,
      { id: 'mystery', shape: 'sphere', radius: 0.01, position: [0, 0, 0.3], materialId: '00000000-0000-4000-8000-000000000000' },
    ],
  };
  const started = await request(t.app).post(`${base}/scatter`).set(bearer(owner.accessToken)).send({ part, samples: 100 }).expect(202);
  const failed = await until(started.body.id, (s) => s.state === 'failed' || s.state === 'done');
  expect(failed.state).toBe('failed');
  expect((failed as unknown as { error: string }).error).toMatch(/material/i);
});

it('refuses a bad request before queueing anything', async () => {
  const before = await ScatterStudy.count();
  expect(
    (await request(t.app).post(`${base}/scatter`).set(bearer(owner.accessToken)).send({ variantId, samples: 5 }).expect(400)).body.error
      .field,
  ).toBe('samples');
  expect(
    (
      await request(t.app)
        .post(`${base}/scatter`)
        .set(bearer(owner.accessToken))
        .send({ variantId, samples: 100, tolerances: { nope: { density: 0.1 } } })
        .expect(400)
    ).body.error.field,
  ).toBe('tolerances.nope');
  expect(
    (await request(t.app).post(`${base}/scatter`).set(bearer(owner.accessToken)).send({ samples: 100 }).expect(400)).body.error.field,
  ).toBe('variantId');
  expect(await ScatterStudy.count()).toBe(before);
});
