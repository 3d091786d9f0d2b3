import { Box3, BufferGeometry, Vector3 } from 'three';
import type { Primitive } from '@tumblewise/shared';
import { primitiveGeometry } from './primitive-geometry';

// The local frames are those of PRODUCT.md ("Shapes and their local frames"); the volumes are the
// closed forms of a mathematics handbook (e.g. CRC Standard Mathematical Tables: cylinder πr²L,
// frustum πh(R² + Rr + r²)/3, sphere 4πr³/3, ellipsoid 4πabc/3, torus 2π²Rr², capsule
// πr²L + 4πr³/3). A tessellated solid falls short of them by the faceting error, well under 1 %
// at 48 segments; the signed volume is positive only when every face points outwards.
const base = {
  position: [0, 0, 0] as [number, number, number],
  rotationDeg: [0, 0, 0] as [number, number, number],
  mode: 'add' as const,
  density: 1000,
};
const prim = (p: Record<string, unknown>) => ({ ...base, id: 'p', ...p }) as unknown as Primitive;

function bounds(g: BufferGeometry): Box3 {
  g.computeBoundingBox();
  return g.boundingBox!;
}

/** Signed volume by the divergence theorem: the sum of tetrahedra from the origin to each triangle. */
function signedVolume(g: BufferGeometry): number {
  const pos = g.getAttribute('position');
  const index = g.getIndex();
  const n = index ? index.count : pos.count;
  const at = (k: number) => new Vector3().fromBufferAttribute(pos, index ? index.getX(k) : k);
  let v = 0;
  for (let k = 0; k < n; k += 3) v += at(k).dot(at(k + 1).cross(at(k + 2))) / 6;
  return v;
}

function expectBox(g: BufferGeometry, min: number[], max: number[], tolerance = 1e-9): void {
  const b = bounds(g);
  [b.min.x, b.min.y, b.min.z].forEach((v, i) => expect(Math.abs(v - min[i])).toBeLessThanOrEqual(tolerance));
  [b.max.x, b.max.y, b.max.z].forEach((v, i) => expect(Math.abs(v - max[i])).toBeLessThanOrEqual(tolerance));
}

const within = (actual: number, expected: number, relative: number) =>
  expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(relative);

