import { z } from 'zod';
import { toleranceSchema } from '../../schemas/part-document';
import { createBody, type Body } from '../composition/body';
import { EngineInputError, formatPath } from '../part/engine-input-error';
import { partMassProperties, type PartResolvers } from '../part/part-mass-properties';
import { validatePartDocument } from '../part/validate-part-document';
import { principalOfPart } from '../report/analyze-part';
import {
  createPrincipalAxes,
  EQUAL_MOMENTS_ANALYTIC,
  EQUAL_MOMENTS_MESH,
  principalAxes,
  type PrincipalAxes,
} from '../principal/principal-axes';
import { classifySpin, type AxisRole } from '../spin/classify-spin';
import { DEFAULT_VERDICT_THRESHOLDS, type Verdict, type VerdictThresholds } from '../spin/verdict-thresholds';
import { momentAboutLine } from '../trade/moment-about-line';
import { PartModel } from './part-model';
import { SeededRandom } from './seeded-random';
import { summarize, type Distribution } from './summarize';

/** Most samples one study may draw. */
export const MAX_SCATTER_SAMPLES = 100_000;

export const scatterInputSchema = z.object({
  part: z.unknown(),
  tolerances: z
    .strictObject({
      default: toleranceSchema.optional(),
      primitives: z.record(z.string(), toleranceSchema).optional(),
    })
    .optional(),
  samples: z
    .int({ error: 'must be a whole number' })
    .min(10, { error: 'must be at least 10' })
    .max(MAX_SCATTER_SAMPLES, { error: `must be at most ${MAX_SCATTER_SAMPLES}` }),
  seed: z
    .int({ error: 'must be a whole number' })
    .min(0, { error: 'must not be negative' })
    .max(4294967295, { error: 'must fit in 32 bits' }),
});
export type ScatterInput = z.input<typeof scatterInputSchema>;

/** Sensitivity of the two margins to one parameter, at the nominal design. */
export interface Sensitivity {
  primitiveId: string;
  /** `density`, `mass` (point) or a dimension (`radius`, `size[0]`, …). */
  parameter: string;
  /** Nominal value: density (kg/m³), point mass (kg) or dimension (m). */
  nominal: number;
  /** One standard deviation used in the study (relative for density/mass, m for dimensions). */
  sigma: number;
  /** ∂margin/∂parameter: per relative change (1 = 100 %) for density/mass, per metre for dimensions. */
  perUnit: { major: number; minor: number };
  /** Change of the margin for a 1 % change of the parameter — the lever to pull first. */
  perPercent: { major: number; minor: number };
  /** |∂margin/∂parameter|·σ: how much of the margins' spread this tolerance causes. */
  scatterEffect: { major: number; minor: number };
}

/** Result of a scatter study (SI). */
export interface ScatterResult {
  samples: number;
  seed: number;
  /** Draws that gave an invalid solid (inner ≥ outer, negative density…) and were drawn again. */
  redraws: number;
  nominal: { margins: { major: number; minor: number }; verdict: Verdict; nearestAxis: AxisRole };
  /** Distributions: mass, the margins, the principal moments and, with a grip, the trade figures. */
  distributions: Record<string, Distribution>;
  /** Share of samples whose verdict differs from the nominal one. */
  verdictChangedShare: number;
  /** Share of samples whose intended axis has a different role (major / intermediate / minor). */
  axisRoleChangedShare: number;
  verdictShares: Record<Verdict, number>;
  /** Ranked by the larger |perPercent| of the two margins (what to change first). */
  sensitivities: Sensitivity[];
  notes: string[];
}

/** Progress of a running study. */
export type ScatterProgress = (done: number, total: number) => void;

/**
 * Seeded, reproducible Monte Carlo over per-primitive density and dimension tolerances (each drawn
 * normal with the stated value as one standard deviation; a draw that breaks a shape rule is drawn
 * again), then central-difference sensitivities of both margins at the nominal design.
 * Tolerance precedence: study per primitive > primitive document > material > study default > 5 %
 * density, 0 size. Throws EngineInputError for bad input (paths under `part.` for the document).
 */
