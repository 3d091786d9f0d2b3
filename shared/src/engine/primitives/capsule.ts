import { setAxialSolid, type Solid } from './solid';

/**
 * Capsule: a cylinder of radius r and straight length h along local z, centred on the origin,
 * capped by two solid hemispheres; unit density.
 * Composition: cylinder (Machinery's Handbook) plus two hemispheres, each with volume (2/3)πr³,
 * centroid 3r/8 from its flat face, axial moment (2/5)m r² and transverse moment about its own
 * centroid (83/320)m r², shifted by the parallel-axis theorem to ±(h/2 + 3r/8).
 * Precondition: r > 0, h ≥ 0 (m); h = 0 is a sphere.
 */
export function capsuleSolid(out: Solid, r: number, h: number): Solid {
  const r2 = r * r;
  const vc = Math.PI * r2 * h;
  const vh = (2 / 3) * Math.PI * r2 * r;
  const d = h / 2 + (3 * r) / 8;
  const axial = (vc * r2) / 2 + 2 * (0.4 * vh * r2);
  const transverse = (vc * (3 * r2 + h * h)) / 12 + 2 * vh * ((83 / 320) * r2 + d * d);
  return setAxialSolid(out, vc + 2 * vh, 0, transverse, transverse, axial);
}
