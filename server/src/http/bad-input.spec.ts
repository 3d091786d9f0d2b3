import request from 'supertest';
import { Invitation, Project, User, Workspace } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
beforeAll(async () => {
  t = await startTestApp({ JSON_BODY_LIMIT: '16kb' });
  owner = await signUp(t.app);
});
afterAll(async () => {
  await t.close();
});

const good = { workspaceName: 'Valid Lab', name: 'Valid Person', email: 'valid@example.test', password: 'valid-password-1' };
const SQL = "x'); DROP TABLE users; --";

/** Counts of every table a refused sign-up could have written to. */
const counts = async () => ({ users: await User.count(), workspaces: await Workspace.count() });

describe('sign-up refuses bad input naming the field, and writes nothing', () => {
  const cases: [string, Record<string, unknown>, string][] = [
    ['missing e-mail', { ...good, email: undefined }, 'email'],
    ['missing workspace name', { ...good, workspaceName: undefined }, 'workspaceName'],
    ['e-mail of the wrong type', { ...good, email: 42 }, 'email'],
    ['password of the wrong type', { ...good, password: ['a'] }, 'password'],
    ['SQL-looking e-mail', { ...good, email: SQL }, 'email'],
    ['very long name', { ...good, name: 'n'.repeat(5000) }, 'name'],
    ['very long e-mail', { ...good, email: `${'a'.repeat(300)}@example.test` }, 'email'],
    ['control characters in a name', { ...good, name: 'Bad\u0000Name' }, 'name'],
    ['blank workspace name', { ...good, workspaceName: '   ' }, 'workspaceName'],
    ['unicode password too long in bytes', { ...good, password: '😀'.repeat(20) }, 'password'],
    ['null body field', { ...good, name: null }, 'name'],
  ];
  it.each(cases)('%s → 400 naming %s', async (_label, body, field) => {
    const before = await counts();
    const res = await request(t.app).post('/api/v1/auth/signup').send(body).expect(400);
    expect(res.body.error).toMatchObject({ code: 'invalid_input', field });
    expect(res.body.error.message).toEqual(expect.stringContaining(field));
    expect(await counts()).toEqual(before);
  });

  it('a body that is not JSON → 400, an oversized body → 413, both without a row', async () => {
    const before = await counts();
    const broken = await request(t.app).post('/api/v1/auth/signup').set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(broken.body.error.code).toBe('invalid_json');
    const huge = await request(t.app)
      .post('/api/v1/auth/signup')
      .send({ ...good, name: 'x'.repeat(20_000) })
      .expect(413);
    expect(huge.body.error.code).toBe('too_large');
    const array = await request(t.app).post('/api/v1/auth/signup').send([good]).expect(400);
    expect(array.body.error.code).toBe('invalid_input');
    expect(await counts()).toEqual(before);
  });

  it('stores unicode and SQL-looking text in a name verbatim (it is data, not a query)', async () => {
    const name = "Zoë Ōtsuka-Łęcka 🏏 O'Brien; DROP TABLE users";
    const s = await signUp(t.app, { name, workspaceName: `Ateliér ${SQL}`.slice(0, 80) });
    const me = await request(t.app).get('/api/v1/me').set(bearer(s.accessToken)).expect(200);
    expect(me.body.user.name).toBe(name);
    expect(await User.count()).toBeGreaterThan(0);
  });
});

describe('workspace routes refuse bad input', () => {
  it('invitation: bad e-mail, bad role → 400 naming the field, no invitation written', async () => {
    const base = `/api/v1/workspaces/${owner.workspace.id}`;
    const before = await Invitation.count();
    for (const [body, field] of [
      [{ email: 'not-an-address', role: 'designer' }, 'email'],
      [{ email: 'a@example.test', role: SQL }, 'role'],
      [{ email: 'a@example.test' }, 'role'],
    ] as const) {
      const res = await request(t.app).post(`${base}/invitations`).set(bearer(owner.accessToken)).send(body).expect(400);
      expect(res.body.error.field).toBe(field);
    }
    expect(await Invitation.count()).toBe(before);
  });

  it('project: unknown category, long name → 400, nothing written', async () => {
    const base = `/api/v1/workspaces/${owner.workspace.id}`;
    const before = await Project.count();
    expect(
      (await request(t.app).post(`${base}/projects`).set(bearer(owner.accessToken)).send({ name: 'P', category: 'trebuchet' }).expect(400))
        .body.error.field,
    ).toBe('category');
    expect(
      (
        await request(t.app)
          .post(`${base}/projects`)
          .set(bearer(owner.accessToken))
          .send({ name: 'p'.repeat(121), category: 'bat' })
          .expect(400)
      ).body.error.field,
    ).toBe('name');
    expect(await Project.count()).toBe(before);
  });

  it('malformed ids in the path are 404, never a server error', async () => {
    for (const id of ['not-a-uuid', "1' OR '1'='1", '%00', 'ñ'.repeat(40)]) {
      const res = await request(t.app)
        .get(`/api/v1/workspaces/${encodeURIComponent(id)}/members`)
        .set(bearer(owner.accessToken));
      expect(res.status).toBe(404);
      const member = await request(t.app)
        .delete(`/api/v1/workspaces/${owner.workspace.id}/members/${encodeURIComponent(id)}`)
        .set(bearer(owner.accessToken));
      expect(member.status).toBe(404);
    }
  });

  it('bad query values name the field', async () => {
    const res = await request(t.app)
      .get(`/api/v1/workspaces/${owner.workspace.id}/audit`)
      .query({ page: 'first' })
      .set(bearer(owner.accessToken))
      .expect(400);
    expect(res.body.error.field).toBe('page');
    const size = await request(t.app)
      .get(`/api/v1/workspaces/${owner.workspace.id}/audit`)
      .query({ pageSize: 100000 })
      .set(bearer(owner.accessToken))
      .expect(400);
    expect(size.body.error.field).toBe('pageSize');
  });
});

describe('errors are JSON without internals', () => {
  it('an unknown API path is a JSON 404; no stack, no framework header', async () => {
    const res = await request(t.app).get('/api/v1/no/such/thing').expect(404);
    expect(res.body.error.code).toBe('no_such_route');
    expect(JSON.stringify(res.body)).not.toMatch(/at \w+ \(|node_modules/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('sends the security headers and no open CORS', async () => {
    const res = await request(t.app).get('/api/v1/health').set('Origin', 'https://elsewhere.example');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});
