import type { Mat3 } from '../linear/mat3';
import type { Vec3 } from '../linear/vec3';

/**
 * Mass properties of one placed piece or of a whole part, in part coordinates (SI):
 * mass (kg; negative for a removal), volume (m³; negative for a removal), centre of mass (m), and the
 * inertia tensor about that centre (kg·m²), I = ∫((r·r)E − r rᵀ) dm.
 */
export interface Body {
  mass: number;
  volume: number;
  center: Vec3;
  inertia: Mat3;
}

/** A new zero body. */
export function createBody(): Body {
  return { mass: 0, volume: 0, center: [0, 0, 0], inertia: [0, 0, 0, 0, 0, 0, 0, 0, 0] };
}
