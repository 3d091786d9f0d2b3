import { unit } from 'mathjs';

/**
 * Display units the UI shows and accepts, per quantity, mapped to mathjs unit expressions. Data and
 * API stay in SI (the `base` of each quantity; placement angles in degrees); conversion goes through
 * mathjs's unit system rather than hand-written factors.
 */
export const DISPLAY_UNITS = {
  length: { base: 'm', units: { m: 'm', cm: 'cm', mm: 'mm', in: 'inch' } },
  mass: { base: 'kg', units: { kg: 'kg', g: 'g', oz: 'oz', lb: 'lb' } },
  volume: { base: 'm^3', units: { 'm³': 'm^3', 'cm³': 'cm^3', cc: 'cc', 'in³': 'inch^3' } },
  density: { base: 'kg/m^3', units: { 'kg/m³': 'kg/m^3', 'g/cm³': 'g/cm^3' } },
  inertia: { base: 'kg m^2', units: { 'kg·m²': 'kg m^2', 'kg·cm²': 'kg cm^2', 'g·cm²': 'g cm^2', 'oz·in²': 'oz inch^2' } },
  rate: { base: 'rad/s', units: { 'rad/s': 'rad/s', 'rev/s': 'cycle/s', rpm: 'cycle/min' } },
  angle: { base: 'deg', units: { '°': 'deg', deg: 'deg', rad: 'rad' } },
  time: { base: 's', units: { s: 's', ms: 'ms' } },
  frequency: { base: 'rad/s', units: { 'rad/s': 'rad/s', Hz: 'cycle/s' } },
} as const;

export type Quantity = keyof typeof DISPLAY_UNITS;
export type DisplayUnit<Q extends Quantity> = keyof (typeof DISPLAY_UNITS)[Q]['units'];

function expression<Q extends Quantity>(quantity: Q, display: DisplayUnit<Q>): string {
  const units = DISPLAY_UNITS[quantity].units as Record<string, string>;
  const e = units[display as string];
  if (!e) throw new Error(`unknown ${quantity} unit: ${String(display)}`);
  return e;
}

/** A value in the quantity's SI base (see DISPLAY_UNITS) shown in a display unit, e.g. toDisplay(1e-4, 'inertia', 'g·cm²') = 1000. */
export function toDisplay<Q extends Quantity>(value: number, quantity: Q, display: DisplayUnit<Q>): number {
  return unit(value, DISPLAY_UNITS[quantity].base).toNumber(expression(quantity, display));
}

/** A value typed in a display unit converted to the quantity's SI base. */
export function fromDisplay<Q extends Quantity>(value: number, quantity: Q, display: DisplayUnit<Q>): number {
  return unit(value, expression(quantity, display)).toNumber(DISPLAY_UNITS[quantity].base);
}

/** Any mathjs-convertible pair, e.g. convertUnits(2.46, 'inch', 'm'). For rule limits stated in other units. */
export function convertUnits(value: number, from: string, to: string): number {
  return unit(value, from).toNumber(to);
}