export function runScatterStudy(
  input: unknown,
  onProgress?: ScatterProgress,
  options: PartResolvers & { thresholds?: Partial<VerdictThresholds> } = {},
): ScatterResult {
  const parsed = scatterInputSchema.safeParse(input);
  if (!parsed.success)
    throw new EngineInputError(
      'invalid',
      parsed.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    );
  const { samples, seed, tolerances } = parsed.data;
  const v = validatePartDocument(parsed.data.part);
  if (!v.ok)
    throw new EngineInputError(
      'invalid',
      v.errors.map((e) => ({ path: e.path ? `part.${e.path}` : 'part', message: e.message })),
    );
  const doc = v.value;
  const mp = partMassProperties(doc, options);
  const nominalPrincipal = principalOfPart(doc, mp, options.thresholds?.equalMoments);
  const thresholds: VerdictThresholds = { ...DEFAULT_VERDICT_THRESHOLDS, ...options.thresholds };
  const eqTol = thresholds.equalMoments ?? (mp.hasMesh ? EQUAL_MOMENTS_MESH : EQUAL_MOMENTS_ANALYTIC);
  const prefs = doc.grip ? [doc.grip.axis, doc.grip.faceNormal, doc.spin.axis] : [doc.spin.axis];
  const nominalClass = classifySpin(nominalPrincipal, doc.spin.axis, doc.dissipative, thresholds);
  const m0 = nominalPrincipal.moments;
  const model = new PartModel(doc, mp, tolerances);

  const grip = doc.grip;
  const swing = grip
    ? [
        grip.axis[1] * grip.faceNormal[2] - grip.axis[2] * grip.faceNormal[1],
        grip.axis[2] * grip.faceNormal[0] - grip.axis[0] * grip.faceNormal[2],
        grip.axis[0] * grip.faceNormal[1] - grip.axis[1] * grip.faceNormal[0],
      ]
    : null;
  const names = [
    'mass',
    'marginMajor',
    'marginMinor',
    'momentMajor',
    'momentIntermediate',
    'momentMinor',
    ...(grip ? ['balancePoint', 'swingweight', 'twistweight'] : []),
  ];
  const series = names.map(() => new Float64Array(samples));
  const body = createBody();
  const pa = createPrincipalAxes();
  const at = (d: number) =>
    grip ? [grip.point[0] + d * grip.axis[0], grip.point[1] + d * grip.axis[1], grip.point[2] + d * grip.axis[2]] : [0, 0, 0];
  const swingPoint = at(0.1);
  const rng = new SeededRandom(seed);
  let redraws = 0,
    verdictChanged = 0,
    roleChanged = 0;
  const verdictCounts: Record<Verdict, number> = { steady: 0, watch: 0, 'flip-prone': 0 };
  const params = model.parameters;
  const every = Math.max(1, Math.floor(samples / 100));
  for (let s = 0; s < samples; s++) {
    for (let attempt = 0; ; attempt++) {
      for (let i = 0; i < params.length; i++) {
        const q = params[i];
        model.values[i] = q.slot < 0 ? 1 + q.sigma * rng.normal() : q.nominal + q.sigma * rng.normal();
      }
      if (model.valid()) break;
      redraws++;
      if (attempt > 50)
        throw new EngineInputError('unanalysable', [
          {
            path: 'tolerances',
            message: 'the tolerances are so wide that most draws break a shape rule (e.g. inner radius above the outer one)',
          },
        ]);
    }
    model.evaluate(body);
    principalAxes(pa, body.inertia, eqTol, prefs);
    const c = classifySpin(pa, doc.spin.axis, doc.dissipative, thresholds);
    const I = pa.moments;
    series[0][s] = body.mass;
    series[1][s] = (I[0] - I[1]) / I[1];
    series[2][s] = (I[1] - I[2]) / I[1];
    series[3][s] = I[0];
    series[4][s] = I[1];
    series[5][s] = I[2];
    if (grip && swing) {
      const u = grip.axis,
        p = grip.point;
      series[6][s] = (body.center[0] - p[0]) * u[0] + (body.center[1] - p[1]) * u[1] + (body.center[2] - p[2]) * u[2];
      series[7][s] = momentAboutLine(body, swingPoint, swing);
      series[8][s] = momentAboutLine(body, p, u);
    }
    verdictCounts[c.verdict]++;
    if (c.verdict !== nominalClass.verdict) verdictChanged++;
    if (c.nearestAxis !== nominalClass.nearestAxis) roleChanged++;
    if (onProgress && (s + 1) % every === 0) onProgress(s + 1, samples);
  }
  model.reset();

  const sensitivities = sensitivitiesOf(model, eqTol, prefs, body, pa);
  const distributions: Record<string, Distribution> = {};
  names.forEach((n, i) => (distributions[n] = summarize(series[i])));
  const notes = [
    'Each tolerance is taken as one standard deviation of a normal distribution; density scatter is relative (a share of the nominal), size scatter an absolute length.',
    'Figures are engineering estimates from idealised geometry and nominal densities.',
  ];
  if (params.every((q) => q.slot < 0 || q.sigma === 0))
    notes.push('No size tolerance was given, so only densities were varied; sensitivities to dimensions are still listed.');
  if (mp.hasMesh) notes.push('Mesh primitives vary in density only.');
  return {
    samples,
    seed,
    redraws,
    nominal: {
      margins: { major: (m0[0] - m0[1]) / m0[1], minor: (m0[1] - m0[2]) / m0[1] },
      verdict: nominalClass.verdict,
      nearestAxis: nominalClass.nearestAxis,
    },
    distributions,
    verdictChangedShare: verdictChanged / samples,
    axisRoleChangedShare: roleChanged / samples,
    verdictShares: {
      steady: verdictCounts.steady / samples,
      watch: verdictCounts.watch / samples,
      'flip-prone': verdictCounts['flip-prone'] / samples,
    },
    sensitivities,
    notes,
  };
}

