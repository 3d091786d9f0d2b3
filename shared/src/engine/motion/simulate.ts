import { z } from 'zod';
import { formatPath, EngineInputError } from '../part/engine-input-error';
import { partMassProperties, type PartResolvers } from '../part/part-mass-properties';
import { validatePartDocument } from '../part/validate-part-document';
import { principalOfPart } from '../report/analyze-part';
import { quatFromMat3, quatMultiply, quatToMat3 } from '../linear/quaternion';
import { transpose } from '../linear/mat3';
import { exactTorqueFree } from './exact-torque-free';
import { splittingStep4, type RigidState } from './lie-poisson-splitting';

/** Most samples one simulation returns. */
export const MAX_SIMULATION_SAMPLES = 20_001;

const roleSchema = z.enum(['major', 'intermediate', 'minor'], { error: 'must be "major", "intermediate" or "minor"' });
const finite = z.number({ error: 'must be a number' });

/** Input of simulate(): either principal `moments` or a `part` document. */
export const simulateInputSchema = z
  .object({
    moments: z
      .tuple([finite.positive(), finite.positive(), finite.positive()], { error: 'must be three positive principal moments (kg·m²)' })
      .optional(),
    part: z.unknown().optional(),
    /** With `moments`: a role or a direction in the principal frame; with `part`: a direction in part axes. Default: the part's spin axis, or the intermediate axis. */
    axis: z.union([roleSchema, z.tuple([finite, finite, finite])]).optional(),
    /** rad/s; default the part's spin rate. */
    rate: finite.positive({ error: 'must be greater than zero' }).max(10_000).optional(),
    misalignmentDeg: finite.min(0, { error: 'must not be negative' }).max(90, { error: 'must be at most 90°' }).optional(),
    seconds: finite.positive({ error: 'must be greater than zero' }).max(600, { error: 'must be at most 600 s' }),
    sampleRate: finite.positive({ error: 'must be greater than zero' }).max(2000, { error: 'must be at most 2000 samples/s' }),
  })
  .superRefine((v, ctx) => {
    if ((v.moments === undefined) === (v.part === undefined))
      ctx.addIssue({ code: 'custom', path: ['moments'], message: 'give either moments or part' });
    if (v.moments && v.rate === undefined) ctx.addIssue({ code: 'custom', path: ['rate'], message: 'is required with moments' });
    if (Math.floor(v.seconds * v.sampleRate) + 1 > MAX_SIMULATION_SAMPLES)
      ctx.addIssue({
        code: 'custom',
        path: ['sampleRate'],
        message: `seconds × sampleRate must stay below ${MAX_SIMULATION_SAMPLES} samples`,
      });
    if (Array.isArray(v.axis) && !(Math.hypot(...v.axis) > 0))
      ctx.addIssue({ code: 'custom', path: ['axis'], message: 'must not be the zero vector' });
  });
export type SimulateInput = z.input<typeof simulateInputSchema>;

/** Sampled torque-free motion. Body frame = principal axes (I1 ≥ I2 ≥ I3); space frame = part axes at t = 0. */
export interface SimulationResult {
  /** I1 ≥ I2 ≥ I3 (kg·m²). */
  moments: [number, number, number];
  /** Principal axes as unit rows in part coordinates (identity rows for a `moments` input). */
  axes: [number, number, number][];
  /** Sample times (s). */
  times: number[];
  /** ω in the body (principal) frame, rad/s. */
  omega: [number, number, number][];
  /** Attitude of the part, part → space, as unit quaternions [x, y, z, w]; identity at t = 0. */
  attitude: [number, number, number, number][];
  /** Angular momentum in space (kg·m²/s) — constant up to rounding. */
  angularMomentum: [number, number, number][];
  /** 2T = Σ Li²/Ii (J·2). */
  twiceEnergy: number[];
  /** |L| (kg·m²/s). */
  momentumMagnitude: number[];
  /** Polhode: L in the body frame divided by |L| (a path on the unit sphere). */
  polhode: [number, number, number][];
  /** Time to the first flip predicted by the exact solution (s), when the spin is near the intermediate axis. */
  flipTime: number | null;
  /** Integrator step (s). */
  step: number;
}

const DEG = Math.PI / 180;

/**
 * Torque-free motion from the intended spin plus a small misalignment: the intended axis tilted by
 * `misalignmentDeg` toward the major axis (toward the intermediate axis when the intended axis is the
 * major one), at the spin rate. Integrated with the fourth-order composition of the explicit
 * Lie–Poisson splitting (each sub-flow an exact rotation; McLachlan 1993, Touma & Wisdom 1994), step
 * ≤ 1/64 of a spin period and dividing the sample interval. Throws EngineInputError on bad input.
 */
