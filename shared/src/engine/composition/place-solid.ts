import { rotateTensor } from '../linear/mat3';
import type { Solid } from '../primitives/solid';
import { createBody, type Body } from './body';

/**
 * out = a unit-density local solid placed in the part: scaled by `density` (kg/m³, with the sign −1
 * for a removal), rotated by R (local → part, row-major 3×3) and moved so the local origin sits at
 * `position` (m). Centre: c = position + R·c_local; inertia about c: ρ·R J Rᵀ (tensor rotation).
 */
export function placeSolid(
  out: Body = createBody(),
  solid: Solid,
  density: number,
  rotation: ArrayLike<number>,
  position: ArrayLike<number>,
): Body {
  const c = solid.centroid,
    r = rotation;
  const x = c[0],
    y = c[1],
    z = c[2];
  out.center[0] = position[0] + r[0] * x + r[1] * y + r[2] * z;
  out.center[1] = position[1] + r[3] * x + r[4] * y + r[5] * z;
  out.center[2] = position[2] + r[6] * x + r[7] * y + r[8] * z;
  out.volume = density < 0 ? -solid.volume : solid.volume;
  out.mass = density * solid.volume;
  rotateTensor(out.inertia, r, solid.inertia);
  const j = out.inertia;
  for (let i = 0; i < 9; i++) j[i] *= density;
  return out;
}
