import fc from 'fast-check';
import RAPIER from '@dimforge/rapier3d-compat';
import { boxSolid } from '../primitives/box';
import { createSolid } from '../primitives/solid';
import { torusSolid } from '../primitives/torus';
import { sphereSolid } from '../primitives/sphere';
import { principalAxes } from '../principal/principal-axes';
import { expectAbsClose, expectArrayClose, expectRelClose } from '../testing/expect-close';
import { asciiStl, binaryStl, boxMesh, sphereMesh, toSoup, torusMesh } from '../testing/tessellate';
import { integrateIndexedMesh, integrateTriangleSoup } from './integrate-mesh';
import { meshMassProperties } from './mesh-mass-properties';
import { parseStl } from './parse-stl';
import { validateIndexedMesh } from './validate-mesh';
import { weldVertices } from './weld-vertices';

describe('mesh integration by signed tetrahedra (Kallay, J. Graphics Tools 11(2), 2006)', () => {
  it("Tonon's tetrahedron (J. Math. Stat. 1(1):8–11, 2005): published centroid and inertia tensor at unit density", () => {
    const p = [
      [8.3322, -11.86875, 0.93355],
      [0.75523, 5, 16.37072],
      [52.61236, 5, -5.3858],
      [2, 5, 3],
    ];
    let faces = [
      [1, 2, 3],
      [0, 3, 2],
      [0, 1, 3],
      [0, 2, 1],
    ];
    const e = (i: number) => [p[i][0] - p[0][0], p[i][1] - p[0][1], p[i][2] - p[0][2]];
    const [u, v, w] = [e(1), e(2), e(3)];
    const det = u[0] * (v[1] * w[2] - v[2] * w[1]) - u[1] * (v[0] * w[2] - v[2] * w[0]) + u[2] * (v[0] * w[1] - v[1] * w[0]);
    if (det < 0) faces = faces.map(([a, b, c]) => [a, c, b]);
    const s = integrateIndexedMesh(undefined, Float64Array.from(p.flat()), Uint32Array.from(faces.flat()));
    expectArrayClose(s.centroid, [15.92492, 0.78281, 3.72962], 1e-5, 16);
    // I = [[a, −c', −b'], [−c', b, −a'], [−b', −a', c]] with the published a, b, c, a', b', c'.
    const [a, b, c, a1, b1, c1] = [43520.33257, 194711.28938, 191168.76173, 4417.6615, -46343.16662, 11996.20119];
    const I = [a, -c1, -b1, -c1, b, -a1, -b1, -a1, c];
    for (let i = 0; i < 9; i++) expectAbsClose(s.inertia[i], I[i], 2e-8 * b, `I[${i}]`);
  });

  it("unit cube: V = 1, I = 1/6 about the centroid (Machinery's Handbook, rectangular prism), also translated by 1e6", () => {
    for (const shift of [0, 1e6]) {
      const m = boxMesh(1, 1, 1, [shift, -shift, shift]);
      const s = integrateIndexedMesh(undefined, m.vertices, m.triangles);
      expectRelClose(s.volume, 1, 1e-14);
      for (const k of [0, 4, 8]) expectRelClose(s.inertia[k], 1 / 6, 1e-12);
      for (const k of [1, 2, 5]) expectAbsClose(s.inertia[k], 0, 1e-12);
      expectRelClose(s.centroid[0], shift || 1, shift ? 1e-15 : 1);
    }
  });

  it('property: the mesh of a box equals the box primitive', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        fc.double({ min: 0.01, max: 2, noNaN: true }),
        (a, b, c) => {
          const m = boxMesh(a, b, c, [0.3, -0.2, 5]);
          const s = integrateIndexedMesh(undefined, m.vertices, m.triangles);
          const ref = boxSolid(createSolid(), a, b, c);
          expectRelClose(s.volume, ref.volume, 1e-13);
          expectArrayClose(s.inertia, ref.inertia, 1e-12, Math.max(ref.inertia[0], ref.inertia[4], ref.inertia[8]));
        },
      ),
      { numRuns: 200 },
    );
  });

  it("a finely tessellated torus and sphere converge to their closed forms (Machinery's Handbook) at the polygon rate 1/n²; Richardson-extrapolated to 1e-5", () => {
    const torus = (n: number) => {
      const t = torusMesh(0.11, 0.02, 2 * n, n);
      return integrateIndexedMesh(undefined, t.vertices, t.triangles);
    };
    const ref = torusSolid(createSolid(), 0.11, 0.02);
    const [c, f] = [torus(64), torus(128)];
    for (const k of [0, 8]) {
      const e1 = Math.abs(c.inertia[k] - ref.inertia[k]),
        e2 = Math.abs(f.inertia[k] - ref.inertia[k]);
      expect(e2).toBeLessThan(e1 / 3.5); // second order
      expectRelClose((4 * f.inertia[k] - c.inertia[k]) / 3, ref.inertia[k], 1e-5);
    }
    expectRelClose((4 * f.volume - c.volume) / 3, ref.volume, 1e-5);
    const sphere = (n: number) => {
      const m = sphereMesh(0.1, n, 2 * n);
      return integrateIndexedMesh(undefined, m.vertices, m.triangles);
    };
    const [sc, sf] = [sphere(64), sphere(128)];
    const sref = sphereSolid(createSolid(), 0.1);
    expectRelClose((4 * sf.inertia[0] - sc.inertia[0]) / 3, sref.inertia[0], 1e-5);
    expectRelClose(sf.inertia[0], sref.inertia[0], 2e-3);
  });

  it('soup and indexed integration agree, with and without a given reference point; out is honoured', () => {
    const t = torusMesh(1, 0.3, 40, 20);
    const soup = toSoup(t);
    const a = integrateIndexedMesh(undefined, t.vertices, t.triangles);
    const out = createSolid();
    const b = integrateTriangleSoup(out, soup);
    expect(b).toBe(out);
    const c = integrateTriangleSoup(undefined, soup, soup.length / 9, 1, [0, 0, 0]);
    expectRelClose(b.volume, a.volume, 1e-13);
    expectArrayClose(b.inertia, a.inertia, 1e-12, a.inertia[8]);
    expectArrayClose(c.inertia, a.inertia, 1e-12, a.inertia[8]);
  });

  it('agrees with rapier3d-compat trimesh mass properties at a float32 tolerance (1e-3 on meshes)', async () => {
    await RAPIER.init();
    const world = new RAPIER.World({ x: 0, y: 0, z: 0 });
    const t = torusMesh(0.11, 0.02, 96, 48);
    const rb = world.createRigidBody(RAPIER.RigidBodyDesc.dynamic());
    world.createCollider(RAPIER.ColliderDesc.trimesh(Float32Array.from(t.vertices), Uint32Array.from(t.triangles)).setDensity(1), rb);
    rb.recomputeMassPropertiesFromColliders();
    const s = integrateIndexedMesh(undefined, t.vertices, t.triangles);
    expectRelClose(rb.mass(), s.volume, 1e-3);
    const pi = rb.principalInertia();
    const ours = principalAxes(undefined, s.inertia).moments;
    const theirs = [pi.x, pi.y, pi.z].sort((x, y) => y - x);
    for (let i = 0; i < 3; i++) expectRelClose(ours[i], theirs[i], 1e-3);
  });
});

