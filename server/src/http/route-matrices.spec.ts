import request from 'supertest';
import { PERMISSIONS, ROLES, can, type Role } from '@tumblewise/shared';
import { Invitation, Material, Measurement, Membership, Mesh, Part, Project, ScatterStudy, User, Variant } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

/**
 * The role and tenancy matrices, generated from the app's own route catalogue: every route the
 * app declares is in it, so a new route cannot be left out of these checks.
 */
const NOWHERE = '00000000-0000-4000-8000-000000000000';
let t: TestApp;
type Actor = { token: string; workspaceId: string };
const tokens: Partial<Record<Role, Actor>> = {};
let other: Record<
  | 'workspaceId'
  | 'memberId'
  | 'invitationId'
  | 'materialId'
  | 'projectId'
  | 'partId'
  | 'variantId'
  | 'meshId'
  | 'studyId'
  | 'measurementId'
  | 'importId',
  string
>;

/** A valid body for each write route, so the tenancy checks reach the row lookup. */
const VALID_BODIES: Record<string, object> = {
  'patch /workspaces/:workspaceId/members/:memberId': { role: 'designer' },
  'post /workspaces/:workspaceId/invitations': { email: 'matrix-invitee@example.test', role: 'designer' },
  'post /workspaces/:workspaceId/projects': { name: 'Matrix project', category: 'bat' },
  'patch /workspaces/:workspaceId/projects/:projectId': { name: 'Renamed' },
  'post /workspaces/:workspaceId/materials': { name: 'M', family: 'wood', density: 500, densityTolerance: 0.05, source: 'common practice' },
  'patch /workspaces/:workspaceId/materials/:materialId': { name: 'Renamed' },
  'post /workspaces/:workspaceId/projects/:projectId/parts': { name: 'Matrix part' },
  'patch /workspaces/:workspaceId/parts/:partId': { draftVersion: 1, name: 'Renamed' },
  'post /workspaces/:workspaceId/parts/:partId/variants': {
    document: { primitives: [{ id: 'a', shape: 'sphere', radius: 0.1, density: 500 }], spin: { axis: [0, 0, 1], rate: 1 } },
  },
  'patch /workspaces/:workspaceId/variants/:variantId': { version: 1, label: 'x' },
  'post /workspaces/:workspaceId/variants/:variantId/review/request': { reviewerId: '00000000-0000-4000-8000-000000000000' },
  'post /workspaces/:workspaceId/variants/:variantId/review/comments': { body: 'A comment' },
  'post /workspaces/:workspaceId/variants/:variantId/review/decision': { decision: 'approved' },
  'post /workspaces/:workspaceId/scatter': { variantId: '__variant__', samples: 10 },
};

/** Ids that exist nowhere: an allowed role reaches the lookup (404) or validation (400). */
const NOWHERE_IDS = (workspaceId: string) => ({
  workspaceId,
  memberId: NOWHERE,
  invitationId: NOWHERE,
  materialId: NOWHERE,
  projectId: NOWHERE,
  partId: NOWHERE,
  variantId: NOWHERE,
  meshId: NOWHERE,
  studyId: NOWHERE,
  measurementId: NOWHERE,
  importId: NOWHERE,
});

