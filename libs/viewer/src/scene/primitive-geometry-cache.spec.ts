import { Box3, type BufferGeometry } from 'three';
import type { Primitive } from '@tumblewise/shared';
import { CACHED_GEOMETRY, disposeObject } from './dispose-object';
import { PrimitiveGeometryCache } from './primitive-geometry-cache';
import { Mesh, Group } from 'three';

const prim = (p: Record<string, unknown>) =>
  ({ id: 'p', position: [0, 0, 0], rotationDeg: [0, 0, 0], mode: 'add', density: 1000, ...p }) as unknown as Primitive;

function disposals(g: BufferGeometry): { count: number } {
  const seen = { count: 0 };
  g.addEventListener('dispose', () => seen.count++);
  return seen;
}

describe('PrimitiveGeometryCache', () => {
  it('gives the same geometry again when only placement, mass or mode changed', () => {
    const cache = new PrimitiveGeometryCache();
    const first = cache.geometryOf(prim({ shape: 'cylinder', radius: 0.02, length: 0.3 }))!;
    cache.keepOnly();
    const moved = cache.geometryOf(
      prim({
        shape: 'cylinder',
        radius: 0.02,
        length: 0.3,
        id: 'other',
        position: [0.1, 0, 0],
        rotationDeg: [0, 90, 0],
        density: 2700,
        mode: 'remove',
      }),
    )!;
    expect(moved).toBe(first);
    expect(first.userData[CACHED_GEOMETRY]).toBe(true);
  });

  it('builds a new geometry when a dimension changes, and frees the old one after the drawing', () => {
    const cache = new PrimitiveGeometryCache();
    const old = cache.geometryOf(prim({ shape: 'box', size: [0.3, 0.3, 0.04] }))!;
    const freed = disposals(old);
    cache.keepOnly();
    const thicker = cache.geometryOf(prim({ shape: 'box', size: [0.3, 0.3, 0.041] }))!;
    expect(thicker).not.toBe(old);
    // The new box is 41 mm thick (its bounding box), the old one stays until the drawing ends.
    expect(new Box3().setFromBufferAttribute(thicker.getAttribute('position') as never).max.z).toBeCloseTo(0.0205, 7); // float32 buffer
    expect(freed.count).toBe(0);
    cache.keepOnly();
    expect(freed.count).toBe(1);
    expect(cache.size).toBe(1);
  });

  it('is not emptied by disposing a drawn scene, and frees everything when disposed itself', () => {
    const cache = new PrimitiveGeometryCache();
    const g = cache.geometryOf(prim({ shape: 'sphere', radius: 0.05 }))!;
    const freed = disposals(g);
    cache.keepOnly();
    const root = new Group();
    root.add(new Mesh(g));
    disposeObject(root);
    expect(freed.count).toBe(0);
    expect(cache.geometryOf(prim({ shape: 'sphere', radius: 0.05 }))).toBe(g);
    cache.dispose();
    expect(freed.count).toBe(1);
  });

  it('does not keep inline meshes (their key would be the whole vertex list)', () => {
    const cache = new PrimitiveGeometryCache();
    const mesh = prim({
      shape: 'mesh',
      vertices: [
        [0, 0, 0],
        [1, 0, 0],
        [0, 1, 0],
        [0, 0, 1],
      ],
      triangles: [
        [0, 2, 1],
        [0, 1, 3],
        [0, 3, 2],
        [1, 2, 3],
      ],
    });
    const a = cache.geometryOf(mesh)!;
    cache.keepOnly();
    expect(cache.geometryOf(mesh)).not.toBe(a);
    expect(cache.size).toBe(0);
  });
});
