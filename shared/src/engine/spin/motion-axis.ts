/** The principal axis the body-frame angular momentum circles, or the separatrix between the two. */
export type MotionAxis = 'major' | 'minor' | 'separatrix';

/** Which axis the motion circles, and how widely. */
export interface MotionShape {
  motionAxis: MotionAxis;
  /** Largest angle between the body-frame angular momentum and that axis over the motion (degrees); null on the separatrix. */
  coneHalfAngleDeg: number | null;
  /** Index of the circled axis into the moments (0 major, 2 minor), or null on the separatrix. */
  circled: 0 | 2 | null;
  /** For one equal pair: index of the unique (symmetry) axis, else null. */
  symmetryAxis: 0 | 2 | null;
}

/**
 * |G² − 2T·I2| below this fraction of G² counts as the separatrix itself (rounding of the start);
 * with an equal pair, an angular momentum within this angle (rad) of the pair's plane lies in it.
 */
export const SEPARATRIX_TOLERANCE = 1e-12;

const DEG = 180 / Math.PI;

/**
 * The motion that follows from the conserved |L|² = G² and 2T = Σ Li²/Ii of the start `omega0`
 * (rad/s, principal frame; moments I1 ≥ I2 ≥ I3 in kg·m²): the body-frame L circles the major axis
 * when G² > 2T·I2, the minor axis when G² < 2T·I2, and lies on the separatrix at equality (Landau &
 * Lifshitz, Mechanics, §37; the polhode picture of Goldstein, Classical Mechanics, §5.6).
 *
 * The cone half-angle θ is the polhode's largest angle from the circled axis c. It is reached where
 * the component along the other outer axis vanishes; with b the intermediate axis, sphere and
 * ellipsoid there give tan²θ = I_b·(2T·I_c − G²) / (I_c·(G² − 2T·I_b)), each difference formed as
 * Σ Li²(Ii − Ik)/Ii so that nothing cancels near the separatrix or near an axis.
 *
 * With two moments equal (`equalPairs` as principalAxes sets them) the body is a symmetric top: L
 * circles the unique axis at a constant angle, or lies in the plane of the pair (the separatrix of
 * that case: every axis there is a permanent rotation, the neutral case). With all three equal L
 * stays where it is in the body: reported as circling the major axis with a zero cone.
 */
export function motionShape(moments: ArrayLike<number>, equalPairs: readonly [boolean, boolean], omega0: ArrayLike<number>): MotionShape {
  const L = [moments[0] * omega0[0], moments[1] * omega0[1], moments[2] * omega0[2]];
  const g2 = L[0] * L[0] + L[1] * L[1] + L[2] * L[2];
  if (equalPairs[0] && equalPairs[1]) return { motionAxis: 'major', coneHalfAngleDeg: 0, circled: 0, symmetryAxis: null };
  if (equalPairs[0] || equalPairs[1]) {
    const u = equalPairs[0] ? 2 : 0;
    const inPlane = Math.hypot(L[(u + 1) % 3], L[(u + 2) % 3]);
    if (Math.abs(L[u]) <= SEPARATRIX_TOLERANCE * inPlane)
      return { motionAxis: 'separatrix', coneHalfAngleDeg: null, circled: null, symmetryAxis: u };
    return {
      motionAxis: u === 0 ? 'major' : 'minor',
      coneHalfAngleDeg: Math.atan2(inPlane, Math.abs(L[u])) * DEG,
      circled: u,
      symmetryAxis: u,
    };
  }
  const gap = (k: number) => {
    let s = 0;
    for (let i = 0; i < 3; i++) if (i !== k) s += (L[i] * L[i] * (moments[i] - moments[k])) / moments[i];
    return s;
  }; // G² − 2T·I_k
  const db = gap(1);
  if (!(Math.abs(db) > SEPARATRIX_TOLERANCE * g2))
    return { motionAxis: 'separatrix', coneHalfAngleDeg: null, circled: null, symmetryAxis: null };
  const c = db > 0 ? 0 : 2;
  const tan2 = Math.max(0, (moments[1] * -gap(c)) / (moments[c] * db));
  return { motionAxis: c === 0 ? 'major' : 'minor', coneHalfAngleDeg: Math.atan(Math.sqrt(tan2)) * DEG, circled: c, symmetryAxis: null };
}
