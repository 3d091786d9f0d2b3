import { INCH } from '../units/exact-factors';
import { infoCheck, rangeCheck, type CategoryCheck, type CheckContext } from './category-check';
import { swingAxis } from './swing-axis';

const OBR = 'Official Baseball Rules 3.02(a) — value from memory';
const ASTM = 'ASTM F2398, Standard Test Method for Measuring Moment of Inertia and Center of Percussion of a Baseball or Softball Bat';
const MAX_LENGTH = 42 * INCH;
const MAX_DIAMETER = 2.61 * INCH;

/** Bat: moment about the pivot and centre of percussion (ASTM F2398), length and diameter limits. */
export function batChecks(c: CheckContext): CategoryCheck[] {
  const length = c.grip ? c.extent(c.grip.axis) : null;
  const diameter = c.grip ? Math.max(c.extent(c.grip.faceNormal), c.extent(swingAxis(c.grip.axis, c.grip.faceNormal))) : null;
  return [
    infoCheck(
      {
        id: 'bat.pivot-moment',
        title: `Moment about the pivot ${c.trade ? c.trade.pivot.distance : 0.1524} m from the knob`,
        rule: ASTM,
        unit: 'kg·m²',
      },
      c.trade?.pivot.moment ?? null,
    ),
    infoCheck(
      { id: 'bat.centre-of-percussion', title: 'Centre of percussion for that pivot, from the knob', rule: ASTM, unit: 'm' },
      c.trade?.pivot.centreOfPercussion ?? null,
    ),
    rangeCheck({ id: 'bat.length', title: 'Overall length', rule: `${OBR}: at most 42 in`, unit: 'm' }, length, { max: MAX_LENGTH }),
    rangeCheck({ id: 'bat.diameter', title: 'Diameter at the thickest part', rule: `${OBR}: at most 2.61 in`, unit: 'm' }, diameter, {
      max: MAX_DIAMETER,
    }),
  ];
}
