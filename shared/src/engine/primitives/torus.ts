import { setAxialSolid, type Solid } from './solid';

/**
 * Solid torus: tube of radius a swept round a centre circle of radius R in the local xy-plane,
 * centred on the origin; unit density. V = 2π²Ra², Izz = V(R² + 3a²/4), Ixx = Iyy = V(R²/2 + 5a²/8)
 * — Machinery's Handbook 31st ed., torus. Precondition: 0 < a < R (m).
 */
export function torusSolid(out: Solid, majorRadius: number, minorRadius: number): Solid {
  const R2 = majorRadius * majorRadius,
    a2 = minorRadius * minorRadius;
  const v = 2 * Math.PI * Math.PI * majorRadius * a2;
  const t = v * (R2 / 2 + (5 * a2) / 8);
  return setAxialSolid(out, v, 0, t, t, v * (R2 + (3 * a2) / 4));
}
