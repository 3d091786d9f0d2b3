import { createSolid, setAxialSolid, subtractConcentric, type Solid } from './solid';

/**
 * Solid cylinder of radius r and length h along local z, centred on the origin; unit density.
 * Izz = V r²/2, Ixx = Iyy = V(3r² + h²)/12 — Machinery's Handbook 31st ed., solid cylinder.
 * Precondition: r, h > 0 (m).
 */
export function cylinderSolid(out: Solid, r: number, h: number): Solid {
  const v = Math.PI * r * r * h;
  const t = (v * (3 * r * r + h * h)) / 12;
  return setAxialSolid(out, v, 0, t, t, (v * r * r) / 2);
}

const bore = createSolid();

/**
 * Tube: the cylinder of radius r2 minus the coaxial cylinder of radius r1 (superposition).
 * Precondition: 0 < r1 < r2, h > 0 (m).
 */
export function tubeSolid(out: Solid, r2: number, r1: number, h: number): Solid {
  cylinderSolid(bore, r1, h);
  cylinderSolid(out, r2, h);
  return subtractConcentric(out, out, bore);
}
