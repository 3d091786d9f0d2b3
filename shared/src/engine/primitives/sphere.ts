import { createSolid, setAxialSolid, subtractConcentric, type Solid } from './solid';

/**
 * Solid sphere of radius r centred on the origin; unit density. I = (2/5) V r² about any diameter
 * (standard table, e.g. Machinery's Handbook 31st ed., sphere). Precondition: r > 0 (m).
 */
export function sphereSolid(out: Solid, r: number): Solid {
  const v = (4 / 3) * Math.PI * r * r * r;
  const i = 0.4 * v * r * r;
  return setAxialSolid(out, v, 0, i, i, i);
}

const core = createSolid();

/**
 * Spherical shell: the sphere of radius r2 minus the sphere of radius r1 (superposition).
 * Precondition: 0 < r1 < r2 (m).
 */
export function sphericalShellSolid(out: Solid, r2: number, r1: number): Solid {
  sphereSolid(core, r1);
  sphereSolid(out, r2);
  return subtractConcentric(out, out, core);
}