/**
 * ∂margin/∂parameter by central differences at the nominal design, step 1e-6 of the parameter's
 * scale (relative for density, of the dimension for sizes), then ranked by the larger |perPercent|.
 */
function sensitivitiesOf(
  model: PartModel,
  eqTol: number,
  prefs: readonly (readonly number[])[],
  body: Body,
  pa: PrincipalAxes,
): Sensitivity[] {
  const margins = () => {
    model.evaluate(body);
    principalAxes(pa, body.inertia, eqTol, prefs);
    const I = pa.moments;
    return [(I[0] - I[1]) / I[1], (I[1] - I[2]) / I[1]];
  };
  const out: Sensitivity[] = [];
  model.parameters.forEach((q, i) => {
    const h = 1e-6 * q.nominal;
    model.values[i] = q.nominal + h;
    const up = model.valid() ? margins() : null;
    model.values[i] = q.nominal - h;
    const down = model.valid() ? margins() : null;
    model.values[i] = q.nominal;
    if (!up || !down) return;
    const d = [(up[0] - down[0]) / (2 * h), (up[1] - down[1]) / (2 * h)];
    const pp = (x: number) => x * q.nominal * 0.01;
    out.push({
      primitiveId: q.primitiveId,
      parameter: q.name,
      nominal: q.physical,
      sigma: q.sigma,
      perUnit: { major: d[0], minor: d[1] },
      perPercent: { major: pp(d[0]), minor: pp(d[1]) },
      scatterEffect: { major: Math.abs(d[0]) * q.sigma, minor: Math.abs(d[1]) * q.sigma },
    });
  });
  const key = (s: Sensitivity) => Math.max(Math.abs(s.perPercent.major), Math.abs(s.perPercent.minor));
  return out.sort((a, b) => key(b) - key(a));
}
