import type { PlacedPiece } from './part-mass-properties';
import { primitiveSupport } from './primitive-support';

/**
 * How far the part's material reaches along the unit direction u (part frame, m): the largest x·u
 * over every added primitive (removals only take material away, so they never extend it; a point
 * mass counts at its position). Support functions of the shapes; mesh vertices directly.
 */
export function partReach(pieces: readonly PlacedPiece[], u: ArrayLike<number>): number {
  let best = -Infinity;
  for (const piece of pieces) {
    if (piece.sign < 0) continue;
    const p = piece.primitive,
      r = piece.rotation;
    const base = p.position[0] * u[0] + p.position[1] * u[1] + p.position[2] * u[2];
    // Direction in the local frame: Rᵀu.
    const lx = r[0] * u[0] + r[3] * u[1] + r[6] * u[2];
    const ly = r[1] * u[0] + r[4] * u[1] + r[7] * u[2];
    const lz = r[2] * u[0] + r[5] * u[1] + r[8] * u[2];
    let h: number;
    if (piece.meshVertices) {
      h = -Infinity;
      const v = piece.meshVertices;
      for (let i = 0; i < v.length; i += 3) h = Math.max(h, v[i] * lx + v[i + 1] * ly + v[i + 2] * lz);
    } else {
      h = primitiveSupport(p.shape, piece.dimensions, lx, ly, lz);
    }
    best = Math.max(best, base + h);
  }
  return best;
}

/** Extent of the part along u: reach(u) + reach(−u) (m). */
export function partExtent(pieces: readonly PlacedPiece[], u: ArrayLike<number>): number {
  return partReach(pieces, u) + partReach(pieces, [-u[0], -u[1], -u[2]]);
}
