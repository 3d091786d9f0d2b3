import { fromDisplay } from '@tumblewise/engine';
import { create, all } from 'mathjs';
import {
  comparedWith,
  csvCell,
  DIFFERENCE_FLAG_PERCENT,
  describeDifference,
  EXAMPLE_CSV,
  fileRefusal,
  formatEntered,
  formatFigure,
  formatMoment,
  formatRecorded,
  MAX_CSV_BYTES,
  templateCsv,
  templateFileName,
} from './measured-figures';

const math = create(all);

describe('formatMoment', () => {
  it('converts kg·m² to the display unit by the SI prefixes (BIPM SI Brochure: 1 kg = 10³ g, 1 m = 10² cm)', () => {
    // 1 kg·m² = 10³ g × 10⁴ cm² = 10⁷ g·cm² = 10⁴ kg·cm².
    expect(formatMoment(0.002415, 'g·cm²')).toBe('24,150 g·cm²');
    expect(formatMoment(0.002415, 'kg·cm²')).toBe('24.15 kg·cm²');
    expect(formatMoment(0.002415, 'kg·m²')).toBe('0.002415 kg·m²');
  });

  it('converts to oz·in² by the exact international definitions (NIST Handbook 44, App. C: 1 oz = 28.349523125 g, 1 in = 2.54 cm)', () => {
    // 1 oz·in² = 28.349523125 g × 6.4516 cm² = 182.8997834 g·cm² = 1.828997834e-5 kg·m².
    const ozIn2 = 28.349523125e-3 * 0.0254 ** 2;
    expect(formatMoment(100 * ozIn2, 'oz·in²')).toBe('100 oz·in²');
    // The same through mathjs's own unit table (a general-purpose reference library).
    expect(math.unit(1, 'oz inch^2').toNumber('kg m^2')).toBeCloseTo(ozIn2, 15);
  });

  it('shows a dash when there is nothing to show', () => {
    expect(formatMoment(null, 'g·cm²')).toBe('—');
    expect(formatMoment(Number.NaN, 'g·cm²')).toBe('—');
  });
});

describe('formatFigure and formatEntered', () => {
  it('keeps four significant digits, grouped in thousands', () => {
    expect(formatFigure(241503.7)).toBe('241,500');
    expect(formatFigure(0.012345)).toBe('0.01235');
    expect(formatFigure(0)).toBe('0');
    expect(formatFigure(1.5e-6)).toBe('1.500e-6');
    expect(formatEntered(198.4, 'kg·cm²')).toBe('198.4 kg·cm²');
  });
});

describe('describeDifference', () => {
  it('signs the difference with a true minus and one decimal', () => {
    expect(describeDifference(3.1).text).toBe('+3.1 %');
    expect(describeDifference(-2.2).text).toBe('−2.2 %');
    expect(describeDifference(0.04).text).toBe('0.0 %');
    expect(describeDifference(-0.04).text).toBe('0.0 %');
  });

  it(`flags only beyond ±${DIFFERENCE_FLAG_PERCENT} %, in words and with an icon`, () => {
    expect(describeDifference(5)).toMatchObject({ state: 'near', words: 'within 5 % of the prediction', icon: 'check_circle' });
    expect(describeDifference(-5)).toMatchObject({ state: 'near' });
    expect(describeDifference(5.04)).toMatchObject({
      state: 'far',
      text: '+5.0 %',
      words: 'above the prediction by more than 5 %',
      icon: 'warning',
    });
    expect(describeDifference(-12.6)).toMatchObject({ state: 'far', text: '−12.6 %', words: 'below the prediction by more than 5 %' });
    expect(describeDifference(-3, 2)).toMatchObject({ state: 'far', words: 'below the prediction by more than 2 %' });
  });

  it('says so when there is no prediction for the axis', () => {
    expect(describeDifference(null)).toEqual({ text: '—', state: 'none', words: 'no prediction for this axis', icon: '' });
  });
});

describe('comparedWith', () => {
  it('names the predicted figure for the axis words the server recognises', () => {
    expect(comparedWith('major')).toBe('largest principal moment I1');
    expect(comparedWith('I2 (rig A)')).toBe('intermediate principal moment I2');
    expect(comparedWith(' Minor ')).toBe('smallest principal moment I3');
    expect(comparedWith('swingweight')).toBe('swingweight');
    expect(comparedWith('twist')).toBe('twistweight');
    expect(comparedWith('pivot 15 cm')).toBe('moment about the pivot');
    expect(comparedWith('end-over-end (rig B)')).toBeNull();
    expect(comparedWith('majority')).toBeNull();
  });
});

describe('templateCsv', () => {
  it('has the header the server asks for and one blank row per axis in the given unit', () => {
    expect(templateCsv('kg·cm²', ['major', 'swing'])).toBe(
      'axis,value,unit,method\r\nmajor,,kg·cm²,compound pendulum\r\nswing,,kg·cm²,compound pendulum\r\n',
    );
    const lines = templateCsv('g·cm²').trim().split('\r\n');
    expect(lines[0]).toBe('axis,value,unit,method');
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(['major', 'intermediate', 'minor', 'swing', 'twist']);
  });

  it('quotes cells by RFC 4180 when they hold a comma, a quote or a line break', () => {
    expect(csvCell('pendulum, rig A')).toBe('"pendulum, rig A"');
    expect(csvCell('the "long" arm')).toBe('"the ""long"" arm"');
    expect(csvCell('plain')).toBe('plain');
  });

  it('gives an example whose values the unit table reads back (the example shows the format, its figures are invented)', () => {
    const [header, ...rows] = EXAMPLE_CSV.split('\n');
    expect(header).toBe('axis,value,unit,method');
    expect(rows).toHaveLength(3);
    // 24 150 g·cm² = 24 150 × 10⁻⁷ kg·m² (SI prefixes, as above).
    expect(fromDisplay(24150, 'inertia', 'g·cm²')).toBeCloseTo(0.002415, 12);
    for (const r of rows) expect(r.split(',')).toHaveLength(4);
  });

  it('names the file after the part and variant', () => {
    expect(templateFileName('Frame', 2)).toBe('Frame-v2-measurements.csv');
    expect(templateFileName('Junior racket (light)', 3)).toBe('Junior-racket-light-v3-measurements.csv');
  });
});

describe('fileRefusal', () => {
  it('lets a CSV through and refuses other files, empty ones and those over the server’s 1 MB', () => {
    expect(fileRefusal({ name: 'rig.csv', size: 120, type: '' })).toBeNull();
    expect(fileRefusal({ name: 'readings', size: 120, type: 'text/csv' })).toBeNull();
    expect(fileRefusal({ name: 'rig.xlsx', size: 120, type: 'application/vnd.ms-excel' })).toMatch(/not a CSV file/);
    expect(fileRefusal({ name: 'rig.csv', size: 0, type: 'text/csv' })).toMatch(/empty/);
    expect(fileRefusal({ name: 'rig.csv', size: MAX_CSV_BYTES + 1, type: 'text/csv' })).toMatch(/larger than 1 MB/);
  });
});

describe('formatRecorded', () => {
  it('writes a short date and time', () => {
    expect(formatRecorded('2026-11-30T10:05:00.000Z', 'UTC')).toBe('30 Nov 2026, 10:05');
    expect(formatRecorded('not a date')).toBe('—');
  });
});
