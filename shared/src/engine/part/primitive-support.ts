import type { PrimitiveShape } from '../../schemas/part-document';

/**
 * Support function h(u) = max over the solid of x·u, for a unit direction u in the shape's LOCAL
 * frame, from its dimensions (DIMENSION_NAMES order) — the solid's reach in that direction from the
 * local origin (m). Exact for every analytic shape (convex shapes and the torus alike); used for
 * lengths and diameters of the category checks. Mesh reach is taken from its vertices by the caller.
 */
export function primitiveSupport(shape: PrimitiveShape, d: ArrayLike<number>, ux: number, uy: number, uz: number): number {
  const radial = Math.hypot(ux, uy);
  switch (shape) {
    case 'box':
      return 0.5 * (d[0] * Math.abs(ux) + d[1] * Math.abs(uy) + d[2] * Math.abs(uz));
    case 'cylinder':
      return d[0] * radial + 0.5 * d[1] * Math.abs(uz);
    case 'cone':
      return Math.max(d[0] * radial, d[2] * radial + d[1] * uz);
    case 'sphere':
      return d[0];
    case 'ellipsoid':
      return Math.hypot(d[0] * ux, d[1] * uy, d[2] * uz);
    case 'torus':
      return d[0] * radial + d[1];
    case 'capsule':
      return d[0] + 0.5 * d[1] * Math.abs(uz);
    default:
      return 0;
  }
}