beforeAll(async () => {
  t = await startTestApp();
  const a = await signUp(t.app, { workspaceName: 'Tenant A' });
  tokens.owner = { token: a.accessToken, workspaceId: a.workspace.id };
  for (const role of ROLES.filter((r) => r !== 'owner')) {
    const s = await signUp(t.app, { workspaceName: `Scratch ${role}` });
    const user = await User.findByPk(s.user.id);
    await Membership.create({ workspaceId: a.workspace.id, userId: user!.id, role });
    tokens[role] = { token: s.accessToken, workspaceId: a.workspace.id };
  }
  const b = await signUp(t.app, { workspaceName: 'Tenant B' });
  const bMember = await Membership.findOne({ where: { workspaceId: b.workspace.id } });
  const inv = await request(t.app)
    .post(`/api/v1/workspaces/${b.workspace.id}/invitations`)
    .set(bearer(b.accessToken))
    .send({ email: 'b-invitee@example.test', role: 'reviewer' })
    .expect(201);
  const material = await Material.create({
    workspaceId: b.workspace.id,
    name: 'B wood',
    family: 'wood',
    density: 600,
    densityTolerance: 0.05,
    source: 'test',
  });
  const project = await Project.create({ workspaceId: b.workspace.id, name: 'B project', category: 'bat', createdById: b.user.id });
  const part = await Part.create({ workspaceId: b.workspace.id, projectId: project.id, name: 'B part' });
  const variant = await Variant.create({
    workspaceId: b.workspace.id,
    partId: part.id,
    number: 1,
    document: {},
    report: {},
    engineVersion: 'test',
    authorId: b.user.id,
  });
  const mesh = await Mesh.create({
    workspaceId: b.workspace.id,
    name: 'B mesh',
    sha256: 'x'.repeat(64),
    byteSize: 1,
    triangleCount: 1,
    format: 'binary',
    data: Buffer.from([0]),
    report: { fixed: [], warnings: [] },
    createdById: b.user.id,
  });
  const study = await ScatterStudy.create({
    workspaceId: b.workspace.id,
    variantId: variant.id,
    document: {},
    samples: 10,
    seed: 1,
    createdById: b.user.id,
  });
  const reading = await Measurement.create({
    workspaceId: b.workspace.id,
    variantId: variant.id,
    axis: 'major',
    value: 0.01,
    enteredValue: 0.01,
    enteredUnit: 'kg·m²',
    method: 'test',
    createdById: b.user.id,
    importId: '00000000-0000-4000-8000-0000000000b1',
  });
  other = {
    workspaceId: b.workspace.id,
    memberId: bMember!.id,
    invitationId: inv.body.id,
    materialId: material.id,
    projectId: project.id,
    partId: part.id,
    variantId: variant.id,
    meshId: mesh.id,
    studyId: study.id,
    measurementId: reading.id,
    importId: reading.importId!,
  };
  expect(await Invitation.count({ where: { id: other.invitationId } })).toBe(1);
});
afterAll(async () => {
  await t.close();
});

const workspaceRoutes = () => t.ctx.catalogue.routes.filter((r) => r.path.startsWith('/workspaces/:workspaceId'));
const key = (r: { method: string; path: string }) => `${r.method} ${r.path}`;

/** A valid body for the route, with B's ids where the body refers to rows. */
function bodyFor(route: { method: string; path: string }) {
  const body = VALID_BODIES[key(route)];
  return body && JSON.parse(JSON.stringify(body).replace('__variant__', other.variantId));
}

function fill(path: string, ids: Record<string, string>): string {
  return (
    '/api/v1' +
    path.replace(/:([A-Za-z]+)/g, (_m, name: string) => {
      if (!(name in ids)) throw new Error(`the matrix has no sample id for :${name}; add one`);
      return ids[name];
    })
  );
}

function call(method: string, url: string, token?: string, body?: object) {
  const r = request(t.app)[method as 'get'](url);
  if (token) r.set(bearer(token));
  return body ? r.send(body) : r;
}

it('catalogues every workspace route with a permission that exists', () => {
  const routes = workspaceRoutes();
  expect(routes.length).toBeGreaterThanOrEqual(9);
  for (const r of routes) {
    expect(r.access.kind).toBe('workspace');
    if (r.access.kind === 'workspace') expect(Object.keys(PERMISSIONS)).toContain(r.access.permission);
  }
});

describe('role matrix: each role × each workspace route → allowed or 403', () => {
  it.each([...ROLES])('%s', async (role) => {
    const actor = tokens[role]!;
    for (const route of workspaceRoutes()) {
      if (route.access.kind !== 'workspace') continue;
      // Child ids that do not exist: an allowed role reaches the lookup (404) or validation (400).
      const url = fill(route.path, NOWHERE_IDS(actor.workspaceId));
      const res = await call(route.method, url, actor.token, route.method === 'get' || route.method === 'delete' ? undefined : {});
      const allowed = can(role, route.access.permission);
      if (allowed) expect({ route: key(route), status: res.status }).not.toEqual({ route: key(route), status: 403 });
      else
        expect({ route: key(route), status: res.status, code: res.body.error?.code }).toEqual({
          route: key(route),
          status: 403,
          code: 'forbidden',
        });
      expect(res.status).not.toBe(401);
    }
  });
});

