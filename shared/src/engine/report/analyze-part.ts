import type { PartDocument } from '../../schemas/part-document';
import type { GearCategory } from '../../schemas/projects';
import { categoryChecks } from '../checks/category-checks';
import { toArray3 } from '../linear/vec3';
import { toRows } from '../linear/mat3';
import { EngineInputError } from '../part/engine-input-error';
import { partMassProperties, type PartMassProperties, type PartResolvers } from '../part/part-mass-properties';
import { partExtent, partReach } from '../part/part-reach';
import { validatePartDocument } from '../part/validate-part-document';
import {
  createPrincipalAxes,
  EQUAL_MOMENTS_ANALYTIC,
  EQUAL_MOMENTS_MESH,
  principalAxes,
  type PrincipalAxes,
} from '../principal/principal-axes';
import { assessSpin } from '../spin/assess-spin';
import { resolveFlightTime } from '../spin/flight-time';
import type { VerdictThresholds } from '../spin/verdict-thresholds';
import { BAT_PIVOT_DISTANCE, radiusOfGyration, tradeFigures } from '../trade/trade-figures';
import { STANDARD_NOTES } from './report-notes';
import type { SpinReport } from './spin-report';

/** Options of analyzePart. */
export interface AnalyzeOptions extends PartResolvers {
  /** Verdict thresholds to override (see VerdictThresholds). */
  thresholds?: Partial<VerdictThresholds>;
  /** Pivot distance from the butt for the pivot moment (m); else grip.pivotDistance, else 6 in. */
  pivotDistance?: number;
  /** Gear category for the checks; else the document's `category`. */
  category?: GearCategory;
  /** Implement class for rules with more than one (javelin); else the document's, else men's. */
  division?: 'men' | 'women';
}

/**
 * The full spin report of a part document (untrusted JSON). Throws EngineInputError:
 * `invalid` (schema errors, each with its JSON path) or `unanalysable` (e.g. an unknown material,
 * a broken mesh, removals that leave no mass, no rotational inertia).
 */
export function analyzePart(doc: unknown, options: AnalyzeOptions = {}): SpinReport {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new EngineInputError('invalid', v.errors);
  return analyzeValidatedPart(v.value, options);
}

/** The spin report of an already validated document (skips the schema; for hot loops). */
export function analyzeValidatedPart(doc: PartDocument, options: AnalyzeOptions = {}): SpinReport {
  const mp = partMassProperties(doc, options);
  const principal = principalOfPart(doc, mp, options.thresholds?.equalMoments);
  return buildReport(doc, mp, principal, options);
}

/** Principal axes with the equality tolerance of MECHANICS §3 and the grip axis, then face normal, preferred inside an equal pair. */
export function principalOfPart(
  doc: PartDocument,
  mp: PartMassProperties,
  equalMoments?: number,
  out: PrincipalAxes = createPrincipalAxes(),
): PrincipalAxes {
  const prefs = doc.grip ? [doc.grip.axis, doc.grip.faceNormal, doc.spin.axis] : [doc.spin.axis];
  principalAxes(out, mp.body.inertia, equalMoments ?? (mp.hasMesh ? EQUAL_MOMENTS_MESH : EQUAL_MOMENTS_ANALYTIC), prefs);
  const [i1, i2, i3] = out.moments;
  if (!(i3 > 1e-14 * i1) || !(i1 > 0)) {
    throw new EngineInputError('unanalysable', [
      {
        path: 'primitives',
        message: 'the part has no rotational inertia about some axis (only point masses on a line?): add a solid primitive',
      },
    ]);
  }
  if (i2 + i3 < i1 * (1 - 1e-9)) {
    throw new EngineInputError('unanalysable', [
      {
        path: 'primitives',
        message: 'the principal moments break the triangle inequality: a removal reaches outside the material it cuts',
      },
    ]);
  }
  return out;
}

function buildReport(doc: PartDocument, mp: PartMassProperties, principal: PrincipalAxes, options: AnalyzeOptions): SpinReport {
  const { body, pieces } = mp;
  const { spin, notes: spinNotes } = assessSpin({
    principal,
    axis: doc.spin.axis,
    rate: doc.spin.rate,
    misalignmentDeg: doc.spin.misalignmentDeg,
    dissipative: doc.dissipative,
    thresholds: options.thresholds,
    flight: resolveFlightTime(doc.flightTime, options.category ?? doc.category),
  });
  const grip = doc.grip ?? null;
  const pivotDistance = options.pivotDistance ?? grip?.pivotDistance ?? BAT_PIVOT_DISTANCE;
  const trade = grip ? tradeFigures(body, grip, pivotDistance) : null;
  const extent = (u: ArrayLike<number>) => partExtent(pieces, u);
  const reach = (u: ArrayLike<number>) => partReach(pieces, u);
  const checks = categoryChecks(options.category ?? doc.category, {
    body,
    principal,
    spin,
    trade,
    grip,
    extent,
    reach,
    division: options.division ?? doc.division ?? 'men',
  });
  const notes = [...STANDARD_NOTES, ...spinNotes];
  if (!grip)
    notes.push(
      'No grip frame (grip.point, grip.axis, grip.faceNormal) was given, so balance point, swingweight, recoil weight, twistweight and the pivot figures are not computed.',
    );
  const m = principal.moments,
    mass = body.mass;
  const report: SpinReport = {
    name: doc.name ?? null,
    mass,
    volume: body.volume,
    centerOfMass: toArray3(body.center),
    inertia: toRows(body.inertia),
    principal: { moments: toArray3(m), axes: toRows(principal.axes) },
    spin,
    trade: {
      balancePoint: trade?.balancePoint ?? null,
      swingweight: trade?.swingweight ?? null,
      recoilWeight: trade?.recoilWeight ?? null,
      twistweight: trade?.twistweight ?? null,
      pivot: trade?.pivot ?? null,
      length: grip ? extent(grip.axis) : null,
      radiusOfGyration: {
        major: radiusOfGyration(m[0], mass),
        intermediate: radiusOfGyration(m[1], mass),
        minor: radiusOfGyration(m[2], mass),
      },
    },
    checks,
    notes,
  };
  const bad = firstNonFinite(report, '');
  if (bad !== null)
    throw new EngineInputError('unanalysable', [
      { path: 'primitives', message: `the part gives a non-finite ${bad}; check its dimensions and densities` },
    ]);
  return report;
}

/** Path of the first NaN or infinite number inside a JSON-like value, or null. */
export function firstNonFinite(x: unknown, path: string): string | null {
  if (typeof x === 'number') return Number.isFinite(x) ? null : path || 'value';
  if (Array.isArray(x)) {
    for (let i = 0; i < x.length; i++) {
      const r = firstNonFinite(x[i], `${path}[${i}]`);
      if (r !== null) return r;
    }
    return null;
  }
  if (x && typeof x === 'object') {
    for (const [k, v] of Object.entries(x)) {
      const r = firstNonFinite(v, path ? `${path}.${k}` : k);
      if (r !== null) return r;
    }
  }
  return null;
}
