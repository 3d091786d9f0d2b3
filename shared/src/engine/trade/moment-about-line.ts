import type { Body } from '../composition/body';

/**
 * Moment of inertia (kg·m²) about the line through `point` (m) with unit direction `dir`, part frame:
 * I_line = uᵀ I_c u + m·|r⊥|², r = c − point, r⊥ its part perpendicular to u, |r⊥| = |r × u| (parallel-axis theorem;
 * e.g. Goldstein, Classical Mechanics, §5.3). Precondition: |dir| = 1.
 */
export function momentAboutLine(body: Body, point: ArrayLike<number>, dir: ArrayLike<number>): number {
  const j = body.inertia;
  const ux = dir[0],
    uy = dir[1],
    uz = dir[2];
  const own =
    ux * (j[0] * ux + j[1] * uy + j[2] * uz) + uy * (j[3] * ux + j[4] * uy + j[5] * uz) + uz * (j[6] * ux + j[7] * uy + j[8] * uz);
  const rx = body.center[0] - point[0],
    ry = body.center[1] - point[1],
    rz = body.center[2] - point[2];
  // |r⊥|² = |r × u|², free of the cancellation in |r|² − (r·u)².
  const cx = ry * uz - rz * uy,
    cy = rz * ux - rx * uz,
    cz = rx * uy - ry * ux;
  return own + body.mass * (cx * cx + cy * cy + cz * cz);
}
