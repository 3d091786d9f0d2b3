import { fromDisplay, toDisplay, type DisplayUnit, type Quantity } from '@tumblewise/engine';

/** Significant digits a converted value keeps on screen, so 0.0135 m shows as 13.5 mm and not 13.499999999999998. */
export const DISPLAY_DIGITS = 8;

/** A quantity and the display unit the editor shows it in. */
export interface UnitChoice {
  quantity: Quantity;
  /** A key of DISPLAY_UNITS[quantity].units (`mm`, `g`, `rev/s`). */
  unit: string;
}

/** The display units of the editor (PRODUCT.md: mm, g, degrees, kg/m³, rev/s). */
export const EDITOR_UNITS = {
  length: { quantity: 'length', unit: 'mm' },
  mass: { quantity: 'mass', unit: 'g' },
  angle: { quantity: 'angle', unit: '°' },
  density: { quantity: 'density', unit: 'kg/m³' },
  rate: { quantity: 'rate', unit: 'rev/s' },
} as const satisfies Record<string, UnitChoice>;

/** Rounds to `digits` significant digits (no trailing binary noise). */
export function roundSignificant(value: number, digits = DISPLAY_DIGITS): number {
  if (!Number.isFinite(value) || value === 0) return value;
  return Number(value.toPrecision(digits));
}

/** An SI value as the form shows it in `choice`'s unit, through the engine's unit conversion; null stays null. */
export function siToDisplay(value: number | null | undefined, choice: UnitChoice): number | null {
  if (value === null || value === undefined || !Number.isFinite(value)) return null;
  return roundSignificant(toDisplay(value, choice.quantity, choice.unit as DisplayUnit<Quantity>));
}

/**
 * A value typed in `choice`'s unit converted to SI. An empty field is null; a non-number (the
 * browser's number input gives null for "abc") is null too, so the schema reports it at its field.
 */
export function displayToSi(value: number | string | null | undefined, choice: UnitChoice): number | null {
  if (value === null || value === undefined || value === '') return null;
  const n = typeof value === 'number' ? value : Number(value);
  if (!Number.isFinite(n)) return null;
  return fromDisplay(n, choice.quantity, choice.unit as DisplayUnit<Quantity>);
}
