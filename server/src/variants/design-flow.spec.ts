import request from 'supertest';
import racket from '../../../shared/src/engine/examples/junior-racket.json';
import { AuditEvent, Material, Membership, Part, Variant } from '../models/init-models';
import { waitForMail } from '../test-support/mail-inbox';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let designer: Awaited<ReturnType<typeof signUp>>;
let reviewer: Awaited<ReturnType<typeof signUp>>;
let base = '';

beforeAll(async () => {
  t = await startTestApp();
  owner = await signUp(t.app);
  designer = await signUp(t.app);
  reviewer = await signUp(t.app);
  await Membership.create({ workspaceId: owner.workspace.id, userId: designer.user.id, role: 'designer' });
  await Membership.create({ workspaceId: owner.workspace.id, userId: reviewer.user.id, role: 'reviewer' });
  base = `/api/v1/workspaces/${owner.workspace.id}`;
});
afterAll(async () => {
  await t.close();
});

async function newPart(name = 'Junior racket') {
  const project = await request(t.app)
    .post(`${base}/projects`)
    .set(bearer(designer.accessToken))
    .send({ name: `${name} project`, category: 'racket' })
    .expect(201);
  const part = await request(t.app)
    .post(`${base}/projects/${project.body.id}/parts`)
    .set(bearer(designer.accessToken))
    .send({ name, draft: racket })
    .expect(201);
  return { projectId: project.body.id as string, part: part.body as { id: string; draftVersion: number } };
}

describe('materials', () => {
  it('lists the seeded library with a named source for every density', async () => {
    const res = await request(t.app).get(`${base}/materials`).set(bearer(reviewer.accessToken)).expect(200);
    const names = res.body.map((m: { name: string }) => m.name);
    for (const expected of [
      'White ash',
      'Sugar maple',
      'Shagbark hickory',
      'Balsa',
      'Aluminium 6061-T6',
      'Carbon steel',
      'Titanium Ti-6Al-4V',
      'Carbon/epoxy laminate (60 % fibre)',
      'Glass/epoxy laminate (55 % fibre)',
      'Nylon 6/6',
      'ABS',
      'Polycarbonate',
      'EVA foam (medium)',
      'PU foam (moulded)',
      'Natural rubber',
      'Cork (agglomerated)',
      'Lead',
    ]) {
      expect(names).toContain(expected);
    }
    for (const m of res.body) expect(m.source.length).toBeGreaterThan(10);
    // Lead 11 340 kg/m³ (CRC Handbook, value from memory) — the table's own figure survives the migration.
    expect(res.body.find((m: { name: string }) => m.name === 'Lead').density).toBe(11340);
  });

  it('lets admins add workspace materials and refuses designers; library rows are not editable', async () => {
    await request(t.app)
      .post(`${base}/materials`)
      .set(bearer(designer.accessToken))
      .send({ name: 'X', family: 'wood', density: 500, densityTolerance: 0.05, source: 'lab' })
      .expect(403);
    const created = await request(t.app)
      .post(`${base}/materials`)
      .set(bearer(owner.accessToken))
      .send({ name: 'Kiln-dried ash', family: 'wood', density: 690, densityTolerance: 0.06, source: 'our own lab sample' })
      .expect(201);
    expect(created.body.scope).toBe('workspace');
    const library = await Material.findOne({ where: { workspaceId: null } });
    await request(t.app).patch(`${base}/materials/${library!.id}`).set(bearer(owner.accessToken)).send({ density: 1 }).expect(404);
    const bad = await request(t.app)
      .post(`${base}/materials`)
      .set(bearer(owner.accessToken))
      .send({ name: 'Neg', family: 'wood', density: -1, densityTolerance: 0.05, source: 's' })
      .expect(400);
    expect(bad.body.error.field).toBe('density');
  });
});

