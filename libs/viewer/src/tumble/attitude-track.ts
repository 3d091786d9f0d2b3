import { Quaternion } from 'three';
import type { SimulationResult } from '@tumblewise/engine';

/** The samples of a simulation the preview plays back. */
export type Track = Pick<SimulationResult, 'times' | 'attitude' | 'omega' | 'polhode'>;

/** A position between two samples: index of the earlier one and the fraction (0 ≤ f < 1) toward the next. */
export interface TrackPosition {
  index: number;
  fraction: number;
}

/**
 * Where time `t` (s) falls among the sample times (ascending). Before the first sample → the first
 * sample; at or after the last → the last sample with fraction 0. Binary search, O(log n).
 */
export function trackPosition(times: readonly number[], t: number): TrackPosition {
  const n = times.length;
  if (n === 0) throw new RangeError('the simulation holds no samples');
  if (!(t > times[0])) return { index: 0, fraction: 0 };
  if (t >= times[n - 1]) return { index: n - 1, fraction: 0 };
  let lo = 0,
    hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (times[mid] <= t) lo = mid;
    else hi = mid;
  }
  return { index: lo, fraction: (t - times[lo]) / (times[hi] - times[lo]) };
}

const qa = new Quaternion();
const qb = new Quaternion();

/**
 * Attitude (part → space) at time `t`, written into `out`: spherical linear interpolation between the
 * neighbouring samples (three.js `slerpQuaternions`, which takes the shorter way, so the sign
 * ambiguity of quaternions does not matter). Assumes the samples are dense enough that the body
 * turns less than half a turn between two of them (the preview asks for ≥ 24 samples per spin).
 * Quaternions are [x, y, z, w] as the simulation returns them.
 */
export function attitudeAt(out: Quaternion, track: Track, t: number): Quaternion {
  const { index, fraction } = trackPosition(track.times, t);
  const a = track.attitude[index];
  qa.set(a[0], a[1], a[2], a[3]);
  if (fraction === 0) return out.copy(qa).normalize();
  const b = track.attitude[index + 1];
  qb.set(b[0], b[1], b[2], b[3]);
  return out.slerpQuaternions(qa, qb, fraction).normalize();
}

/** A 3-vector series (ω, polhode) at time `t`, linearly interpolated, into `out`. */
export function vectorAt(
  out: [number, number, number],
  series: readonly (readonly number[])[],
  times: readonly number[],
  t: number,
): [number, number, number] {
  const { index, fraction } = trackPosition(times, t);
  const a = series[index];
  const b = fraction === 0 ? a : series[index + 1];
  for (let i = 0; i < 3; i++) out[i] = a[i] + fraction * (b[i] - a[i]);
  return out;
}

/** Length of the simulated motion (s). */
export function trackDuration(track: Pick<Track, 'times'>): number {
  return track.times.length ? track.times[track.times.length - 1] : 0;
}

/**
 * How many times the body turned over in the sampled motion: sign changes of the angular momentum's
 * component along the principal axis `axisIndex` (0 major, 1 intermediate, 2 minor) in the body
 * frame — a spin near the intermediate axis reverses it once per flip, a steady spin never does.
 * Components within `deadBand` of zero are skipped so rounding does not count as a flip.
 */
export function turnOvers(polhode: readonly (readonly number[])[], axisIndex: number, deadBand = 0.05): number {
  let last = 0,
    count = 0;
  for (const p of polhode) {
    const v = p[axisIndex];
    if (Math.abs(v) < deadBand) continue;
    const s = Math.sign(v);
    if (last !== 0 && s !== last) count++;
    last = s;
  }
  return count;
}
