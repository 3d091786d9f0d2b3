/**
 * A study figure to `digits` significant digits, as the page writes it: no exponent ("1370", not
 * "1.37e+3"), no trailing zeros ("0", not "0.0"), and a minus sign (−) before a negative one.
 */
export function studyFigure(x: number, digits: number): string {
  if (!Number.isFinite(x)) return '—';
  const text = String(Number(x.toPrecision(digits)) || 0);
  return text.replace(/^-/, '−');
}

/** A change of a margin (a fraction) in percentage points. */
export function percentagePoints(fraction: number): string {
  return studyFigure(fraction * 100, 2);
}
