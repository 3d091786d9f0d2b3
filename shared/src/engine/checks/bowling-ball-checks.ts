import { radiusOfGyration } from '../trade/trade-figures';
import { INCH, POUND } from '../units/exact-factors';
import { rangeCheck, type CategoryCheck, type CheckContext } from './category-check';

const USBC = 'USBC equipment specifications (bowling balls)';
const MIN_RG = 2.46 * INCH;
const MAX_RG = 2.8 * INCH;
const MAX_DIFFERENTIAL = 0.06 * INCH;
const MAX_MASS = 16 * POUND;
const DIAMETER = [8.5 * INCH, 8.595 * INCH];

/**
 * Bowling ball: radius of gyration (about each principal axis) ≥ 2.460 in, differential (largest
 * minus smallest radius of gyration) ≤ 0.060 in; maximum radius of gyration 2.800 in, mass ≤ 16 lb
 * and diameter 8.500–8.595 in are values from memory.
 */
export function bowlingBallChecks(c: CheckContext): CategoryCheck[] {
  const m = c.body.mass,
    I = c.principal.moments;
  const rgMax = radiusOfGyration(I[0], m),
    rgMin = radiusOfGyration(I[2], m);
  const diameter = Math.max(c.extent([1, 0, 0]), c.extent([0, 1, 0]), c.extent([0, 0, 1]));
  return [
    rangeCheck({ id: 'bowling-ball.rg-min', title: 'Smallest radius of gyration', rule: `${USBC}: at least 2.460 in`, unit: 'm' }, rgMin, {
      min: MIN_RG,
    }),
    rangeCheck(
      { id: 'bowling-ball.rg-max', title: 'Largest radius of gyration', rule: `${USBC}: at most 2.800 in — value from memory`, unit: 'm' },
      rgMax,
      { max: MAX_RG },
    ),
    rangeCheck(
      { id: 'bowling-ball.differential', title: 'Radius-of-gyration differential', rule: `${USBC}: at most 0.060 in`, unit: 'm' },
      rgMax - rgMin,
      { max: MAX_DIFFERENTIAL },
    ),
    rangeCheck({ id: 'bowling-ball.mass', title: 'Mass', rule: `${USBC}: at most 16 lb — value from memory`, unit: 'kg' }, m, {
      max: MAX_MASS,
    }),
    rangeCheck(
      { id: 'bowling-ball.diameter', title: 'Diameter', rule: `${USBC}: 8.500–8.595 in — value from memory`, unit: 'm' },
      diameter,
      { min: DIAMETER[0], max: DIAMETER[1] },
    ),
  ];
}
