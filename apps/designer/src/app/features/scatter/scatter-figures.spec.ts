import { percentagePoints, studyFigure } from './scatter-figures';

describe('study figures', () => {
  it('writes significant digits without an exponent or trailing zeros', () => {
    expect(studyFigure(1366.2, 3)).toBe('1370');
    expect(studyFigure(341.04, 3)).toBe('341');
    expect(studyFigure(0, 2)).toBe('0');
    expect(studyFigure(-0.000001, 2)).toBe('−0.000001');
  });

  it('writes a negative figure with a minus sign, and a margin change in points (0.01 = 1 point)', () => {
    expect(studyFigure(-0.18, 2)).toBe('−0.18');
    expect(percentagePoints(-0.0038)).toBe('−0.38');
    expect(percentagePoints(0.0007)).toBe('0.07');
    expect(studyFigure(Number.NaN, 2)).toBe('—');
  });
});
