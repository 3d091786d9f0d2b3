import request from 'supertest';
import { Mesh, Variant } from '../models/init-models';
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
afterAll(async () => { await t.close(); });

const upload = (file: Buffer, name = 'cube.stl') => request(t.app).post(`${base}/meshes`).set(bearer(owner.accessToken)).attach('file', file, name);

describe('STL uploads', () => {
  it('stores a good binary and a good ASCII cube with sha256 and triangle count', async () => {
    const bin = await upload(binaryStl(cubeTriangles())).expect(201);
    expect(bin.body).toMatchObject({ format: 'binary', triangleCount: 12, byteSize: 84 + 50 * 12, sha256: expect.stringMatching(/^[0-9a-f]{64}$/) });
    const ascii = await upload(asciiStl(cubeTriangles()), 'cube-ascii.stl').expect(201);
    expect(ascii.body).toMatchObject({ format: 'ascii', triangleCount: 12, name: 'cube-ascii.stl' });
    const list = await request(t.app).get(`${base}/meshes`).set(bearer(owner.accessToken)).expect(200);
    expect(list.body).toHaveLength(2);
  });

  it('fixes and reports an inside-out cube', async () => {
    const flipped = cubeTriangles().map(([a, b, c]) => [a, c, b] as typeof a[]);
    const res = await upload(binaryStl(flipped as never)).expect(201);
    expect(res.body.report.fixed.join(' ')).toMatch(/inside.out|flipped/i);
  });

  const bad: [string, () => Buffer, number, RegExp][] = [
    ['truncated binary', () => binaryStl(cubeTriangles()).subarray(0, 84 + 50 * 12 - 7), 422, /header announces 12 triangles/],
    ['wrong header count', () => binaryStl(cubeTriangles(), 13), 422, /announces 13 triangles/],
    ['open mesh (one face missing)', () => binaryStl(cubeTriangles().slice(0, 10)), 422, /open|boundary|edge/i],
    ['NaN coordinate', () => { const tris = cubeTriangles(); tris[3][1][0] = Number.NaN; return binaryStl(tris); }, 422, /finite|NaN/i],
    ['zero triangles', () => binaryStl([]), 422, /no triangles/],
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
    const project = await request(t.app).post(`${base}/projects`).set(bearer(owner.accessToken)).send({ name: 'Mesh', category: 'other' }).expect(201);
    const part = await request(t.app).post(`${base}/projects/${project.body.id}/parts`).set(bearer(owner.accessToken)).send({ name: 'Block' }).expect(201);
    const doc = { primitives: [{ id: 'block', shape: 'mesh', meshId: mesh.body.id, scale: 0.001, density: 1000 }], spin: { axis: [0, 0, 1], rate: 5 } };
    const v = await request(t.app).post(`${base}/parts/${part.body.id}/variants`).set(bearer(owner.accessToken)).send({ document: doc }).expect(201);
    // Cube of side a: m = ρa³, I = m·a²/6 about its centre (Machinery's Handbook, rectangular prism).
    expect(v.body.report.mass).toBeCloseTo(1, 9);
    expect(v.body.report.principal.moments[0]).toBeCloseTo((1 * 0.1 ** 2) / 6, 9);
    expect(await Variant.count({ where: { partId: part.body.id } })).toBe(1);
  });
});
