import type { GearCategory } from '@tumblewise/shared';

/** How each gear category is written on screen. */
export const CATEGORY_LABELS: Record<GearCategory, string> = {
  racket: 'Racket',
  bat: 'Bat',
  'golf-wood': 'Club head (wood)',
  'flying-disc': 'Flying disc',
  javelin: 'Javelin or training implement',
  'bowling-ball': 'Bowling ball',
  juggling: 'Juggling club or baton',
  paddle: 'Paddle',
  other: 'Other thrown or swung gear',
};
