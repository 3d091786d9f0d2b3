import request from 'supertest';
import { AuditEvent, Membership } from '../models/init-models';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

async function workspaceWith(roles: ('owner' | 'admin' | 'designer' | 'reviewer')[]) {
  const owner = await signUp(t.app);
  const others = [];
  for (const role of roles) {
    const s = await signUp(t.app);
    const m = await Membership.create({ workspaceId: owner.workspace.id, userId: s.user.id, role });
    others.push({ ...s, memberId: m.id, role });
  }
  const ownerMember = await Membership.findOne({ where: { workspaceId: owner.workspace.id, userId: owner.user.id } });
  return { owner: { ...owner, memberId: ownerMember!.id }, others, base: `/api/v1/workspaces/${owner.workspace.id}` };
}

describe('members', () => {
  it('lists members with name, e-mail, role and joined date', async () => {
    const { owner, others, base } = await workspaceWith(['designer']);
    const res = await request(t.app).get(`${base}/members`).set(bearer(others[0].accessToken)).expect(200);
    expect(res.body).toEqual([
      expect.objectContaining({
        id: owner.memberId,
        email: owner.user.email,
        name: owner.user.name,
        role: 'owner',
        joinedAt: expect.any(String),
      }),
      expect.objectContaining({ id: others[0].memberId, role: 'designer' }),
    ]);
  });

  it('changes a role and writes an audit event with who, what and the target', async () => {
    const { owner, others, base } = await workspaceWith(['designer']);
    const res = await request(t.app)
      .patch(`${base}/members/${others[0].memberId}`)
      .set(bearer(owner.accessToken))
      .send({ role: 'reviewer' })
      .expect(200);
    expect(res.body.role).toBe('reviewer');
    const event = await AuditEvent.findOne({ where: { workspaceId: owner.workspace.id, action: 'member.role_changed' } });
    expect(event).toMatchObject({
      actorId: owner.user.id,
      targetType: 'member',
      targetId: others[0].memberId,
      targetLabel: others[0].user.email,
      details: { from: 'designer', to: 'reviewer' },
    });
    expect(event!.createdAt).toBeInstanceOf(Date);
  });

  it('never lets the last owner be demoted or removed', async () => {
    const { owner, base } = await workspaceWith([]);
    const demote = await request(t.app)
      .patch(`${base}/members/${owner.memberId}`)
      .set(bearer(owner.accessToken))
      .send({ role: 'admin' })
      .expect(409);
    expect(demote.body.error.code).toBe('last_owner');
    await request(t.app).delete(`${base}/members/${owner.memberId}`).set(bearer(owner.accessToken)).expect(409);
    expect((await Membership.findByPk(owner.memberId))!.role).toBe('owner');
  });

  it('lets an owner step down once another owner exists', async () => {
    const { owner, others, base } = await workspaceWith(['owner']);
    await request(t.app).patch(`${base}/members/${owner.memberId}`).set(bearer(owner.accessToken)).send({ role: 'designer' }).expect(200);
    // Now the other owner is the last one.
    await request(t.app).delete(`${base}/members/${others[0].memberId}`).set(bearer(others[0].accessToken)).expect(409);
  });

  it('keeps owners out of an admin’s reach', async () => {
    const { owner, others, base } = await workspaceWith(['admin', 'designer']);
    const admin = others[0];
    await request(t.app).patch(`${base}/members/${owner.memberId}`).set(bearer(admin.accessToken)).send({ role: 'designer' }).expect(403);
    await request(t.app).delete(`${base}/members/${owner.memberId}`).set(bearer(admin.accessToken)).expect(403);
    await request(t.app).patch(`${base}/members/${others[1].memberId}`).set(bearer(admin.accessToken)).send({ role: 'owner' }).expect(403);
    await request(t.app)
      .patch(`${base}/members/${others[1].memberId}`)
      .set(bearer(admin.accessToken))
      .send({ role: 'reviewer' })
      .expect(200);
  });

  it('removes a member, who then gets 404 for the workspace; the removal is audited', async () => {
    const { owner, others, base } = await workspaceWith(['designer']);
    await request(t.app).delete(`${base}/members/${others[0].memberId}`).set(bearer(owner.accessToken)).expect(204);
    await request(t.app).get(`${base}/members`).set(bearer(others[0].accessToken)).expect(404);
    expect(
      await AuditEvent.count({ where: { workspaceId: owner.workspace.id, action: 'member.removed', targetId: others[0].memberId } }),
    ).toBe(1);
  });

  it('rejects an unknown role naming the field', async () => {
    const { owner, others, base } = await workspaceWith(['designer']);
    const res = await request(t.app)
      .patch(`${base}/members/${others[0].memberId}`)
      .set(bearer(owner.accessToken))
      .send({ role: 'superuser' })
      .expect(400);
    expect(res.body.error.field).toBe('role');
  });
});

describe('audit trail', () => {
  it('pages and filters by action, actor and time', async () => {
    const { owner, others, base } = await workspaceWith(['designer', 'reviewer']);
    for (const o of others)
      await request(t.app).patch(`${base}/members/${o.memberId}`).set(bearer(owner.accessToken)).send({ role: 'admin' }).expect(200);
    const page1 = await request(t.app).get(`${base}/audit`).query({ pageSize: 1 }).set(bearer(owner.accessToken)).expect(200);
    expect(page1.body).toMatchObject({ total: 3, page: 1, pageSize: 1 });
    expect(page1.body.items[0].action).toBe('member.role_changed'); // newest first
    const changes = await request(t.app)
      .get(`${base}/audit`)
      .query({ action: 'member.role_changed' })
      .set(bearer(owner.accessToken))
      .expect(200);
    expect(changes.body.total).toBe(2);
    const prefix = await request(t.app).get(`${base}/audit`).query({ action: 'member.' }).set(bearer(owner.accessToken)).expect(200);
    expect(prefix.body.total).toBe(2);
    const byActor = await request(t.app)
      .get(`${base}/audit`)
      .query({ actor: others[0].user.id })
      .set(bearer(owner.accessToken))
      .expect(200);
    expect(byActor.body.total).toBe(0);
    const future = await request(t.app)
      .get(`${base}/audit`)
      .query({ from: new Date(Date.now() + 60_000).toISOString() })
      .set(bearer(owner.accessToken))
      .expect(200);
    expect(future.body.total).toBe(0);
    const bad = await request(t.app).get(`${base}/audit`).query({ from: 'yesterday' }).set(bearer(owner.accessToken)).expect(400);
    expect(bad.body.error.field).toBe('from');
  });
});