describe('primitiveGeometry', () => {
  it('draws a box centred with its edges along x, y, z', () => {
    const g = primitiveGeometry(prim({ shape: 'box', size: [0.02, 0.04, 0.1] }))!;
    expectBox(g, [-0.01, -0.02, -0.05], [0.01, 0.02, 0.05]);
    within(signedVolume(g), 0.02 * 0.04 * 0.1, 1e-6); // float32 positions
  });

  it('draws a cylinder centred along local z', () => {
    const g = primitiveGeometry(prim({ shape: 'cylinder', radius: 0.0135, length: 0.19 }))!;
    expectBox(g, [-0.0135, -0.0135, -0.095], [0.0135, 0.0135, 0.095], 1e-6);
    within(signedVolume(g), Math.PI * 0.0135 ** 2 * 0.19, 0.01);
  });

  it('draws a tube with its bore open, the annulus only', () => {
    const g = primitiveGeometry(prim({ shape: 'cylinder', radius: 0.02, innerRadius: 0.015, length: 0.3 }))!;
    expectBox(g, [-0.02, -0.02, -0.15], [0.02, 0.02, 0.15], 1e-6);
    const pos = g.getAttribute('position');
    const radii = Array.from({ length: pos.count }, (_, i) => Math.hypot(pos.getX(i), pos.getY(i)));
    expect(Math.min(...radii)).toBeCloseTo(0.015, 6);
    expect(Math.max(...radii)).toBeCloseTo(0.02, 6);
    within(signedVolume(g), Math.PI * (0.02 ** 2 - 0.015 ** 2) * 0.3, 0.01);
  });

  it('puts the cone base centre at the origin and the apex toward +z', () => {
    const g = primitiveGeometry(prim({ shape: 'cone', radius: 0.03, length: 0.12 }))!;
    expectBox(g, [-0.03, -0.03, 0], [0.03, 0.03, 0.12], 1e-6);
    const pos = g.getAttribute('position');
    for (let i = 0; i < pos.count; i++) {
      // The apex ring has radius 0; the base ring at z = 0 has the full radius.
      if (Math.abs(pos.getZ(i) - 0.12) < 1e-9) expect(Math.hypot(pos.getX(i), pos.getY(i))).toBeLessThan(1e-9);
    }
    within(signedVolume(g), (Math.PI * 0.03 ** 2 * 0.12) / 3, 0.01);
  });

  it('draws a frustum with its top radius at +z', () => {
    const g = primitiveGeometry(prim({ shape: 'cone', radius: 0.03, topRadius: 0.01, length: 0.05 }))!;
    const pos = g.getAttribute('position');
    const top = Array.from({ length: pos.count }, (_, i) => i)
      .filter((i) => Math.abs(pos.getZ(i) - 0.05) < 1e-9)
      .map((i) => Math.hypot(pos.getX(i), pos.getY(i)));
    expect(Math.max(...top)).toBeCloseTo(0.01, 9);
    within(signedVolume(g), (Math.PI * 0.05 * (0.03 ** 2 + 0.03 * 0.01 + 0.01 ** 2)) / 3, 0.01);
  });

  it('draws spheres and ellipsoids centred, the ellipsoid with semi-axes along x, y, z', () => {
    const s = primitiveGeometry(prim({ shape: 'sphere', radius: 0.04 }))!;
    expectBox(s, [-0.04, -0.04, -0.04], [0.04, 0.04, 0.04], 1e-6);
    within(signedVolume(s), (4 / 3) * Math.PI * 0.04 ** 3, 0.01);
    const e = primitiveGeometry(prim({ shape: 'ellipsoid', semiAxes: [0.05, 0.03, 0.02] }))!;
    expectBox(e, [-0.05, -0.03, -0.02], [0.05, 0.03, 0.02], 1e-6);
    within(signedVolume(e), (4 / 3) * Math.PI * 0.05 * 0.03 * 0.02, 0.01);
  });

  it('lays the torus ring in the local xy-plane', () => {
    const g = primitiveGeometry(prim({ shape: 'torus', majorRadius: 0.11, minorRadius: 0.008 }))!;
    expectBox(g, [-0.118, -0.118, -0.008], [0.118, 0.118, 0.008], 1e-4);
    // 24 segments round the tube: an inscribed 24-gon has (24/2π)·sin(2π/24) = 98.9 % of the circle's area.
    within(signedVolume(g), 2 * Math.PI ** 2 * 0.11 * 0.008 ** 2, 0.02);
  });

  it('draws a capsule centred along local z, length being the straight part', () => {
    const g = primitiveGeometry(prim({ shape: 'capsule', radius: 0.01, length: 0.08 }))!;
    expectBox(g, [-0.01, -0.01, -0.05], [0.01, 0.01, 0.05], 1e-6);
    within(signedVolume(g), Math.PI * 0.01 ** 2 * 0.08 + (4 / 3) * Math.PI * 0.01 ** 3, 0.01);
  });

  it('builds an inline mesh from its vertices and triangles, scaled', () => {
    // A right tetrahedron with legs of 10 (mm, scale 0.001): volume 10³/6 mm³.
    const g = primitiveGeometry(
      prim({
        shape: 'mesh',
        scale: 0.001,
        vertices: [
          [0, 0, 0],
          [10, 0, 0],
          [0, 10, 0],
          [0, 0, 10],
        ],
        triangles: [
          [0, 2, 1],
          [0, 1, 3],
          [0, 3, 2],
          [1, 2, 3],
        ],
      }),
    )!;
    expectBox(g, [0, 0, 0], [0.01, 0.01, 0.01], 1e-9);
    within(signedVolume(g), 1e-6 / 6, 1e-6);
  });

  it('has no geometry for a point mass or an uploaded mesh', () => {
    expect(
      primitiveGeometry({ id: 'tape', shape: 'point', mass: 0.003, position: [0, 0, 0], rotationDeg: [0, 0, 0], mode: 'add' } as Primitive),
    ).toBeNull();
    expect(primitiveGeometry(prim({ shape: 'mesh', meshId: 'm1', scale: 1 }))).toBeNull();
  });
});
