import type { PrimitiveShape } from '@tumblewise/shared';
import { cloneJson, type DraftPrimitive } from './draft-document';

/** Density a new primitive starts with (kg/m³), about that of a light hardwood; the designer sets the real one. */
export const STARTING_DENSITY = 700;

/** Starting dimensions of each shape (SI, m), a hand-sized piece the designer then edits. */
const STARTING_DIMENSIONS: Record<PrimitiveShape, Record<string, unknown>> = {
  box: { size: [0.05, 0.03, 0.02] },
  cylinder: { radius: 0.015, length: 0.2 },
  cone: { radius: 0.02, length: 0.08 },
  sphere: { radius: 0.03 },
  ellipsoid: { semiAxes: [0.04, 0.03, 0.02] },
  torus: { majorRadius: 0.1, minorRadius: 0.01 },
  capsule: { radius: 0.015, length: 0.1 },
  point: {},
  mesh: { scale: 0.001 },
};

/** An id not yet used in `taken`: `cylinder-1`, `cylinder-2`, ... */
export function freshId(base: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  for (let n = 1; ; n++) {
    const id = `${base}-${n}`;
    if (!used.has(id)) return id;
  }
}

/** A new primitive of `shape` at the origin, in add mode, with a starting density (a point gets 10 g). */
export function newPrimitive(shape: PrimitiveShape, takenIds: Iterable<string>): DraftPrimitive {
  const id = freshId(shape, takenIds);
  const placement = { position: [0, 0, 0], rotationDeg: [0, 0, 0] };
  if (shape === 'point') return { id, shape, ...placement, mass: 0.01, mode: 'add' };
  return { id, shape, ...cloneJson(STARTING_DIMENSIONS[shape]), ...placement, density: STARTING_DENSITY, mode: 'add' };
}
