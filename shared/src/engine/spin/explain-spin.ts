import type { AxisRole } from './classify-spin';
import type { FlightTime } from './flight-time';
import type { MotionAxis } from './motion-axis';
import type { VerdictThresholds } from './verdict-thresholds';

/** Everything the plain-language explanation mentions (SI units; angles in degrees). */
export interface ExplanationFacts {
  nearestAxis: AxisRole;
  misalignmentDeg: number;
  /** The stated misalignment the start is at least (degrees). */
  statedMisalignmentDeg: number;
  spherical: boolean;
  neutral: boolean;
  /** |I_spin − I2| / I2 */
  closeness: number;
  margins: { major: number; minor: number };
  motionAxis: MotionAxis;
  coneHalfAngleDeg: number | null;
  /** For an equal pair: the role of the unique (symmetry) axis. */
  symmetryAxis: AxisRole | null;
  wobblePeriod: number | null;
  turnsOver: boolean;
  growthRate: number | null;
  flipTime: number | null;
  flipInterval: number | null;
  flight: FlightTime;
  thresholds: VerdictThresholds;
}

const fmt = (x: number, digits = 3) => Number(x.toPrecision(digits)).toString();
const pct = (x: number) => `${fmt(100 * x, 3)} %`;

/** The explanation of a spin report, following the axis the motion actually circles. */
export function explainSpin(f: ExplanationFacts): string {
  if (f.spherical)
    return 'All three principal moments are equal (spherical inertia): every axis is a principal axis and spin about any of them stays as it is.';
  if (f.neutral) return explainNeutral(f);
  if (f.turnsOver) return explainTurnOver(f);
  return explainSteady(f);
}

function explainNeutral(f: ExplanationFacts): string {
  const about = f.symmetryAxis ? `its symmetry axis (the ${f.symmetryAxis} axis)` : 'its symmetry axis';
  const head =
    `The intended axis lies ${fmt(f.misalignmentDeg, 2)}° from the plane of two equal principal moments. ` +
    'Spin there is neutral — a slow neutral precession, not an exponential flip: nothing pushes the part away from this axis and nothing pulls it back.';
  if (f.wobblePeriod !== null && f.coneHalfAngleDeg !== null)
    return `${head} From the stated start the angular momentum precesses about ${about}, ${fmt(f.coneHalfAngleDeg, 3)}° from it, once every ${fmt(f.wobblePeriod)} s.`;
  return `${head} The stated start lies in that plane, where any axis is a permanent rotation; a small disturbance out of the plane makes the part precess slowly about ${about}.`;
}

function explainTurnOver(f: ExplanationFacts): string {
  const again = f.flipInterval !== null ? `, then again every ${fmt(f.flipInterval)} s` : '';
  let text: string;
  if (f.nearestAxis === 'intermediate') {
    const lambda = f.growthRate ?? 0;
    text =
      `The intended axis is ${fmt(f.misalignmentDeg, 2)}° from the intermediate principal axis. Spin about it is unstable: ` +
      (lambda > 0
        ? `a small misalignment grows e-fold every ${fmt(1 / lambda)} s (growth rate ${fmt(lambda)} 1/s)`
        : 'a small misalignment grows') +
      (f.flipTime !== null
        ? `, and from a ${fmt(Math.max(f.statedMisalignmentDeg, f.misalignmentDeg), 2)}° misalignment the part turns over after about ${fmt(f.flipTime)} s${again}.`
        : '.');
  } else if (f.motionAxis === 'separatrix') {
    text =
      `The intended axis is ${fmt(f.misalignmentDeg, 2)}° from the ${f.nearestAxis} principal axis, but the start lies on the separatrix ` +
      'between motion about the major and about the minor axis: the angular momentum creeps toward the intermediate axis and the part turns over.';
  } else {
    text =
      `The intended axis is ${fmt(f.misalignmentDeg, 2)}° from the ${f.nearestAxis} principal axis, too far for the spin to stay about it: ` +
      `with the angular momentum and energy of that start the motion circles the ${f.motionAxis} axis` +
      (f.coneHalfAngleDeg !== null ? ` (up to ${fmt(f.coneHalfAngleDeg, 3)}° from it)` : '') +
      `, so the part turns end over end` +
      (f.flipTime !== null ? `, first after about ${fmt(f.flipTime)} s${again}.` : '.');
  }
  text += flightSentence(f);
  return (
    text +
    (f.nearestAxis === 'intermediate'
      ? ' To make it steady, move the moment about this axis clearly above or below the other two.'
      : ` To keep the spin about the ${f.nearestAxis} axis, launch closer to it or widen the gap between its moment and the intermediate one.`)
  );
}

function flightSentence(f: ExplanationFacts): string {
  const { flightTime, source, categoryDefault } = f.flight;
  if (flightTime === null)
    return f.flipTime !== null ? ' No flight time is set for this part or its category, so the flip is taken as seen.' : '';
  if (f.flipTime === null) return '';
  const basis =
    source === 'part'
      ? 'set for this part'
      : categoryDefault
        ? `${categoryDefault.situation}: the category's ${categoryDefault.basis}`
        : '';
  const inAir = `the gear is in the air about ${fmt(flightTime, 2)} s (${basis})`;
  return f.flipTime > flightTime
    ? ` It flips after ${fmt(f.flipTime)} s; ${inAir}, so the flip comes after the flight ends and is not seen. A longer flight or a larger misalignment would bring it into the flight.`
    : ` It flips after ${fmt(f.flipTime)} s and ${inAir}, so the flip happens in flight.`;
}

function explainSteady(f: ExplanationFacts): string {
  const t = f.thresholds;
  const outer = f.nearestAxis === 'major' ? 'major' : 'minor';
  const reasons: string[] = [];
  if (f.closeness < t.watchMomentFraction) reasons.push(`the moment about it is within ${pct(f.closeness)} of the intermediate moment`);
  if (f.misalignmentDeg > t.watchMisalignmentDeg) reasons.push(`it is ${fmt(f.misalignmentDeg, 2)}° away from the ${outer} axis`);
  const cone = f.coneHalfAngleDeg !== null ? ` within ${fmt(f.coneHalfAngleDeg, 3)}° of it` : '';
  const wobble =
    f.wobblePeriod !== null
      ? `; the part wobbles in its own frame once every ${fmt(f.wobblePeriod)} s (${fmt(1 / f.wobblePeriod)} Hz) without the wobble growing`
      : '';
  return (
    `The intended axis is ${fmt(f.misalignmentDeg, 2)}° from the ${outer} principal axis, about which spin is steady: ` +
    `the angular momentum circles that axis${cone}${wobble}. ` +
    `Margin to the intermediate moment: ${pct(outer === 'major' ? f.margins.major : f.margins.minor)}.` +
    (reasons.length > 0 ? ` Watch it: ${reasons.join(', and ')}; tolerances or a flexing part could change its behaviour.` : '')
  );
}
