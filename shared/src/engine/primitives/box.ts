import { setAxialSolid, subtractConcentric, type Solid, createSolid } from './solid';

/**
 * Box of edge lengths (a, b, c) along local x, y, z, centred on the local origin; unit density.
 * Ixx = V(b² + c²)/12 and cyclic — Machinery's Handbook 31st ed., "Radius of Gyration", rectangular prism.
 * Precondition: a, b, c > 0 (m).
 */
export function boxSolid(out: Solid, a: number, b: number, c: number): Solid {
  const v = a * b * c;
  return setAxialSolid(out, v, 0, (v * (b * b + c * c)) / 12, (v * (a * a + c * c)) / 12, (v * (a * a + b * b)) / 12);
}

const inner = createSolid();

/**
 * Hollow box: the box (a, b, c) minus the box (a − 2t, b − 2t, c − 2t) at the same density
 * (superposition with negative mass). Precondition: 0 < 2t < min(a, b, c) (m).
 */
export function hollowBoxSolid(out: Solid, a: number, b: number, c: number, wall: number): Solid {
  boxSolid(inner, a - 2 * wall, b - 2 * wall, c - 2 * wall);
  boxSolid(out, a, b, c);
  return subtractConcentric(out, out, inner);
}
