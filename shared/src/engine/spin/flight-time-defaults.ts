import type { GearCategory } from '../../schemas/projects';

/** How a default flight time is known: there is no published source, only common practice (MECHANICS §8). */
export const FLIGHT_TIME_BASIS = 'common practice estimate';

/** A category's typical time in the air. */
export interface FlightTimeDefault {
  /** s */
  seconds: number;
  /** The situation the figure stands for, in a few words. */
  situation: string;
  basis: typeof FLIGHT_TIME_BASIS;
}

const estimate = (seconds: number, situation: string): FlightTimeDefault => Object.freeze({ seconds, situation, basis: FLIGHT_TIME_BASIS });

/**
 * Typical time in the air per gear category, used when a part document gives no `flightTime` of its
 * own. Each one is a common practice estimate with no published source; the designer sets the part's
 * own figure when it matters. Swung gear is only in free flight when tossed or let go.
 */
export const FLIGHT_TIME_DEFAULTS: Readonly<Record<GearCategory, FlightTimeDefault | null>> = Object.freeze({
  racket: estimate(1, 'a racket tossed and caught'),
  bat: estimate(1, 'a bat tossed or let go'),
  'golf-wood': estimate(1, 'a club tossed or let go'),
  'flying-disc': estimate(3, 'a throw of middle distance'),
  javelin: estimate(3.5, 'a full-distance throw'),
  'bowling-ball': estimate(2.5, 'release to the pins'),
  juggling: estimate(1, 'a throw in a usual juggling pattern'),
  paddle: estimate(1, 'a paddle tossed or let go'),
  other: null,
});