describe('mesh validation', () => {
  const cube = () => boxMesh(1, 1, 1);
  it('a closed, outward cube passes', () => {
    const m = cube();
    expect(validateIndexedMesh(m.vertices, m.triangles)).toMatchObject({ ok: true, problems: [] });
  });
  it('open: a missing triangle', () => {
    const m = cube();
    const r = validateIndexedMesh(m.vertices, m.triangles.subarray(0, 33));
    expect(r.ok).toBe(false);
    expect(r.problems.map((p) => p.code)).toContain('open');
  });
  it('inside-out: flipped and reported as fixed, then integrates to +1', () => {
    const m = cube();
    for (let t = 0; t < 12; t++) [m.triangles[3 * t + 1], m.triangles[3 * t + 2]] = [m.triangles[3 * t + 2], m.triangles[3 * t + 1]];
    const r = validateIndexedMesh(m.vertices, m.triangles);
    expect(r.ok).toBe(true);
    expect(r.problems).toEqual([expect.objectContaining({ code: 'inside_out', fixed: true })]);
    expectRelClose(integrateIndexedMesh(undefined, m.vertices, m.triangles).volume, 1, 1e-14);
  });
  it('inconsistent orientation: one triangle flipped', () => {
    const m = cube();
    [m.triangles[1], m.triangles[2]] = [m.triangles[2], m.triangles[1]];
    expect(validateIndexedMesh(m.vertices, m.triangles).problems.map((p) => p.code)).toContain('inconsistent_orientation');
  });
  it('non-manifold: an edge shared by four triangles', () => {
    const a = boxMesh(1, 1, 1, [0, 0, 0]);
    const b = boxMesh(1, 1, 1, [1, 1, 0]);
    const v = new Float64Array([...a.vertices, ...b.vertices]);
    const { vertices, triangles } = weldVertices(
      Float64Array.from(toSoup({ vertices: v, triangles: Uint32Array.from([...a.triangles, ...Array.from(b.triangles, (x) => x + 8)]) })),
      24,
    );
    expect(validateIndexedMesh(vertices, triangles).problems.map((p) => p.code)).toContain('non_manifold');
  });
  it('degenerate triangles, NaN coordinates and no triangles', () => {
    const m = cube();
    const t = Uint32Array.from([...m.triangles, 0, 0, 1]);
    expect(validateIndexedMesh(m.vertices, t).problems.map((p) => p.code)).toContain('degenerate');
    const bad = Float64Array.from(m.vertices);
    bad[4] = NaN;
    expect(validateIndexedMesh(bad, m.triangles).problems[0].code).toBe('non_finite');
    expect(validateIndexedMesh(m.vertices, new Uint32Array(0)).problems[0].code).toBe('no_triangles');
  });
});

