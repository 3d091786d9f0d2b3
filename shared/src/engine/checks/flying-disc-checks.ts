import { CENTIMETRE, GRAM } from '../units/exact-factors';
import { rangeCheck, type CategoryCheck, type CheckContext } from './category-check';

const PDGA = 'PDGA Technical Standards';
const MAX_MASS = 200 * GRAM;
const MASS_PER_DIAMETER = (8.3 * GRAM) / CENTIMETRE;

/**
 * Flying disc: diameter 21–40 cm, mass ≤ 200 g and ≤ 8.3 g per cm of diameter; the disc is meant to
 * spin about its symmetry axis, its major axis. Diameter: the larger extent across the major axis.
 */
export function flyingDiscChecks(c: CheckContext): CategoryCheck[] {
  const ax = c.principal.axes;
  const diameter = Math.max(c.extent([ax[3], ax[4], ax[5]]), c.extent([ax[6], ax[7], ax[8]]));
  return [
    rangeCheck({ id: 'flying-disc.diameter', title: 'Diameter', rule: `${PDGA}: 21–40 cm`, unit: 'm' }, diameter, { min: 0.21, max: 0.4 }),
    rangeCheck({ id: 'flying-disc.mass', title: 'Mass', rule: `${PDGA}: at most 200 g`, unit: 'kg' }, c.body.mass, { max: MAX_MASS }),
    rangeCheck(
      { id: 'flying-disc.mass-per-diameter', title: 'Mass per diameter', rule: `${PDGA}: at most 8.3 g per cm of diameter`, unit: 'kg/m' },
      c.body.mass / diameter,
      { max: MASS_PER_DIAMETER },
    ),
    {
      id: 'flying-disc.spin-axis',
      title: 'Spin about the symmetry (major) axis',
      rule: `${PDGA}; mechanics: a disc is steady about its major axis`,
      value: c.spin.misalignmentDeg,
      unit: '°',
      limit: {},
      status: c.spin.nearestAxis === 'major' ? 'pass' : 'fail',
      indicative: true,
      note: `nearest principal axis: ${c.spin.nearestAxis}`,
    },
  ];
}
