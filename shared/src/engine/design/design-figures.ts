import { DESIGN_FIGURES, GRIP_FIGURES, type DesignFigure } from '../../schemas/design-targets';
import type { PartDocument } from '../../schemas/part-document';
import type { Body } from '../composition/body';
import { EngineInputError, type InputIssue } from '../part/engine-input-error';
import { partMassProperties, type PartMassProperties, type PartResolvers } from '../part/part-mass-properties';
import { principalOfPart } from '../report/analyze-part';
import { createPrincipalAxes, EQUAL_MOMENTS_ANALYTIC, EQUAL_MOMENTS_MESH, type PrincipalAxes } from '../principal/principal-axes';
import { classifySpin, type AxisRole, type SpinClass } from '../spin/classify-spin';
import { DEFAULT_VERDICT_THRESHOLDS, type VerdictThresholds } from '../spin/verdict-thresholds';
import { BAT_PIVOT_DISTANCE, tradeFigures, type GripFrame } from '../trade/trade-figures';

/** Options of the design functions. */
export interface DesignOptions extends PartResolvers {
  /** Verdict thresholds to override (see VerdictThresholds). */
  thresholds?: Partial<VerdictThresholds>;
  /** Most Levenberg–Marquardt iterations per start of a goal seek (default 100). */
  maxIterations?: number;
}

/** What every figure evaluation of one part needs besides its body. */
export interface FigureContext {
  doc: PartDocument;
  grip: GripFrame | null;
  /** Pivot distance from the butt (m): grip.pivotDistance, else 6 in (ASTM F2398). */
  pivotDistance: number;
  thresholds: VerdictThresholds;
  /** Relative gap under which two principal moments count as equal (MECHANICS §3). */
  equalMoments: number;
}

/** The context of figure evaluations for a part and its mass properties. */
export function figureContext(doc: PartDocument, mp: Pick<PartMassProperties, 'hasMesh'>, options: DesignOptions = {}): FigureContext {
  const thresholds: VerdictThresholds = { ...DEFAULT_VERDICT_THRESHOLDS, ...options.thresholds };
  return {
    doc,
    grip: doc.grip ?? null,
    pivotDistance: doc.grip?.pivotDistance ?? BAT_PIVOT_DISTANCE,
    thresholds,
    equalMoments: thresholds.equalMoments ?? (mp.hasMesh ? EQUAL_MOMENTS_MESH : EQUAL_MOMENTS_ANALYTIC),
  };
}

/** Whether a figure is measured in the grip frame. */
export function needsGrip(figure: DesignFigure): boolean {
  return GRIP_FIGURES.includes(figure);
}

/**
 * Checks figure names against the document: an unknown name, or a grip-frame figure on a part
 * without `grip`, is an EngineInputError('invalid') naming `pathOf(i)`.
 */
export function checkFigureNames(doc: PartDocument, names: readonly string[], pathOf: (i: number) => string): DesignFigure[] {
  const issues: InputIssue[] = [];
  names.forEach((name, i) => {
    if (!(DESIGN_FIGURES as readonly string[]).includes(name))
      issues.push({ path: pathOf(i), message: `must be one of ${DESIGN_FIGURES.join(', ')}` });
    else if (needsGrip(name as DesignFigure) && !doc.grip) {
      issues.push({
        path: pathOf(i),
        message: `${name} is measured in the grip frame, and this part has no grip (grip.point, grip.axis, grip.faceNormal)`,
      });
    }
  });
  if (issues.length > 0) throw new EngineInputError('invalid', issues);
  return names as DesignFigure[];
}

