import { INCH } from '../units/exact-factors';
import { infoCheck, rangeCheck, type CategoryCheck, type CheckContext } from './category-check';
import { swingAxis } from './swing-axis';

const ITF = 'ITF Rules of Tennis, Appendix II (The Racket) — value from memory';
const MAX_LENGTH = 29 * INCH;
const MAX_WIDTH = 12.5 * INCH;

/** Racket: overall length and width limits; swingweight and twistweight as figures. */
export function racketChecks(c: CheckContext): CategoryCheck[] {
  const length = c.grip ? c.extent(c.grip.axis) : null;
  const width = c.grip ? c.extent(swingAxis(c.grip.axis, c.grip.faceNormal)) : null;
  return [
    rangeCheck({ id: 'racket.length', title: 'Overall length', rule: `${ITF}: at most 29 in`, unit: 'm' }, length, { max: MAX_LENGTH }),
    rangeCheck({ id: 'racket.width', title: 'Overall width', rule: `${ITF}: at most 12.5 in`, unit: 'm' }, width, { max: MAX_WIDTH }),
    infoCheck(
      {
        id: 'racket.swingweight',
        title: 'Swingweight (axis 10 cm from the butt)',
        rule: 'common practice in racket sports',
        unit: 'kg·m²',
      },
      c.trade?.swingweight ?? null,
    ),
    infoCheck(
      { id: 'racket.twistweight', title: 'Twistweight (about the long axis)', rule: 'common practice in racket sports', unit: 'kg·m²' },
      c.trade?.twistweight ?? null,
    ),
  ];
}
