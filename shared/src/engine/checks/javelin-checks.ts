import { GRAM } from '../units/exact-factors';
import { rangeCheck, type CategoryCheck, type CheckContext } from './category-check';

const WA = 'World Athletics implement rules (javelin)';
const LIMITS = {
  men: { mass: 800 * GRAM, length: [2.6, 2.7], cg: [0.9, 1.06] },
  women: { mass: 600 * GRAM, length: [2.2, 2.3], cg: [0.8, 0.92] },
} as const;

/**
 * Javelin, men's or women's implement (`division`): minimum mass, overall length, and centre of
 * gravity distance from the tip — the tip being the far end along the grip axis from the butt.
 */
export function javelinChecks(c: CheckContext): CategoryCheck[] {
  const l = LIMITS[c.division];
  const who = c.division === 'men' ? "men's" : "women's";
  let length: number | null = null,
    fromTip: number | null = null;
  if (c.grip) {
    const u = c.grip.axis;
    length = c.extent(u);
    const com = c.body.center;
    fromTip = c.reach(u) - (com[0] * u[0] + com[1] * u[1] + com[2] * u[2]);
  }
  return [
    rangeCheck({ id: 'javelin.mass', title: `Mass (${who})`, rule: `${WA}: at least ${l.mass * 1000} g`, unit: 'kg' }, c.body.mass, {
      min: l.mass,
    }),
    rangeCheck(
      { id: 'javelin.length', title: `Overall length (${who})`, rule: `${WA}: ${l.length[0]}–${l.length[1]} m`, unit: 'm' },
      length,
      { min: l.length[0], max: l.length[1] },
    ),
    rangeCheck(
      {
        id: 'javelin.centre-of-gravity',
        title: `Centre of gravity from the tip (${who})`,
        rule: `${WA}: ${l.cg[0]}–${l.cg[1]} m`,
        unit: 'm',
      },
      fromTip,
      { min: l.cg[0], max: l.cg[1] },
    ),
  ];
}
