import request from 'supertest';
import { AuditEvent, Membership, Mesh, Part, Project, Variant } from '../models/init-models';
import { meshInUseMessage } from '@tumblewise/shared';
import type { PartDrawing } from '../exports/part-outline';
import { stlFileName } from './mesh-routes';
import { asciiStl, binaryStl, cubeTriangles } from '../test-support/stl-fixtures';
import { bearer, signUp, startTestApp, type TestApp } from '../test-support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signUp>>;
let base = '';
beforeAll(async () => {
  t = await startTestApp({ MESH_UPLOAD_LIMIT_BYTES: '20000' });
  owner = await signUp(t.app);
  base = `/api/v1/workspaces/${owner.workspace.id}`;
});
afterAll(async () => {
  await t.close();
});

const upload = (file: Buffer, name = 'cube.stl') =>
  request(t.app).post(`${base}/meshes`).set(bearer(owner.accessToken)).attach('file', file, name);

describe('STL uploads', () => {
  it('stores a good binary and a good ASCII cube with sha256 and triangle count', async () => {
    const bin = await upload(binaryStl(cubeTriangles())).expect(201);
    expect(bin.body).toMatchObject({
      format: 'binary',
      triangleCount: 12,
      byteSize: 84 + 50 * 12,
      sha256: expect.stringMatching(/^[0-9a-f]{64}$/),
    });
    const ascii = await upload(asciiStl(cubeTriangles()), 'cube-ascii.stl').expect(201);
    expect(ascii.body).toMatchObject({ format: 'ascii', triangleCount: 12, name: 'cube-ascii.stl' });
    const list = await request(t.app).get(`${base}/meshes`).set(bearer(owner.accessToken)).expect(200);
    expect(list.body).toHaveLength(2);
  });

  it('fixes and reports an inside-out cube', async () => {
    const flipped = cubeTriangles().map(([a, b, c]) => [a, c, b] as (typeof a)[]);
    const res = await upload(binaryStl(flipped as never)).expect(201);
    expect(res.body.report.fixed.join(' ')).toMatch(/inside.out|flipped/i);
  });

  const bad: [string, () => Buffer, number, RegExp][] = [
    ['truncated binary', () => binaryStl(cubeTriangles()).subarray(0, 84 + 50 * 12 - 7), 422, /header announces 12 triangles/],
    ['wrong header count', () => binaryStl(cubeTriangles(), 13), 422, /announces 13 triangles/],
    ['open mesh (one face missing)', () => binaryStl(cubeTriangles().slice(0, 10)), 422, /open|boundary|edge/i],
    [
      'NaN coordinate',
      () => {
        const tris = cubeTriangles();
        tris[3][1][0] = Number.NaN;
        return binaryStl(tris);
      },
      422,
      /finite|NaN/i,
    ],
    ['zero triangles', () => binaryStl([]), 422, /no triangles/],
    [
      'two cubes passing through each other',
      () => binaryStl([...cubeTriangles(), ...cubeTriangles().map((t) => t.map(([x, y, z]) => [x + 0.5, y + 0.3, z + 0.2]) as typeof t)]),
      422,
      /crosses itself \(facets \d+ and \d+/,
    ],
    ['not an STL at all', () => Buffer.from('hello, this is a text file'), 422, /neither an ASCII STL/],
    ['over the size limit', () => Buffer.alloc(25000, 1), 413, /too large/],
  ];
  it.each(bad)('%s → %d, nothing stored', async (_label, make, status, message) => {
    const before = await Mesh.count();
    const res = await upload(make());
    expect(res.status).toBe(status);
    expect(res.body.error.message).toMatch(message);
    expect(await Mesh.count()).toBe(before);
  });

  it('a request without a file, or not multipart, is a 400 naming file', async () => {
    const res = await request(t.app).post(`${base}/meshes`).set(bearer(owner.accessToken)).send({ hello: 'world' }).expect(400);
    expect(res.body.error.field).toBe('file');
  });

  it('a stored mesh is usable by id in a variant: the cube of side 0.1 m at 1000 kg/m³ weighs 1 kg', async () => {
    const mesh = await upload(binaryStl(cubeTriangles(100)), 'cube-mm.stl').expect(201);
    const project = await request(t.app)
      .post(`${base}/projects`)
      .set(bearer(owner.accessToken))
      .send({ name: 'Mesh', category: 'other' })
      .expect(201);
    const part = await request(t.app)
      .post(`${base}/projects/${project.body.id}/parts`)
      .set(bearer(owner.accessToken))
      .send({ name: 'Block' })
      .expect(201);
    const doc = {
      primitives: [{ id: 'block', shape: 'mesh', meshId: mesh.body.id, scale: 0.001, density: 1000 }],
      spin: { axis: [0, 0, 1], rate: 5 },
    };
    const v = await request(t.app)
      .post(`${base}/parts/${part.body.id}/variants`)
      .set(bearer(owner.accessToken))
      .send({ document: doc })
      .expect(201);
    // Cube of side a: m = ρa³, I = m·a²/6 about its centre (Machinery's Handbook, rectangular prism).
    expect(v.body.report.mass).toBeCloseTo(1, 9);
    expect(v.body.report.principal.moments[0]).toBeCloseTo((1 * 0.1 ** 2) / 6, 9);
    expect(await Variant.count({ where: { partId: part.body.id } })).toBe(1);

    // Its PDF draws the mesh: the side view (part z up, looking along x) is the cube's 0.1 m square.
    const run = jest.spyOn(t.ctx.compute, 'run');
    const pdf = await request(t.app)
      .get(`${base}/variants/${v.body.id}/export.pdf`)
      .set(bearer(owner.accessToken))
      .buffer(true)
      .parse(asBytes)
      .expect(200);
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    const drawing = (await run.mock.results.find((r) => r.type === 'return')!.value) as PartDrawing;
    run.mockRestore();
    expect(drawing.meshesLeftOut).toBe(0);
    const [outline] = drawing.outlines;
    expect(outline.id).toBe('block');
    for (const axis of [0, 1]) {
      const along = outline.points.map((p) => p[axis]);
      expect(Math.max(...along) - Math.min(...along)).toBeCloseTo(0.1, 6);
    }
  });
});

/** Supertest reads a model/stl body as raw bytes. */
const asBytes = (res: request.Response, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

describe('reading an uploaded mesh back for drawing', () => {
  let reviewer: Awaited<ReturnType<typeof signUp>>;
  let stranger: Awaited<ReturnType<typeof signUp>>;
  const cube = binaryStl(cubeTriangles(40));
  let meshId = '';
  beforeAll(async () => {
    meshId = (await upload(cube, 'block-40mm.stl').expect(201)).body.id;
    reviewer = await signUp(t.app);
    await Membership.create({ workspaceId: owner.workspace.id, userId: reviewer.user.id, role: 'reviewer' });
    stranger = await signUp(t.app);
  });

  it('answers the stored STL bytes unchanged as model/stl, with its SHA-256 as ETag', async () => {
    const res = await request(t.app)
      .get(`${base}/meshes/${meshId}/geometry`)
      .set(bearer(owner.accessToken))
      .buffer(true)
      .parse(asBytes)
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^model\/stl/);
    expect(Buffer.compare(res.body as Buffer, cube)).toBe(0);
    const meta = await request(t.app).get(`${base}/meshes/${meshId}`).set(bearer(owner.accessToken)).expect(200);
    expect(res.headers['etag']).toBe(`"${meta.body.sha256}"`);
    // A second request with the ETag is answered 304 without the body (RFC 9110 §13.1.2, If-None-Match).
    await request(t.app)
      .get(`${base}/meshes/${meshId}/geometry`)
      .set(bearer(owner.accessToken))
      .set('If-None-Match', res.headers['etag'])
      .expect(304);
  });

  it('answers an ASCII upload as its ASCII text', async () => {
    const ascii = asciiStl(cubeTriangles());
    const id = (await upload(ascii, 'ascii.stl').expect(201)).body.id;
    const res = await request(t.app)
      .get(`${base}/meshes/${id}/geometry`)
      .set(bearer(owner.accessToken))
      .buffer(true)
      .parse(asBytes)
      .expect(200);
    expect((res.body as Buffer).toString('ascii')).toBe(ascii.toString('ascii'));
  });

  it('answers the metadata without the bytes', async () => {
    const res = await request(t.app).get(`${base}/meshes/${meshId}`).set(bearer(owner.accessToken)).expect(200);
    expect(res.body).toMatchObject({ id: meshId, name: 'block-40mm.stl', triangleCount: 12, byteSize: cube.length, format: 'binary' });
    expect(res.body).not.toHaveProperty('data');
  });

  it('lets a reviewer read the list, the metadata and the geometry, but not upload or delete', async () => {
    const token = bearer(reviewer.accessToken);
    const list = await request(t.app).get(`${base}/meshes`).set(token).expect(200);
    expect(list.body.map((m: { id: string }) => m.id)).toContain(meshId);
    await request(t.app).get(`${base}/meshes/${meshId}`).set(token).expect(200);
    const geo = await request(t.app).get(`${base}/meshes/${meshId}/geometry`).set(token).buffer(true).parse(asBytes).expect(200);
    expect((geo.body as Buffer).length).toBe(cube.length);
    const before = await Mesh.count();
    const up = await request(t.app).post(`${base}/meshes`).set(token).attach('file', cube, 'x.stl');
    expect(up.status).toBe(403);
    expect((await request(t.app).delete(`${base}/meshes/${meshId}`).set(token)).status).toBe(403);
    expect(await Mesh.count()).toBe(before);
  });

  it('answers 404 for another workspace’s mesh, an unknown id and a malformed id', async () => {
    const theirs = `/api/v1/workspaces/${stranger.workspace.id}`;
    // Someone else's workspace in the path: not a member there.
    expect((await request(t.app).get(`${base}/meshes/${meshId}/geometry`).set(bearer(stranger.accessToken))).status).toBe(404);
    // One's own workspace in the path, another workspace's mesh id.
    expect((await request(t.app).get(`${theirs}/meshes/${meshId}/geometry`).set(bearer(stranger.accessToken))).status).toBe(404);
    expect((await request(t.app).get(`${theirs}/meshes/${meshId}`).set(bearer(stranger.accessToken))).status).toBe(404);
    const unknown = await request(t.app).get(`${base}/meshes/00000000-0000-4000-8000-000000000000/geometry`).set(bearer(owner.accessToken));
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.code).toBe('not_found');
    expect((await request(t.app).get(`${base}/meshes/not-an-id/geometry`).set(bearer(owner.accessToken))).status).toBe(404);
  });

  it('names the download after the mesh, safe for a header', () => {
    expect(stlFileName('block-40mm.stl')).toBe('block-40mm.stl');
    expect(stlFileName('Wing "v2"/final')).toBe('Wing _v2_final.stl');
    expect(stlFileName('***')).toBe('_.stl');
  });
});