describe('projects, parts and the autosaved draft', () => {
  it('renames and archives a project', async () => {
    const { projectId } = await newPart();
    const res = await request(t.app)
      .patch(`${base}/projects/${projectId}`)
      .set(bearer(designer.accessToken))
      .send({ name: 'Renamed', archived: true })
      .expect(200);
    expect(res.body).toMatchObject({ name: 'Renamed', archived: true });
    await request(t.app).patch(`${base}/projects/${projectId}`).set(bearer(reviewer.accessToken)).send({ archived: false }).expect(403);
  });

  it('answers 409 to a stale draft save and keeps the newer draft', async () => {
    const { part } = await newPart();
    const first = await request(t.app)
      .patch(`${base}/parts/${part.id}`)
      .set(bearer(designer.accessToken))
      .send({ draft: { ...racket, name: 'tab A' }, draftVersion: part.draftVersion })
      .expect(200);
    expect(first.body.draftVersion).toBe(part.draftVersion + 1);
    const stale = await request(t.app)
      .patch(`${base}/parts/${part.id}`)
      .set(bearer(designer.accessToken))
      .send({ draft: { ...racket, name: 'tab B' }, draftVersion: part.draftVersion })
      .expect(409);
    expect(stale.body.error).toMatchObject({ code: 'stale_version', field: 'draftVersion' });
    expect(((await Part.findByPk(part.id))!.draft as { name: string }).name).toBe('tab A');
  });
});

describe('variants', () => {
  it('saves a variant with its spin report and engine version; numbers count up', async () => {
    const { part } = await newPart();
    const v1 = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ label: 'baseline', document: racket })
      .expect(201);
    expect(v1.body).toMatchObject({
      number: 1,
      status: 'draft',
      label: 'baseline',
      author: { id: designer.user.id },
      engineVersion: expect.stringMatching(/^engine /),
    });
    expect(v1.body.report.spin.verdict).toEqual(expect.any(String));
    const v2 = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    expect(v2.body.number).toBe(2);
    const parts = await request(t.app)
      .get(`${base}/projects/${(await Part.findByPk(part.id))!.projectId}/parts`)
      .set(bearer(reviewer.accessToken))
      .expect(200);
    expect(parts.body[0]).toMatchObject({
      variantCount: 2,
      latestVariant: { number: 2, summary: { verdict: v2.body.report.spin.verdict } },
    });
  });

  it('refuses an invalid document (400 naming the field) and an unanalysable one (422), saving nothing', async () => {
    const { part } = await newPart();
    const bad = structuredClone(racket);
    (bad.primitives[0] as { radius: number }).radius = 0;
    const res = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: bad })
      .expect(400);
    expect(res.body.error.field).toBe('primitives[0].radius');
    const unknownMaterial = {
      ...racket,
      primitives: [{ id: 'x', shape: 'sphere', radius: 0.05, materialId: '00000000-0000-4000-8000-000000000000' }],
    };
    await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: unknownMaterial })
      .expect(422);
    expect(await Variant.count({ where: { partId: part.id } })).toBe(0);
  });

  it('resolves a library material by id: a 10 cm lead sphere weighs ρ·4/3·π·r³', async () => {
    const { part } = await newPart();
    const lead = await Material.findOne({ where: { name: 'Lead', workspaceId: null } });
    const doc = { primitives: [{ id: 'ball', shape: 'sphere', radius: 0.05, materialId: lead!.id }], spin: { axis: [0, 0, 1], rate: 5 } };
    const v = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: doc })
      .expect(201);
    // Sphere volume 4/3·π·r³ (standard table).
    expect(v.body.report.mass).toBeCloseTo(11340 * (4 / 3) * Math.PI * 0.05 ** 3, 9);
    const live = await request(t.app)
      .post('/api/v1/analyze')
      .query({ workspace: owner.workspace.id })
      .set(bearer(designer.accessToken))
      .send(doc)
      .expect(200);
    expect(live.body.mass).toBeCloseTo(v.body.report.mass, 12);
  });

  it('answers 409 to a stale variant edit', async () => {
    const { part } = await newPart();
    const v = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    await request(t.app)
      .patch(`${base}/variants/${v.body.id}`)
      .set(bearer(designer.accessToken))
      .send({ notes: 'first', version: v.body.version })
      .expect(200);
    await request(t.app)
      .patch(`${base}/variants/${v.body.id}`)
      .set(bearer(designer.accessToken))
      .send({ notes: 'second', version: v.body.version })
      .expect(409);
    expect((await Variant.findByPk(v.body.id))!.notes).toBe('first');
  });
});

