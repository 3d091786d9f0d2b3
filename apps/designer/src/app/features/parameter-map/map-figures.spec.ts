import { availableFigures, FIGURE_DISPLAY, showFigure } from './map-figures';

describe('map figures', () => {
  it('offers the grip-frame figures only for a part with a grip, the steady margin first', () => {
    expect(availableFigures(false)).toEqual(['steadyMargin', 'mass', 'I1', 'I2', 'I3']);
    expect(availableFigures(true)).toEqual([
      'steadyMargin',
      'mass',
      'balancePoint',
      'swingweight',
      'twistweight',
      'pivotMoment',
      'centreOfPercussion',
      'I1',
      'I2',
      'I3',
    ]);
  });

  it('shows SI values in the report’s units: 1 kg·m² = 10⁴ kg·cm² and 1 kg = 10³ g (SI prefixes, BIPM SI Brochure, 9th ed.)', () => {
    expect(showFigure('I1', 0.0084)).toBe('84 kg·cm²');
    expect(showFigure('mass', 0.2333)).toBe('233.3 g');
    expect(showFigure('balancePoint', 0.3)).toBe('300 mm');
    expect(FIGURE_DISPLAY.steadyMargin.convert(0.125)).toBe(12.5);
  });

  it('writes a negative margin with a minus sign and a missing figure as a dash', () => {
    expect(showFigure('steadyMargin', -0.0003246)).toBe('−0.03246 %');
    expect(showFigure('centreOfPercussion', null)).toBe('—');
  });
});
