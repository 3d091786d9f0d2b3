import { formatFigure } from '../spin-report/report-figures';

/**
 * A study figure to `digits` significant digits, as the page writes it: the report's figures
 * (`formatFigure`: "1370", not "1.37e+3"; "0", not "0.0") with a minus sign (−) before a negative one.
 */
export function studyFigure(x: number, digits: number): string {
  return formatFigure(x, digits).replace(/^-/, '−');
}

/** A change of a margin (a fraction) in percentage points. */
export function percentagePoints(fraction: number): string {
  return studyFigure(fraction * 100, 2);
}
