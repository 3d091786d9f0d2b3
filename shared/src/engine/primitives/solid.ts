import type { Mat3 } from '../linear/mat3';
import type { Vec3 } from '../linear/vec3';

/**
 * Mass properties of a shape at unit density (1 kg/m³) in the shape's local frame:
 * volume (m³), centroid (m), and the inertia tensor about the centroid (kg·m² per kg/m³, i.e. m⁵),
 * with the convention I = ∫((r·r)E − r rᵀ) dV, so off-diagonal entries are −∫xy dV.
 * Multiply volume and inertia by the density to get mass (kg) and inertia (kg·m²).
 */
export interface Solid {
  volume: number;
  centroid: Vec3;
  inertia: Mat3;
}

/** A new zero solid. */
export function createSolid(): Solid {
  return { volume: 0, centroid: [0, 0, 0], inertia: [0, 0, 0, 0, 0, 0, 0, 0, 0] };
}

/** out = a diagonal solid: volume V, centroid on the z axis at zc, principal moments (ixx, iyy, izz) at unit density. */
export function setAxialSolid(out: Solid, volume: number, zc: number, ixx: number, iyy: number, izz: number): Solid {
  out.volume = volume;
  out.centroid[0] = 0;
  out.centroid[1] = 0;
  out.centroid[2] = zc;
  const j = out.inertia;
  j.fill(0);
  j[0] = ixx;
  j[4] = iyy;
  j[8] = izz;
  return out;
}

/**
 * out = outer minus inner, both diagonal and sharing one centroid on the z axis (superposition with
 * negative mass: a hollow box, a tube, a shell). Precondition: inner lies inside outer.
 */
export function subtractConcentric(out: Solid, outer: Solid, inner: Solid): Solid {
  const v = outer.volume - inner.volume;
  const jo = outer.inertia,
    ji = inner.inertia;
  return setAxialSolid(out, v, outer.centroid[2], jo[0] - ji[0], jo[4] - ji[4], jo[8] - ji[8]);
}
