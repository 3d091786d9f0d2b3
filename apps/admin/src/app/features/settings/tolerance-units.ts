/**
 * The settings page shows tolerances in the units people quote them in (density ±%, size ±mm);
 * the API stores them as SI (a relative fraction and metres). Results are rounded to 12
 * significant digits so that, e.g., 7 % reads back as 7 and not 7.000000000000001.
 */
const tidy = (value: number) => Number(value.toPrecision(12));

/** ±% → relative fraction (5 → 0.05). */
export function percentToRelative(percent: number): number {
  return tidy(percent / 100);
}

/** Relative fraction → ±% (0.05 → 5). */
export function relativeToPercent(relative: number): number {
  return tidy(relative * 100);
}

/** Millimetres → metres (0.2 → 0.0002). */
export function millimetresToMetres(mm: number): number {
  return tidy(mm / 1000);
}

/** Metres → millimetres (0.0002 → 0.2). */
export function metresToMillimetres(m: number): number {
  return tidy(m * 1000);
}
