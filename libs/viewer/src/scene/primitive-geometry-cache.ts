import type { BufferGeometry } from 'three';
import type { Primitive } from '@tumblewise/shared';
import { CACHED_GEOMETRY } from './dispose-object';
import { primitiveGeometry } from './primitive-geometry';

/** Fields that do not change a primitive's shape in its local frame (placement, mass, mode, scatter). */
const NOT_SHAPE = new Set(['id', 'position', 'rotationDeg', 'density', 'materialId', 'mass', 'mode', 'tolerance']);

/**
 * Geometries of the primitives of the latest drawings, by shape and dimensions. The part is drawn
 * again at every edit; typing into one field changes one primitive, so the others keep their
 * geometry (and the renderer its uploaded buffers) instead of being rebuilt and uploaded again —
 * tens of milliseconds for a 50-primitive part on a CPU renderer. After each drawing, `keepOnly`
 * frees what that drawing no longer used. Inline meshes are not kept (their key would be the
 * whole vertex list); uploaded meshes have their own cache.
 */
export class PrimitiveGeometryCache {
  private kept = new Map<string, BufferGeometry>();
  private used = new Map<string, BufferGeometry>();

  /** The geometry of `p`, from an earlier drawing when its shape and dimensions are the same. */
  readonly geometryOf = (p: Primitive): BufferGeometry | null => {
    if (p.shape === 'mesh' || p.shape === 'point') return primitiveGeometry(p);
    const key = shapeKey(p);
    const geometry = this.used.get(key) ?? this.kept.get(key) ?? primitiveGeometry(p);
    if (!geometry) return null;
    geometry.userData[CACHED_GEOMETRY] = true;
    this.used.set(key, geometry);
    return geometry;
  };

  /** Ends a drawing: frees the geometries it did not use; the next drawing starts from those it did. */
  keepOnly(): void {
    for (const [key, geometry] of this.kept) if (!this.used.has(key)) geometry.dispose();
    this.kept = this.used;
    this.used = new Map();
  }

  /** How many geometries are kept for the next drawing. */
  get size(): number {
    return this.kept.size;
  }

  dispose(): void {
    for (const geometry of new Set([...this.kept.values(), ...this.used.values()])) geometry.dispose();
    this.kept.clear();
    this.used.clear();
  }
}

function shapeKey(p: Primitive): string {
  return JSON.stringify(p, (key, value) => (NOT_SHAPE.has(key) ? undefined : value));
}
