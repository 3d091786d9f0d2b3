import type { GearCategory } from '../../schemas/projects';
import { FLIGHT_TIME_DEFAULTS, type FlightTimeDefault } from './flight-time-defaults';

/** Where a report's flight time comes from: the part document, its category's estimate, or nowhere. */
export type FlightTimeSource = 'part' | 'category default' | null;

/** The flight time a report compares a predicted flip with. */
export interface FlightTime {
  /** s, or null when neither the part nor its category gives one. */
  flightTime: number | null;
  source: FlightTimeSource;
  /** The category's estimate when that is what is used. */
  categoryDefault: FlightTimeDefault | null;
}

/** The part's own flight time when given, else its category's common practice estimate, else none. */
export function resolveFlightTime(partFlightTime: number | undefined, category: GearCategory | undefined): FlightTime {
  if (partFlightTime !== undefined) return { flightTime: partFlightTime, source: 'part', categoryDefault: null };
  const d = category ? FLIGHT_TIME_DEFAULTS[category] : null;
  return d
    ? { flightTime: d.seconds, source: 'category default', categoryDefault: d }
    : { flightTime: null, source: null, categoryDefault: null };
}
