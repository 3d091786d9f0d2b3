import { CENTIMETRE, CUBIC_CENTIMETRE, GRAM } from '../units/exact-factors';
import { rangeCheck, type CategoryCheck, type CheckContext } from './category-check';

const RULE = "USGA/R&A Equipment Rules, Part 2 Rule 5, and the governing body's clubhead moment-of-inertia test procedure";
const MAX_MOMENT = (5900 + 100) * GRAM * CENTIMETRE ** 2;
const MAX_VOLUME = (460 + 10) * CUBIC_CENTIMETRE;

/**
 * Golf wood head: moment about the vertical axis through the centre of gravity ≤ 5900 g·cm² plus the
 * 100 g·cm² test tolerance; volume ≤ 460 cc plus 10 cc. Convention: the head is modelled at address,
 * so "vertical" is the part's +z axis.
 */
export function golfWoodChecks(c: CheckContext): CategoryCheck[] {
  return [
    rangeCheck(
      {
        id: 'golf-wood.moment',
        title: 'Moment about the vertical axis (part z) through the centre of gravity',
        rule: `${RULE}: 5900 g·cm² + 100 g·cm² tolerance`,
        unit: 'kg·m²',
      },
      c.body.inertia[8],
      { max: MAX_MOMENT },
    ),
    rangeCheck({ id: 'golf-wood.volume', title: 'Head volume', rule: `${RULE}: 460 cc + 10 cc tolerance`, unit: 'm³' }, c.body.volume, {
      max: MAX_VOLUME,
    }),
  ];
}
