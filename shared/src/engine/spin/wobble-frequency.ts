/**
 * Angular frequency (rad/s) of the body-frame wobble (nutation of ω about the spin axis) for steady
 * spin at rate ω about a stable principal axis with moment Ii, the others being Ij and Ik:
 * ν = ω·√((Ii − Ij)(Ii − Ik)/(Ij·Ik)) — linearised Euler equations (Landau & Lifshitz, Mechanics, §37).
 * Inputs in kg·m² (any consistent unit) and rad/s. Zero when Ii equals one of the others (neutral).
 * Precondition: Ii is the largest or the smallest of the three (else the product is negative → 0).
 */
export function wobbleFrequency(ii: number, ij: number, ik: number, omega: number): number {
  const p = (ii - ij) * (ii - ik);
  return p > 0 ? Math.abs(omega) * Math.sqrt(p / (ij * ik)) : 0;
}