export function simulate(input: unknown, resolvers: PartResolvers = {}): SimulationResult {
  const parsed = simulateInputSchema.safeParse(input);
  if (!parsed.success)
    throw new EngineInputError(
      'invalid',
      parsed.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    );
  const v = parsed.data;
  let I: number[];
  let P: Float64Array;
  let dirBody: number[];
  let rate: number;
  let misalignmentDeg = v.misalignmentDeg ?? 1;
  if (v.moments) {
    I = [...v.moments].sort((a, b) => b - a);
    P = new Float64Array([1, 0, 0, 0, 1, 0, 0, 0, 1]);
    const axis = v.axis ?? 'intermediate';
    dirBody = typeof axis === 'string' ? unitRow(['major', 'intermediate', 'minor'].indexOf(axis)) : normalise(axis);
    rate = v.rate!;
  } else {
    const doc = validatePartDocument(v.part);
    if (!doc.ok)
      throw new EngineInputError(
        'invalid',
        doc.errors.map((e) => ({ path: e.path ? `part.${e.path}` : 'part', message: e.message })),
      );
    const mp = partMassProperties(doc.value, resolvers);
    const pa = principalOfPart(doc.value, mp);
    I = Array.from(pa.moments);
    P = pa.axes;
    const a = Array.isArray(v.axis) ? normalise(v.axis) : typeof v.axis === 'string' ? null : doc.value.spin.axis;
    dirBody = a
      ? [0, 1, 2].map((r) => P[3 * r] * a[0] + P[3 * r + 1] * a[1] + P[3 * r + 2] * a[2])
      : unitRow(['major', 'intermediate', 'minor'].indexOf(v.axis as string));
    rate = v.rate ?? doc.value.spin.rate;
    misalignmentDeg = v.misalignmentDeg ?? doc.value.spin.misalignmentDeg;
  }
  const w0 = tilted(dirBody, misalignmentDeg * DEG).map((x) => x * rate);
  const state: RigidState = {
    L: new Float64Array([I[0] * w0[0], I[1] * w0[1], I[2] * w0[2]]),
    q: quatFromMat3(new Float64Array(4), transpose(new Float64Array(9), P)),
  };
  const dtSample = 1 / v.sampleRate;
  // The fastest body rate the motion can reach is |L|/I3 (I3 the smallest moment).
  const maxStep = (2 * Math.PI * I[2]) / (Math.hypot(I[0] * w0[0], I[1] * w0[1], I[2] * w0[2]) * 64);
  const sub = Math.max(1, Math.ceil(dtSample / maxStep));
  const h = dtSample / sub;
  const n = Math.floor(v.seconds * v.sampleRate) + 1;
  const qP = quatFromMat3(new Float64Array(4), P);
  const qOut = new Float64Array(4),
    R = new Float64Array(9);
  const result: SimulationResult = {
    moments: [I[0], I[1], I[2]],
    axes: [0, 1, 2].map((r) => [P[3 * r], P[3 * r + 1], P[3 * r + 2]] as [number, number, number]),
    times: [],
    omega: [],
    attitude: [],
    angularMomentum: [],
    twiceEnergy: [],
    momentumMagnitude: [],
    polhode: [],
    flipTime: null,
    step: h,
  };
  const exact = exactTorqueFree(I, w0);
  if (exact) {
    const nearest = [0, 1, 2].reduce((best, r) => (Math.abs(dirBody[r]) > Math.abs(dirBody[best]) ? r : best), 0);
    if (nearest === 1) result.flipTime = exact.firstIntermediateCrossing();
  }
  for (let k = 0; k < n; k++) {
    if (k > 0) for (let s = 0; s < sub; s++) splittingStep4(state, I, h);
    const L = state.L;
    const g = Math.hypot(L[0], L[1], L[2]);
    quatMultiply(qOut, state.q, qP);
    quatToMat3(R, state.q);
    result.times.push(k * dtSample);
    result.omega.push([L[0] / I[0], L[1] / I[1], L[2] / I[2]]);
    result.attitude.push([qOut[0], qOut[1], qOut[2], qOut[3]]);
    result.angularMomentum.push([
      R[0] * L[0] + R[1] * L[1] + R[2] * L[2],
      R[3] * L[0] + R[4] * L[1] + R[5] * L[2],
      R[6] * L[0] + R[7] * L[1] + R[8] * L[2],
    ]);
    result.twiceEnergy.push((L[0] * L[0]) / I[0] + (L[1] * L[1]) / I[1] + (L[2] * L[2]) / I[2]);
    result.momentumMagnitude.push(g);
    result.polhode.push([L[0] / g, L[1] / g, L[2] / g]);
  }
  return result;
}

function unitRow(r: number): number[] {
  return [r === 0 ? 1 : 0, r === 1 ? 1 : 0, r === 2 ? 1 : 0];
}

function normalise(a: readonly number[]): number[] {
  const l = Math.hypot(a[0], a[1], a[2]);
  return [a[0] / l, a[1] / l, a[2] / l];
}

/** The unit direction d tilted by angle (rad) toward the major axis e1 (toward e2 when d ∥ e1), in the principal frame. */
export function tilted(d: readonly number[], angle: number): number[] {
  let t = [1 - d[0] * d[0], -d[0] * d[1], -d[0] * d[2]];
  if (Math.hypot(t[0], t[1], t[2]) < 1e-9) t = [-d[1] * d[0], 1 - d[1] * d[1], -d[1] * d[2]];
  const tl = Math.hypot(t[0], t[1], t[2]);
  const c = Math.cos(angle),
    s = Math.sin(angle);
  return [0, 1, 2].map((i) => c * d[i] + (s * t[i]) / tl);
}
