import request from 'supertest';
import { AuditEvent, Measurement, Membership } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let url = '';
let base = '';
let otherVariantUrl = '';
let report: { principal: { moments: number[] }; trade: { swingweight: number | null } };

beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t.app);
  base = `/api/v1/workspaces/${owner.workspace.id}`;
  const project = await request(t.app)
    .post(`${base}/projects`)
    .set(bearer(owner.accessToken))
    .send({ name: 'Rig', category: 'bat' })
    .expect(201);
  const part = await request(t.app)
    .post(`${base}/projects/${project.body.id}/parts`)
    .set(bearer(owner.accessToken))
    .send({ name: 'Bar' })
    .expect(201);
  // A bar 0.8 m long, 0.03 m square, 700 kg/m³, grip at its end along z.
  const doc = {
    primitives: [{ id: 'bar', shape: 'box', size: [0.03, 0.03, 0.8], position: [0, 0, 0.4], density: 700 }],
    spin: { axis: [1, 0, 0], rate: 10 },
    grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
  };
  const v = await request(t.app)
    .post(`${base}/parts/${part.body.id}/variants`)
    .set(bearer(owner.accessToken))
    .send({ document: doc })
    .expect(201);
  report = v.body.report;
  url = `${base}/variants/${v.body.id}/measurements`;
  const v2 = await request(t.app)
    .post(`${base}/parts/${part.body.id}/variants`)
    .set(bearer(owner.accessToken))
    .send({ document: doc })
    .expect(201);
  otherVariantUrl = `${base}/variants/${v2.body.id}/measurements`;
});
afterAll(async () => {
  await t.close();
});

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
  expect(res.body.error).toMatchObject({ code: 'invalid_input', field: 'file' });
  // Each problem travels on its own, with its line number.
  expect(res.body.error.problems).toEqual([
    { line: 3, message: 'value "-3" must be a positive number' },
    { line: 4, message: 'axis must be 1–120 characters' },
    { line: 4, message: 'unit "furlongs" must be one of kg·m², kg·cm², g·cm², oz·in² (or kg*m^2, g*cm^2, …)' },
    { line: 4, message: 'method must be 1–200 characters (e.g. compound pendulum)' },
    { line: 5, message: 'value "abc" must be a positive number' },
  ]);
  // The message still reads on its own, for callers that show only that.
  expect(res.body.error.message).toMatch(/^The CSV was not imported: line 3: value "-3" must be a positive number; line 4: axis must be/);
  expect(res.body.error.message).not.toMatch(/line 2/);
  expect(await Measurement.count()).toBe(before);
});

it('numbers problems by their line in the file, blank lines included', async () => {
  const csv = 'axis,value,unit,method\n\nmajor,0.01,kg·m²,pendulum\n\n\nminor,0,kg·m²,pendulum\n';
  const res = await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send(csv).expect(400);
  expect(res.body.error.problems).toEqual([{ line: 6, message: 'value "0" must be a positive number' }]);
});

it('lists the first 100 problems and counts the rest', async () => {
  const csv = ['axis,value,unit,method', ...Array.from({ length: 130 }, () => 'major,-1,kg·m²,pendulum')].join('\n');
  const res = await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send(csv).expect(400);
  const problems = res.body.error.problems as { line: number | null; message: string }[];
  expect(problems).toHaveLength(101);
  expect(problems[0]).toEqual({ line: 2, message: 'value "-1" must be a positive number' });
  expect(problems[99].line).toBe(101);
  expect(problems[100]).toEqual({ line: null, message: expect.stringMatching(/^30 more problems are not listed/) });
  expect(res.body.error.message).toMatch(/\(and 110 more\)\.$/);
});

