import type { PartDocument } from '@tumblewise/shared';
import type { SpinReport } from '@tumblewise/engine';

/** Body of `POST /simulate` as the preview sends it. */
export interface TumbleRequest {
  part: PartDocument;
  misalignmentDeg: number;
  seconds: number;
  sampleRate: number;
}

/** Samples the preview asks for at most (the engine allows 20 001). */
export const PREVIEW_SAMPLE_BUDGET = 12_000;
/** Samples per spin revolution wanted for a smooth, unambiguous interpolation. */
export const SAMPLES_PER_TURN = 24;

/**
 * What to simulate for the preview: long enough to see about three flips of a spin near the
 * intermediate axis (estimated from the growth rate: a misalignment θ grows like θ·e^{λt}, so it
 * reaches order one after about ln(1/θ)/λ), otherwise twelve spin periods, and past the end of the
 * report's flight time so its mark shows on the time axis; between 2 s and 120 s;
 * sampled at 24 samples per spin revolution (at least 30 /s, at most the engine's 2000 /s), thinned if
 * the budget is exceeded, but not below 8 samples per revolution where 2000 /s allow (the duration is
 * shortened instead).
 */
export function tumbleRequest(part: PartDocument, report: SpinReport, misalignmentDeg: number): TumbleRequest {
  const rate = part.spin.rate;
  const period = (2 * Math.PI) / rate;
  const theta = Math.max(1e-6, (misalignmentDeg * Math.PI) / 180);
  const lambda = report.spin.growthRate;
  const flipEstimate = lambda && lambda > 0 ? Math.log(1 / theta) / lambda : 0;
  const flight = report.spin.flightTime ?? 0;
  let seconds = clamp(Math.max(12 * period, 3 * flipEstimate, 1.25 * flight), 2, 120);
  let sampleRate = clamp(SAMPLES_PER_TURN / period, 30, 2000);
  if (seconds * sampleRate > PREVIEW_SAMPLE_BUDGET) sampleRate = Math.max(PREVIEW_SAMPLE_BUDGET / seconds, Math.min(2000, 8 / period));
  if (seconds * sampleRate > PREVIEW_SAMPLE_BUDGET) seconds = PREVIEW_SAMPLE_BUDGET / sampleRate;
  return { part, misalignmentDeg, seconds: round3(seconds), sampleRate: round3(sampleRate) };
}

function clamp(x: number, lo: number, hi: number): number {
  return Math.min(hi, Math.max(lo, x));
}

function round3(x: number): number {
  return Math.floor(x * 1000) / 1000;
}
