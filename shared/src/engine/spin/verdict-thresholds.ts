/** The three verdicts of a spin report. */
export type Verdict = 'steady' | 'watch' | 'flip-prone';

/**
 * When the engine calls a spin `steady`, `watch` or `flip-prone`. All configurable per call.
 *
 * - Spin nearest the intermediate axis (three distinct moments) is `flip-prone`, and so is spin
 *   nearest the major or minor axis whose motion circles the other one (assessSpin, motionShape).
 *   A flip predicted after the flight ends is `watch` instead (assessSpin, given a flight time).
 * - Spin nearest the major or minor axis is `watch` when the moment about the intended axis lies
 *   within `watchMomentFraction` of the intermediate moment (|I_spin − I2|/I2), or when the intended
 *   axis is more than `watchMisalignmentDeg` away from that principal axis; otherwise `steady`.
 * - Spin in the plane of two equal moments is neutral (no growth, no restoring wobble):
 *   `neutralVerdict`, never flip-prone.
 * - A `dissipative` part spinning about its minor axis drifts to the major axis (the major-axis
 *   rule): its verdict is at least `dissipativeMinorVerdict`.
 *
 * classifySpin (scatter studies and sweeps) applies these from the nearest axis alone; assessSpin
 * (the spin report) follows the axis the motion circles and the flight time.
 */
export interface VerdictThresholds {
  watchMomentFraction: number;
  watchMisalignmentDeg: number;
  neutralVerdict: Exclude<Verdict, 'flip-prone'>;
  dissipativeMinorVerdict: Verdict;
  /** Relative gap under which two principal moments count as equal; default per MECHANICS §3 (1e-9 analytic, 1e-6 with a mesh). */
  equalMoments?: number;
}

/** The defaults. */
export const DEFAULT_VERDICT_THRESHOLDS: Readonly<VerdictThresholds> = Object.freeze({
  watchMomentFraction: 0.05,
  watchMisalignmentDeg: 10,
  neutralVerdict: 'watch',
  dissipativeMinorVerdict: 'watch',
});

const RANK: Record<Verdict, number> = { steady: 0, watch: 1, 'flip-prone': 2 };

/** The more cautious of two verdicts. */
export function worseVerdict(a: Verdict, b: Verdict): Verdict {
  return RANK[a] >= RANK[b] ? a : b;
}