describe('sign-off', () => {
  it('requests a review (e-mailing the reviewer), takes comments, and lets the reviewer approve', async () => {
    const { part } = await newPart('Sign-off racket');
    const v = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    const url = `${base}/variants/${v.body.id}/review`;
    await request(t.app).post(`${url}/decision`).set(bearer(reviewer.accessToken)).send({ decision: 'approved' }).expect(409);
    const bad = await request(t.app)
      .post(`${url}/request`)
      .set(bearer(designer.accessToken))
      .send({ reviewerId: designer.user.id })
      .expect(400);
    expect(bad.body.error.field).toBe('reviewerId');
    const requested = await request(t.app)
      .post(`${url}/request`)
      .set(bearer(designer.accessToken))
      .send({ reviewerId: reviewer.user.id, message: 'Please check the hoop mass.' })
      .expect(200);
    expect(requested.body.status).toBe('in_review');
    const mail = await waitForMail(reviewer.user.email);
    expect(mail.subject).toBe('Review requested: Sign-off racket v1');
    expect(mail.text).toContain(`/review/${v.body.id}`);

    await request(t.app).post(`${url}/comments`).set(bearer(reviewer.accessToken)).send({ body: 'Balance looks high.' }).expect(201);
    await request(t.app).post(`${url}/decision`).set(bearer(designer.accessToken)).send({ decision: 'approved' }).expect(403);
    await request(t.app)
      .patch(`${base}/variants/${v.body.id}`)
      .set(bearer(reviewer.accessToken))
      .send({ notes: 'x', version: 1 })
      .expect(403);
    const approved = await request(t.app)
      .post(`${url}/decision`)
      .set(bearer(reviewer.accessToken))
      .send({ decision: 'approved', body: 'Good to tool.' })
      .expect(200);
    expect(approved.body.status).toBe('approved');
    expect(approved.body.entries.map((e: { kind: string }) => e.kind)).toEqual(['requested', 'comment', 'approved']);
    expect(await AuditEvent.count({ where: { workspaceId: owner.workspace.id, action: 'review.approved' } })).toBe(1);
  });

  it('sends a variant back with changes requested', async () => {
    const { part } = await newPart();
    const v = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    const url = `${base}/variants/${v.body.id}/review`;
    await request(t.app).post(`${url}/request`).set(bearer(designer.accessToken)).send({ reviewerId: reviewer.user.id }).expect(200);
    const back = await request(t.app)
      .post(`${url}/decision`)
      .set(bearer(reviewer.accessToken))
      .send({ decision: 'changes_requested', body: 'Flip-prone: move mass to the tip.' })
      .expect(200);
    expect(back.body.status).toBe('changes_requested');
  });
});

describe('compare and exports', () => {
  it('compares variants with deltas, as JSON and CSV; refuses one variant', async () => {
    const { part } = await newPart();
    const v1 = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    const heavier = structuredClone(racket);
    heavier.primitives.push({ id: 'tip-weight', shape: 'point', mass: 0.01, position: [0, 0, 0.6] } as never);
    const v2 = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: heavier })
      .expect(201);
    const res = await request(t.app)
      .get(`${base}/compare`)
      .query({ variants: `${v1.body.id},${v2.body.id}`, baseline: v1.body.id })
      .set(bearer(reviewer.accessToken))
      .expect(200);
    const mass = res.body.comparison.rows.find((r: { key: string }) => r.key === 'mass');
    expect(mass.deltas[1]).toBeCloseTo(0.01, 12);
    const csv = await request(t.app)
      .get(`${base}/compare.csv`)
      .query({ variants: `${v1.body.id},${v2.body.id}` })
      .set(bearer(reviewer.accessToken))
      .expect(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.headers['content-disposition']).toMatch(/^attachment; filename="?comparison\.csv"?$/);
    expect(csv.text.split('\r\n')[0]).toMatch(/^figure,unit,/);
    const one = await request(t.app).get(`${base}/compare`).query({ variants: v1.body.id }).set(bearer(reviewer.accessToken)).expect(400);
    expect(one.body.error.field).toBe('variants');
  });

  it('exports the report as a PDF and the document as JSON', async () => {
    const { part } = await newPart();
    const v = await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(bearer(designer.accessToken))
      .send({ document: racket })
      .expect(201);
    const pdf = await request(t.app)
      .get(`${base}/variants/${v.body.id}/export.pdf`)
      .set(bearer(reviewer.accessToken))
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      })
      .expect(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    const body = pdf.body as Buffer;
    expect(body.subarray(0, 5).toString()).toBe('%PDF-');
    expect(body.length).toBeGreaterThan(2000);
    const json = await request(t.app).get(`${base}/variants/${v.body.id}/export.json`).set(bearer(reviewer.accessToken)).expect(200);
    expect(JSON.parse(json.text)).toEqual(racket);
  });
});
