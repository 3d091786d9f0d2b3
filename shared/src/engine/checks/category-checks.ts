import type { GearCategory } from '../../schemas/projects';
import { batChecks } from './bat-checks';
import { bowlingBallChecks } from './bowling-ball-checks';
import type { CategoryCheck, CheckContext } from './category-check';
import { flyingDiscChecks } from './flying-disc-checks';
import { golfWoodChecks } from './golf-wood-checks';
import { javelinChecks } from './javelin-checks';
import { racketChecks } from './racket-checks';

const BY_CATEGORY: Partial<Record<GearCategory, (c: CheckContext) => CategoryCheck[]>> = {
  racket: racketChecks,
  bat: batChecks,
  'golf-wood': golfWoodChecks,
  'flying-disc': flyingDiscChecks,
  javelin: javelinChecks,
  'bowling-ball': bowlingBallChecks,
};

/** The indicative checks a gear category asks for (none for categories without published limits). */
export function categoryChecks(category: GearCategory | undefined, context: CheckContext): CategoryCheck[] {
  const f = category ? BY_CATEGORY[category] : undefined;
  return f ? f(context) : [];
}