/**
 * Steady margin of the intended spin axis (a ratio), from the principal moments I1 ≥ I2 ≥ I3 and
 * the role of the principal axis nearest to the intended one:
 * - nearest the major axis: (I1 − I2)/I2, the relative gap before the major axis becomes intermediate;
 * - nearest the minor axis: (I2 − I3)/I2, the same for the minor axis;
 * - nearest the intermediate axis: −min((I1 − I2)/I2, (I2 − I3)/I2), negative, and 0 where it meets
 *   the margin of the role it would take, so the margin passes through 0 without a jump when two
 *   moments cross (it still jumps where the intended axis itself swings to another nearest axis).
 * These are the two margins of the scatter study (MECHANICS §6), signed by the role.
 */
export function steadyMargin(moments: ArrayLike<number>, nearestAxis: AxisRole): number {
  const major = (moments[0] - moments[1]) / moments[1];
  const minor = (moments[1] - moments[2]) / moments[1];
  if (nearestAxis === 'major') return major;
  if (nearestAxis === 'minor') return minor;
  return -Math.min(major, minor);
}

/**
 * out[k] = figure names[k] (SI) of a part with composite `body` and principal axes `principal`
 * (part frame). A centre of percussion that does not exist (centre of mass not beyond the pivot)
 * is NaN here; callers turn it into null or an unreachable point. Trade figures are taken in the
 * grip frame of `ctx` (tradeFigures: balance point, swingweight about the axis 0.1 m from the butt,
 * twistweight about the long axis, pivot moment and centre of percussion per ASTM F2398); the
 * steady margin from classifySpin's nearest axis. Returns the spin class. Precondition: the grip
 * exists when a grip figure is asked for (checkFigureNames).
 */
export function figuresFromBody(
  body: Body,
  principal: PrincipalAxes,
  ctx: FigureContext,
  names: readonly DesignFigure[],
  out: Float64Array | number[],
): SpinClass {
  const spin = classifySpin(principal, ctx.doc.spin.axis, ctx.doc.dissipative, ctx.thresholds);
  let trade: ReturnType<typeof tradeFigures> | null = null;
  const I = principal.moments;
  for (let k = 0; k < names.length; k++) {
    const name = names[k];
    if (needsGrip(name) && !trade) trade = tradeFigures(body, ctx.grip!, ctx.pivotDistance);
    switch (name) {
      case 'mass':
        out[k] = body.mass;
        break;
      case 'balancePoint':
        out[k] = trade!.balancePoint;
        break;
      case 'swingweight':
        out[k] = trade!.swingweight;
        break;
      case 'twistweight':
        out[k] = trade!.twistweight;
        break;
      case 'pivotMoment':
        out[k] = trade!.pivot.moment;
        break;
      case 'centreOfPercussion':
        out[k] = trade!.pivot.centreOfPercussion ?? Number.NaN;
        break;
      case 'steadyMargin':
        out[k] = steadyMargin(I, spin.nearestAxis);
        break;
      case 'I1':
        out[k] = I[0];
        break;
      case 'I2':
        out[k] = I[1];
        break;
      case 'I3':
        out[k] = I[2];
        break;
    }
  }
  return spin;
}

/**
 * The named figures of a validated part document (SI), through the engine's own analysis
 * (partMassProperties, principalOfPart, tradeFigures, classifySpin); null where a figure does not
 * exist (a centre of percussion with the centre of mass not beyond the pivot). Throws
 * EngineInputError: `invalid` naming `figures[i]` for an unknown name or a grip figure without a
 * grip; `unanalysable` as analyzeValidatedPart.
 */
export function designFigures(doc: PartDocument, names: readonly string[], options: DesignOptions = {}): Record<string, number | null> {
  const figures = checkFigureNames(doc, names, (i) => `figures[${i}]`);
  const mp = partMassProperties(doc, options);
  const ctx = figureContext(doc, mp, options);
  const principal = principalOfPart(doc, mp, ctx.equalMoments, createPrincipalAxes());
  const values = new Float64Array(figures.length);
  figuresFromBody(mp.body, principal, ctx, figures, values);
  const out: Record<string, number | null> = {};
  figures.forEach((name, k) => (out[name] = Number.isNaN(values[k]) ? null : values[k]));
  return out;
}