describe('deleting an uploaded mesh', () => {
  const token = () => bearer(owner.accessToken);
  const cubeDoc = (meshId: string) => ({
    primitives: [{ id: 'block', shape: 'mesh', meshId, scale: 0.001, density: 1000 }],
    spin: { axis: [0, 0, 1], rate: 5 },
  });
  const newPart = async (name: string, draft?: object) => {
    const project = await request(t.app)
      .post(`${base}/projects`)
      .set(token())
      .send({ name: `${name} project`, category: 'other' })
      .expect(201);
    return (
      await request(t.app)
        .post(`${base}/projects/${project.body.id}/parts`)
        .set(token())
        .send({ name, ...(draft ? { draft } : {}) })
        .expect(201)
    ).body as { id: string; projectId: string; draftVersion: number };
  };
  const deletions = (meshId: string) =>
    AuditEvent.findAll({ where: { workspaceId: owner.workspace.id, action: 'mesh.deleted', targetId: meshId } });

  it('deletes a mesh nothing uses, and the audit trail names it, its deleter and its checksum', async () => {
    const mesh = (await upload(binaryStl(cubeTriangles(30)), 'spare-block.stl').expect(201)).body;
    expect((await request(t.app).get(`${base}/meshes/${mesh.id}/usage`).set(token()).expect(200)).body).toEqual({ parts: [] });
    await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(204);
    expect(await Mesh.findByPk(mesh.id)).toBeNull();
    await request(t.app).get(`${base}/meshes/${mesh.id}`).set(token()).expect(404);
    const events = await deletions(mesh.id);
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      actorId: owner.user.id,
      targetType: 'mesh',
      targetLabel: 'spare-block.stl',
      details: { triangles: 12, sha256: mesh.sha256 },
    });
    // Deleting it again: gone, and no second entry.
    await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(404);
    expect(await deletions(mesh.id)).toHaveLength(1);
  });

  it('keeps a mesh a part’s draft uses (409 naming the part) until the draft no longer uses it', async () => {
    const mesh = (await upload(binaryStl(cubeTriangles(30)), 'grip-insert.stl').expect(201)).body;
    const part = await newPart('Grip insert trial', cubeDoc(mesh.id));
    const usage = await request(t.app).get(`${base}/meshes/${mesh.id}/usage`).set(token()).expect(200);
    expect(usage.body).toEqual({
      parts: [{ partId: part.id, projectId: part.projectId, partName: 'Grip insert trial', inDraft: true, variantNumbers: [] }],
    });
    const refused = await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(409);
    expect(refused.body.error).toMatchObject({ code: 'mesh_in_use', field: 'meshId' });
    expect(refused.body.error.message).toContain('“grip-insert.stl” is still used by Grip insert trial (its draft)');
    expect(await Mesh.findByPk(mesh.id)).not.toBeNull();
    expect(await deletions(mesh.id)).toHaveLength(0);
    // The draft swaps the mesh for a sphere: nothing uses the mesh any more.
    const sphere = { primitives: [{ id: 'ball', shape: 'sphere', radius: 0.02, density: 1000 }], spin: { axis: [0, 0, 1], rate: 5 } };
    await request(t.app)
      .patch(`${base}/parts/${part.id}`)
      .set(token())
      .send({ draftVersion: part.draftVersion, draft: sphere })
      .expect(200);
    await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(204);
    expect(await deletions(mesh.id)).toHaveLength(1);
  });

  it('keeps a mesh a saved variant was computed from, even when no draft uses it, until the part is deleted', async () => {
    const mesh = (await upload(binaryStl(cubeTriangles(30)), 'head-core.stl').expect(201)).body;
    const part = await newPart('Head core');
    await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(token())
      .send({ document: cubeDoc(mesh.id) })
      .expect(201);
    await request(t.app)
      .post(`${base}/parts/${part.id}/variants`)
      .set(token())
      .send({ document: cubeDoc(mesh.id) })
      .expect(201);
    const usage = await request(t.app).get(`${base}/meshes/${mesh.id}/usage`).set(token()).expect(200);
    expect(usage.body.parts).toEqual([expect.objectContaining({ partId: part.id, inDraft: false, variantNumbers: [1, 2] })]);
    const refused = await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(409);
    expect(refused.body.error.message).toContain('Head core (saved variants v1, v2)');
    await request(t.app).delete(`${base}/parts/${part.id}`).set(token()).expect(204);
    await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(204);
  });

  it('counts only this workspace’s parts, and answers 404 for another workspace’s mesh', async () => {
    const mesh = (await upload(binaryStl(cubeTriangles(30)), 'shared-name.stl').expect(201)).body;
    const stranger = await signUp(t.app);
    // Another workspace's draft naming our mesh id (it cannot load it, but it must not hold it either).
    const project = await Project.create({
      workspaceId: stranger.workspace.id,
      name: 'Elsewhere',
      category: 'other',
      createdById: stranger.user.id,
    });
    await Part.create({
      workspaceId: stranger.workspace.id,
      projectId: project.id,
      name: 'Elsewhere part',
      draft: cubeDoc(mesh.id) as Part['draft'],
    });
    expect((await request(t.app).get(`${base}/meshes/${mesh.id}/usage`).set(token()).expect(200)).body).toEqual({ parts: [] });
    const theirs = `/api/v1/workspaces/${stranger.workspace.id}`;
    expect((await request(t.app).delete(`${theirs}/meshes/${mesh.id}`).set(bearer(stranger.accessToken))).status).toBe(404);
    expect((await request(t.app).get(`${theirs}/meshes/${mesh.id}/usage`).set(bearer(stranger.accessToken))).status).toBe(404);
    expect(await Mesh.findByPk(mesh.id)).not.toBeNull();
    await request(t.app).delete(`${base}/meshes/${mesh.id}`).set(token()).expect(204);
  });

  it('names at most three parts in the refusal and counts the rest', () => {
    const user = (n: number) => ({
      partId: `p${n}`,
      projectId: 'x',
      partName: `Part ${n}`,
      inDraft: n % 2 === 0,
      variantNumbers: n === 1 ? [3] : [],
    });
    const message = meshInUseMessage('block.stl', { parts: [1, 2, 4, 6].map(user) });
    expect(message).toBe(
      'The mesh “block.stl” is still used by Part 1 (saved variant v3); Part 2 (its draft); Part 4 (its draft) and 1 more part, so it cannot be deleted. ' +
        'Remove it from those drafts, or delete those parts; a saved variant keeps the mesh it was computed from.',
    );
  });
});