it('refuses a wrong header, an empty file and a missing file', async () => {
  const header = (
    await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send('a,b,c,d\n1,2,3,4\n').expect(400)
  ).body.error;
  expect(header.message).toMatch(/line 1: the header must be axis,value,unit,method/);
  expect(header.problems).toEqual([{ line: 1, message: 'the header must be axis,value,unit,method (found a,b,c,d)' }]);
  const empty = (await request(t.app).post(url).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send('').expect(400)).body
    .error;
  expect(empty.message).toMatch(/empty|required/);
  const headerOnly = (
    await request(t.app)
      .post(url)
      .set(bearer(owner.accessToken))
      .set('Content-Type', 'text/csv')
      .send('axis,value,unit,method\n')
      .expect(400)
  ).body.error;
  expect(headerOnly.problems).toEqual([{ line: null, message: 'the file has a header but no measurements' }]);
  const missing = (await request(t.app).post(url).set(bearer(owner.accessToken)).send({}).expect(400)).body.error;
  expect(missing).toEqual({ code: 'invalid_input', field: 'file', message: expect.stringMatching(/^file is required/) });
});

describe('removing measured rows', () => {
  const csvOf = (tag: string, n: number) =>
    ['axis,value,unit,method', ...Array.from({ length: n }, (_, i) => `${tag} ${i + 1},${0.001 * (i + 1)},kg·m²,trifilar pendulum`)].join(
      '\n',
    );
  const importCsv = async (into: string, tag: string, n: number) =>
    (await request(t.app).post(into).set(bearer(owner.accessToken)).set('Content-Type', 'text/csv').send(csvOf(tag, n)).expect(201))
      .body as { id: string; axis: string; importId: string }[];
  const axesAt = async (at: string) =>
    ((await request(t.app).get(at).set(bearer(owner.accessToken)).expect(200)).body as { axis: string }[]).map((m) => m.axis);

  it('gives the rows of one import one import id, and each import its own', async () => {
    const a = await importCsv(url, 'tag-a', 3);
    const b = await importCsv(url, 'tag-b', 2);
    expect(new Set(a.map((m) => m.importId)).size).toBe(1);
    expect(new Set(b.map((m) => m.importId)).size).toBe(1);
    expect(a[0].importId).not.toBe(b[0].importId);
    const audit = await AuditEvent.findOne({
      where: { action: 'measurements.imported', workspaceId: owner.workspace.id },
      order: [['createdAt', 'DESC']],
    });
    expect(audit!.details).toEqual({ rows: 2, importId: b[0].importId });
  });

  it('removes one row and nothing else, and audits what it removed', async () => {
    const rows = await importCsv(url, 'single', 3);
    const before = await axesAt(url);
    const res = await request(t.app).delete(`${url}/${rows[1].id}`).set(bearer(owner.accessToken)).expect(200);
    expect(res.body).toEqual({ removed: 1 });
    const after = await axesAt(url);
    expect(after).toEqual(before.filter((a) => a !== 'single 2'));
    const audit = await AuditEvent.findOne({
      where: { action: 'measurements.removed', targetId: url.split('/').at(-2) },
      order: [['createdAt', 'DESC']],
    });
    expect(audit!.actorId).toBe(owner.user.id);
    expect(audit!.details).toMatchObject({
      rows: 1,
      readings: [{ axis: 'single 2', enteredValue: 0.002, enteredUnit: 'kg·m²', method: 'trifilar pendulum' }],
    });
    // Removing it again: gone.
    await request(t.app).delete(`${url}/${rows[1].id}`).set(bearer(owner.accessToken)).expect(404);
  });

  it('removes a whole import, leaving other imports and other variants as they were', async () => {
    const keep = await importCsv(url, 'keep', 2);
    const undo = await importCsv(url, 'undo', 4);
    const elsewhere = await importCsv(otherVariantUrl, 'elsewhere', 1);
    const before = await axesAt(url);
    // One row of the import was already removed on its own: the rest go.
    await request(t.app).delete(`${url}/${undo[0].id}`).set(bearer(owner.accessToken)).expect(200);
    const res = await request(t.app).delete(`${url}/imports/${undo[0].importId}`).set(bearer(owner.accessToken)).expect(200);
    expect(res.body).toEqual({ removed: 3 });
    expect(await axesAt(url)).toEqual(before.filter((a) => !a.startsWith('undo ')));
    expect(await axesAt(otherVariantUrl)).toEqual(['elsewhere 1']);
    expect(await Measurement.count({ where: { importId: keep[0].importId } })).toBe(2);
    expect(await Measurement.count({ where: { importId: undo[0].importId } })).toBe(0);
    const audit = await AuditEvent.findOne({
      where: { action: 'measurements.removed', workspaceId: owner.workspace.id },
      order: [['createdAt', 'DESC']],
    });
    expect(audit!.details).toMatchObject({ rows: 3, importId: undo[0].importId });
    expect((audit!.details as { readings: unknown[] }).readings).toHaveLength(3);
    // Nothing left of that import.
    await request(t.app).delete(`${url}/imports/${undo[0].importId}`).set(bearer(owner.accessToken)).expect(404);
    // An import of another variant is not found under this one.
    await request(t.app).delete(`${url}/imports/${elsewhere[0].importId}`).set(bearer(owner.accessToken)).expect(404);
    await request(t.app).delete(`${url}/${elsewhere[0].id}`).set(bearer(owner.accessToken)).expect(404);
    expect(await axesAt(otherVariantUrl)).toEqual(['elsewhere 1']);
  });

  it('answers 404 for an unknown or malformed id', async () => {
    const count = await Measurement.count();
    await request(t.app).delete(`${url}/00000000-0000-4000-8000-000000000000`).set(bearer(owner.accessToken)).expect(404);
    await request(t.app).delete(`${url}/imports/00000000-0000-4000-8000-000000000000`).set(bearer(owner.accessToken)).expect(404);
    await request(t.app).delete(`${url}/not-an-id`).set(bearer(owner.accessToken)).expect(404);
    await request(t.app).delete(`${url}/imports/not-an-id`).set(bearer(owner.accessToken)).expect(404);
    expect(await Measurement.count()).toBe(count);
  });

  it('refuses a reviewer (403) and removes nothing', async () => {
    const rows = await importCsv(url, 'reviewed', 2);
    const reviewer = await signUp(t.app);
    await Membership.create({ workspaceId: owner.workspace.id, userId: reviewer.user.id, role: 'reviewer' });
    const one = await request(t.app).delete(`${url}/${rows[0].id}`).set(bearer(reviewer.accessToken)).expect(403);
    expect(one.body.error.code).toBe('forbidden');
    await request(t.app).delete(`${url}/imports/${rows[0].importId}`).set(bearer(reviewer.accessToken)).expect(403);
    expect(await Measurement.count({ where: { importId: rows[0].importId } })).toBe(2);
    // A reviewer still reads them.
    expect(await axesAt(url)).toEqual(expect.arrayContaining(['reviewed 1', 'reviewed 2']));
  });

  it('answers 404 for another workspace’s rows and imports, and removes nothing there', async () => {
    const rows = await importCsv(url, 'tenant-a', 2);
    const b = await signUp(t.app);
    const bBase = `/api/v1/workspaces/${b.workspace.id}`;
    const project = await request(t.app)
      .post(`${bBase}/projects`)
      .set(bearer(b.accessToken))
      .send({ name: 'B rig', category: 'bat' })
      .expect(201);
    const part = await request(t.app)
      .post(`${bBase}/projects/${project.body.id}/parts`)
      .set(bearer(b.accessToken))
      .send({ name: 'B bar' })
      .expect(201);
    const doc = { primitives: [{ id: 'a', shape: 'sphere', radius: 0.05, density: 500 }], spin: { axis: [0, 0, 1], rate: 1 } };
    const v = await request(t.app)
      .post(`${bBase}/parts/${part.body.id}/variants`)
      .set(bearer(b.accessToken))
      .send({ document: doc })
      .expect(201);
    const bUrl = `${bBase}/variants/${v.body.id}/measurements`;
    // B's owner, with A's row and import ids under B's own variant.
    await request(t.app).delete(`${bUrl}/${rows[0].id}`).set(bearer(b.accessToken)).expect(404);
    await request(t.app).delete(`${bUrl}/imports/${rows[0].importId}`).set(bearer(b.accessToken)).expect(404);
    // B's owner, with A's workspace in the path.
    await request(t.app).delete(`${url}/${rows[0].id}`).set(bearer(b.accessToken)).expect(404);
    await request(t.app).delete(`${url}/imports/${rows[0].importId}`).set(bearer(b.accessToken)).expect(404);
    expect(await Measurement.count({ where: { importId: rows[0].importId } })).toBe(2);
  });
});
