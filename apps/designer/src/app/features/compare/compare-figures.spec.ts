import { unit } from 'mathjs';
import type { ComparisonRow } from '@tumblewise/shared';
import { displayUnitOf, formatDelta, formatValue } from './compare-figures';

// Reference conversions: mathjs's unit system, an independent general-purpose library.
describe('compare display units', () => {
  it.each([
    ['kg', 'g', 0.3125, unit(0.3125, 'kg').toNumber('g')],
    ['m', 'mm', 0.0135, unit(0.0135, 'm').toNumber('mm')],
    ['kg·m²', 'g·cm²', 2.5e-4, unit(2.5e-4, 'kg m^2').toNumber('g cm^2')],
  ])('shows %s as %s', (si, shown, value, expected) => {
    const d = displayUnitOf(si);
    expect(d.unit).toBe(shown);
    expect(Math.abs(d.convert(value) - expected)).toBeLessThanOrEqual(1e-9 * expected);
  });

  it('shows ratios in per cent and keeps other units', () => {
    expect(displayUnitOf('').convert(0.125)).toBeCloseTo(12.5, 12);
    expect(displayUnitOf('rad/s').unit).toBe('rad/s');
    expect(formatValue(0.125, '')).toBe('12.5 %');
    expect(formatValue(2.4, '°')).toBe('2.4°');
    expect(formatValue('flip-prone', 'text')).toBe('flip-prone');
    expect(formatValue(null, 'kg')).toBe('—');
  });

  it('writes a signed difference with its relative size', () => {
    const row: ComparisonRow = {
      key: 'mass',
      label: 'Mass',
      unit: 'kg',
      values: [0.25, 0.3, 0.2],
      deltas: [0, 0.05, -0.05],
      relativeDeltas: [0, 0.2, -0.2],
    };
    expect(formatDelta(row, 1)).toBe('+50 g (+20 %)');
    expect(formatDelta(row, 2)).toBe('−50 g (−20 %)');
    const margin: ComparisonRow = {
      key: 'marginMajor',
      label: 'Margin',
      unit: '',
      values: [0.1, 0.15],
      deltas: [0, 0.05],
      relativeDeltas: [0, 0.5],
    };
    expect(formatDelta(margin, 1)).toBe('+5 points (+50 %)');
    expect(formatDelta({ ...row, deltas: [null, null, null] }, 1)).toBe('');
  });
});
