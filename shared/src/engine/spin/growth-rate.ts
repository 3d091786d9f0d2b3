/**
 * Exponential growth rate of a small misalignment from steady spin about the intermediate axis:
 * λ = ω·√((I1 − I2)(I2 − I3)/(I1·I3)) (1/s), from linearising Euler's equations about ω e2
 * (Landau & Lifshitz, Mechanics, §37, problem; also Goldstein, Classical Mechanics, §5.6).
 * Inputs: principal moments I1 ≥ I2 ≥ I3 (kg·m², any consistent unit), spin rate ω (rad/s).
 * Zero when I2 equals a neighbour (the neutral case).
 */
export function intermediateGrowthRate(i1: number, i2: number, i3: number, omega: number): number {
  const p = (i1 - i2) * (i2 - i3);
  return p > 0 ? Math.abs(omega) * Math.sqrt(p / (i1 * i3)) : 0;
}

/** Growth of the misalignment per revolution, exp(2πλ/ω). */
export function growthPerRevolution(i1: number, i2: number, i3: number): number {
  return Math.exp(2 * Math.PI * intermediateGrowthRate(i1, i2, i3, 1));
}
