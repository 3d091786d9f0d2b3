import { setAxialSolid, type Solid } from './solid';

/**
 * Solid ellipsoid with semi-axes (a, b, c) along local x, y, z, centred on the origin; unit density.
 * V = (4/3)πabc, Ixx = V(b² + c²)/5 and cyclic — Machinery's Handbook 31st ed., ellipsoid.
 * Precondition: a, b, c > 0 (m).
 */
export function ellipsoidSolid(out: Solid, a: number, b: number, c: number): Solid {
  const v = (4 / 3) * Math.PI * a * b * c;
  return setAxialSolid(out, v, 0, (v * (b * b + c * c)) / 5, (v * (a * a + c * c)) / 5, (v * (a * a + b * b)) / 5);
}