describe('tenancy matrix', () => {
  it('answers 404 for every route called with another workspace’s id', async () => {
    const owner = tokens.owner!;
    for (const route of workspaceRoutes()) {
      const url = fill(route.path, other);
      const res = await call(route.method, url, owner.token, bodyFor(route));
      expect({ route: key(route), status: res.status }).toEqual({ route: key(route), status: 404 });
    }
  });

  it('answers 404 for every row id of another workspace used under one’s own workspace', async () => {
    const owner = tokens.owner!;
    for (const route of workspaceRoutes().filter((r) => /:(?!workspaceId)\w+/.test(r.path))) {
      const url = fill(route.path, { ...other, workspaceId: owner.workspaceId });
      const res = await call(route.method, url, owner.token, bodyFor(route));
      expect({ route: key(route), status: res.status }).toEqual({ route: key(route), status: 404 });
    }
    // Nothing of B changed.
    expect(await Membership.count({ where: { id: other.memberId, role: 'owner' } })).toBe(1);
    expect((await Invitation.findByPk(other.invitationId))!.status).toBe('pending');
    expect((await Part.findByPk(other.partId))!.name).toBe('B part');
    expect((await Variant.findByPk(other.variantId))!.status).toBe('draft');
    expect((await Material.findByPk(other.materialId))!.name).toBe('B wood');
    expect(await Mesh.count({ where: { id: other.meshId } })).toBe(1);
    expect((await ScatterStudy.findByPk(other.studyId))!.state).toBe('queued');
    expect(await Measurement.count({ where: { id: other.measurementId, importId: other.importId } })).toBe(1);
  });

  it('treats ids of another workspace inside a body or query as missing', async () => {
    const own = `/api/v1/workspaces/${tokens.owner!.workspaceId}`;
    const token = tokens.owner!.token;
    expect((await call('post', `${own}/scatter`, token, { variantId: other.variantId, samples: 10 })).status).toBe(404);
    expect((await call('get', `${own}/compare?variants=${other.variantId},${other.variantId}`, token)).status).toBe(404);
    const doc = { primitives: [{ id: 'm', shape: 'mesh', meshId: other.meshId, density: 1000 }], spin: { axis: [0, 0, 1], rate: 1 } };
    expect((await call('post', `/api/v1/analyze?workspace=${tokens.owner!.workspaceId}`, token, doc)).status).toBe(422);
    expect((await call('post', `/api/v1/analyze?workspace=${other.workspaceId}`, token, doc)).status).toBe(404);
    expect(await ScatterStudy.count({ where: { variantId: other.variantId } })).toBe(1);
  });

  it('answers 401 for every workspace route without a token', async () => {
    for (const route of workspaceRoutes()) {
      const url = fill(route.path, other);
      const res = await call(route.method, url, undefined, VALID_BODIES[key(route)]);
      expect({ route: key(route), status: res.status }).toEqual({ route: key(route), status: 401 });
    }
  });

  it('answers 401 for the signed-in routes outside workspaces without a token', async () => {
    for (const route of t.ctx.catalogue.routes.filter((r) => r.access.kind === 'user' || r.access.kind === 'operator')) {
      const res = await call(route.method, fill(route.path, other), undefined);
      expect({ route: key(route), status: res.status }).toEqual({ route: key(route), status: 401 });
    }
  });
});

describe('operator routes: operators only', () => {
  it('answers 403 to every workspace role and lets an operator in', async () => {
    const operator = await signUp(t.app, { workspaceName: 'Operator home' });
    await User.update({ isOperator: true }, { where: { id: operator.user.id } });
    const routes = t.ctx.catalogue.routes.filter((r) => r.access.kind === 'operator');
    expect(routes.length).toBeGreaterThanOrEqual(4);
    for (const route of routes) {
      const body = route.method === 'post' ? { reason: 'matrix check' } : undefined;
      for (const role of ROLES) {
        const res = await call(route.method, fill(route.path, other), tokens[role]!.token, body);
        expect({ route: key(route), role, status: res.status }).toEqual({ route: key(route), role, status: 403 });
      }
      const res = await call(route.method, fill(route.path, { ...other, workspaceId: NOWHERE }), operator.accessToken, body);
      expect({ route: key(route), allowed: res.status !== 403 && res.status !== 401 }).toEqual({ route: key(route), allowed: true });
    }
  });
});