describe('parseStl', () => {
  const soup = toSoup(torusMesh(11, 2, 24, 12)); // millimetres
  it('binary and ASCII give the same corners and, at scale 0.001, the torus in metres', () => {
    const bin = parseStl(binaryStl(soup, 'ring'));
    const asc = parseStl(asciiStl(Float32Array.from(soup), 'ring'));
    if (!bin.ok || !asc.ok) throw new Error('parse failed');
    expect(bin.mesh.format).toBe('binary');
    expect(asc.mesh.format).toBe('ascii');
    expect(asc.mesh.name).toBe('ring');
    expect(bin.mesh.triangleCount).toBe(soup.length / 9);
    expect(Array.from(asc.mesh.corners)).toEqual(Array.from(bin.mesh.corners));
    const r = meshMassProperties(bin.mesh, 0.001);
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    const t = torusMesh(0.011, 0.002, 24, 12);
    const inMetres = integrateIndexedMesh(undefined, t.vertices, t.triangles);
    expectRelClose(r.solid.volume, inMetres.volume, 1e-6); // float32 storage
    expectArrayClose(r.solid.inertia, inMetres.inertia, 1e-6, inMetres.inertia[8]);
    expectRelClose(r.bounds.max[0], 0.013, 1e-6);
  });
  it('parses into a given buffer when it is large enough', () => {
    const target = new Float32Array(soup.length + 90);
    const r = parseStl(binaryStl(soup), { target });
    expect(r.ok && r.mesh.corners).toBe(target);
  });
  it('reports a header count that does not match the size, a file too large, zero triangles, NaN and garbage', () => {
    const bytes = binaryStl(soup);
    expect(parseStl(bytes.subarray(0, bytes.length - 7)).problems[0].code).toBe('count_mismatch');
    expect(parseStl(bytes, { maxBytes: 1000 }).problems[0].code).toBe('too_large');
    expect(parseStl(bytes, { maxTriangles: 10 }).problems[0].code).toBe('too_large');
    expect(parseStl(binaryStl([])).problems[0].code).toBe('no_triangles');
    const nan = binaryStl(soup);
    new DataView(nan.buffer).setFloat32(84 + 50 * 3 + 16, NaN, true);
    expect(parseStl(nan).problems[0]).toMatchObject({ code: 'non_finite', firstTriangle: 3 });
    expect(parseStl(new TextEncoder().encode('hello')).problems[0].code).toBe('unreadable');
    expect(
      parseStl(
        new TextEncoder().encode(
          'solid x\nfacet normal 0 0 1\nouter loop\nvertex 0 0 nan\nvertex 1 0 0\nvertex 0 1 0\nendloop\nendfacet\nendsolid',
        ),
      ).problems[0].code,
    ).toBe('non_finite');
  });
  it('meshMassProperties reports an open mesh instead of integrating it', () => {
    const cube = toSoup(boxMesh(1, 1, 1));
    const r = parseStl(binaryStl(cube.subarray(0, 9 * 11)));
    if (!r.ok) throw new Error('parse failed');
    const m = meshMassProperties(r.mesh);
    expect(m.ok).toBe(false);
    expect(m.problems.map((p) => p.code)).toContain('open');
  });
});
