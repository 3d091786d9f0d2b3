/** Standard gravity (m/s²), CGPM 1901 (the conventional value 9.80665). */
export const STANDARD_GRAVITY = 9.80665;

/**
 * Moment of inertia about the pivot from a compound-pendulum swing (small amplitude):
 * I_pivot = m·g·d·T²/(4π²) — m (kg), d pivot-to-centre-of-mass distance (m), T period (s), g (m/s²).
 * Source: the physical-pendulum period T = 2π√(I/(m g d)), e.g. Halliday, Resnick & Walker,
 * Fundamentals of Physics, §15-6 "Pendulums".
 */
export function compoundPendulumMoment(mass: number, pivotToCentre: number, period: number, g = STANDARD_GRAVITY): number {
  return (mass * g * pivotToCentre * period * period) / (4 * Math.PI * Math.PI);
}

/**
 * Moment about the vertical axis from a trifilar (three-wire) pendulum: I = g·R²·T²·(M_platform + M)/(4π²L) − I_platform,
 * R wire radius from the axis (m), L wire length (m), T period (s), masses (kg), platform moment (kg·m²).
 * Source: the small-oscillation analysis of the trifilar suspension (e.g. du Bois, Lieven & Adhikari,
 * "Error analysis in trifilar inertia measurements", Experimental Techniques 33(2), 2009).
 */
export function trifilarMoment(
  wireRadius: number,
  wireLength: number,
  period: number,
  platformMass: number,
  partMass: number,
  platformMoment: number,
  g = STANDARD_GRAVITY,
): number {
  return (
    (g * wireRadius * wireRadius * period * period * (platformMass + partMass)) / (4 * Math.PI * Math.PI * wireLength) - platformMoment
  );
}
