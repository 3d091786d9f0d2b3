import type { DesignParameter, PartDocument, SolveRequest } from '@tumblewise/shared';
import { EDITOR_UNITS, roundSignificant } from '../part-editor/display-value';
import { boundToSi } from './free-parameter-model';
import { figureFromDisplay } from './target-model';

/** The lead-tape preset's form, in display units: up to `maxGrams` between `fromMm` and `toMm` from the butt for swingweight and balance. */
export interface LeadTapeSettings {
  /** Most tape to add (g). */
  maxGrams: number | null;
  /** Start of the zone, from the butt along the grip axis (mm). */
  fromMm: number | null;
  /** End of the zone (mm). */
  toMm: number | null;
  /** Swingweight to reach (kg·cm²). */
  swingweight: number | null;
  /** Balance point to reach, from the butt (mm). */
  balanceMm: number | null;
}

/** Id the tape's point mass gets (with a number after it when the draft already has one). */
export const LEAD_TAPE_ID = 'lead-tape';
/** Least tape the solver may choose (g): a strip has some mass, and a point mass must be above zero. */
export const LEAD_TAPE_MIN_GRAMS = 0.1;

/** The part axis the grip axis runs along (index and direction), or null when it is not along one. */
export function gripAxisAlong(grip: PartDocument['grip']): { index: 0 | 1 | 2; sign: 1 | -1 } | null {
  if (!grip) return null;
  for (const index of [0, 1, 2] as const) {
    const others = [0, 1, 2].filter((k) => k !== index).map((k) => Math.abs(grip.axis[k]));
    if (Math.abs(Math.abs(grip.axis[index]) - 1) < 1e-9 && others.every((c) => c < 1e-9))
      return { index, sign: grip.axis[index] > 0 ? 1 : -1 };
  }
  return null;
}

/** Why the preset cannot be used on this draft (null when it can). */
export function leadTapeUnavailable(doc: PartDocument): string | null {
  if (!doc.grip)
    return 'The lead-tape preset measures along the grip axis, and this draft has no grip frame. Turn it on in the part editor.';
  if (!gripAxisAlong(doc.grip))
    return 'The lead-tape preset needs an axis-aligned grip: the grip axis must run along x, y or z of the part. Align it in the part editor.';
  return null;
}

/** What is wrong with the preset's fields, per field (empty when all are fine). */
export function leadTapeProblems(s: LeadTapeSettings): Partial<Record<keyof LeadTapeSettings, string>> {
  const problems: Partial<Record<keyof LeadTapeSettings, string>> = {};
  const missing = (v: number | null) => v === null || !Number.isFinite(v);
  for (const key of ['maxGrams', 'fromMm', 'toMm', 'swingweight', 'balanceMm'] as const) if (missing(s[key])) problems[key] = 'is required';
  if (!problems.maxGrams && !(s.maxGrams! > LEAD_TAPE_MIN_GRAMS)) problems.maxGrams = `must be more than ${LEAD_TAPE_MIN_GRAMS} g`;
  if (!problems.fromMm && s.fromMm! < 0) problems.fromMm = 'must not be negative';
  if (!problems.toMm && !problems.fromMm && !(s.toMm! > s.fromMm!)) problems.toMm = 'must be beyond the start of the zone';
  if (!problems.swingweight && !(s.swingweight! > 0)) problems.swingweight = 'must be greater than zero';
  return problems;
}

/** An id not yet used by the draft's primitives: `lead-tape`, else `lead-tape-2`, … */
export function leadTapeId(doc: PartDocument): string {
  const ids = new Set(doc.primitives.map((p) => p.id));
  if (!ids.has(LEAD_TAPE_ID)) return LEAD_TAPE_ID;
  let n = 2;
  while (ids.has(`${LEAD_TAPE_ID}-${n}`)) n++;
  return `${LEAD_TAPE_ID}-${n}`;
}

/** The request of the preset, or why there is none. */
export type LeadTapeRequest = { ok: true; request: SolveRequest; tapeId: string } | { ok: false; message: string };

/**
 * The goal seek that places lead tape: the draft (`part`, SI, as validated) plus a point mass on the
 * grip axis in the middle of the zone, its mass free from 0.1 g to the most allowed and its
 * position along the grip axis free within the zone (the one position component the axis runs
 * along: grip.point + d·axis for d from the start to the end of the zone), with the targets
 * swingweight = S and balance point = B. `raw` is the draft as stored, sent unchanged but for the
 * added tape.
 */
export function leadTapeRequest(raw: Record<string, unknown>, part: PartDocument, s: LeadTapeSettings): LeadTapeRequest {
  const unavailable = leadTapeUnavailable(part);
  if (unavailable) return { ok: false, message: unavailable };
  if (Object.keys(leadTapeProblems(s)).length > 0) return { ok: false, message: 'Fill in the lead-tape fields first.' };
  const grip = part.grip!;
  const along = gripAxisAlong(grip)!;
  const mm = EDITOR_UNITS.length;
  const from = boundToSi(s.fromMm!, mm),
    to = boundToSi(s.toMm!, mm);
  // 12 significant digits, as the editor keeps SI values (no binary noise from the sums).
  const at = (d: number) => roundSignificant(grip.point[along.index] + along.sign * d, 12);
  const ends = [at(from), at(to)].sort((a, b) => a - b);
  const minMass = boundToSi(LEAD_TAPE_MIN_GRAMS, EDITOR_UNITS.mass),
    maxMass = boundToSi(s.maxGrams!, EDITOR_UNITS.mass);
  const position: [number, number, number] = [grip.point[0], grip.point[1], grip.point[2]];
  position[along.index] = roundSignificant((ends[0] + ends[1]) / 2, 12);
  const tapeId = leadTapeId(part);
  const tape = { id: tapeId, shape: 'point' as const, mass: (minMass + maxMass) / 2, position };
  const primitives = Array.isArray(raw['primitives']) ? (raw['primitives'] as unknown[]) : [];
  const request: SolveRequest = {
    part: { ...(raw as SolveRequest['part']), primitives: [...(primitives as SolveRequest['part']['primitives']), tape] },
    free: [
      { primitive: tapeId, parameter: 'mass', min: minMass, max: maxMass },
      { primitive: tapeId, parameter: `position.${along.index}` as DesignParameter, min: ends[0], max: ends[1] },
    ],
    targets: [
      { figure: 'swingweight', value: figureFromDisplay('swingweight', s.swingweight!) },
      { figure: 'balancePoint', value: figureFromDisplay('balancePoint', s.balanceMm!) },
    ],
  };
  return { ok: true, request, tapeId };
}

/** Where the tape ended up: its mass (kg) and distance from the butt along the grip axis (m), or null without it. */
export function tapePlacement(part: PartDocument, tapeId: string): { mass: number; distance: number } | null {
  const tape = part.primitives.find((p) => p.id === tapeId);
  const grip = part.grip;
  if (!tape || tape.mass === undefined || !grip) return null;
  const d = [0, 1, 2].reduce((sum, k) => sum + (tape.position[k] - grip.point[k]) * grip.axis[k], 0);
  return { mass: tape.mass, distance: d };
}
