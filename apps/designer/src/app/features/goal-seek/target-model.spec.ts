import { analyzePart } from '@tumblewise/engine';
import {
  currentFigures,
  figureFromDisplay,
  figureToDisplay,
  showFigure,
  startingValue,
  targetProblem,
  targetRequest,
  targetText,
} from './target-model';

// Unit factors are the SI definitions (NIST Special Publication 811, 2008, Appendix B.8): 1 g = 1e-3 kg,
// 1 mm = 1e-3 m, 1 kg·cm² = 1e-4 kg·m².
describe('target values in display units', () => {
  it('go to SI for the request: g → kg, mm → m, kg·cm² → kg·m², % → ratio', () => {
    expect(figureFromDisplay('mass', 250)).toBe(0.25);
    expect(figureFromDisplay('balancePoint', 310)).toBe(0.31);
    expect(figureFromDisplay('swingweight', 320)).toBe(0.032);
    expect(figureFromDisplay('I2', 12.5)).toBe(0.00125);
    expect(figureFromDisplay('steadyMargin', 5)).toBe(0.05);
    expect(figureToDisplay('twistweight', 0.0014)).toBeCloseTo(14, 12);
    expect(figureToDisplay('centreOfPercussion', 0.512)).toBeCloseTo(512, 12);
  });

  it('make the three kinds of target', () => {
    expect(targetRequest({ figure: 'swingweight', kind: 'equal', value: 320 })).toEqual({ figure: 'swingweight', value: 0.032 });
    expect(targetRequest({ figure: 'mass', kind: 'atLeast', value: 250 })).toEqual({ figure: 'mass', min: 0.25 });
    expect(targetRequest({ figure: 'balancePoint', kind: 'atMost', value: 300 })).toEqual({ figure: 'balancePoint', max: 0.3 });
  });

  it('are refused when empty, or zero for a figure that is always positive', () => {
    expect(targetProblem({ figure: 'mass', kind: 'equal', value: null })).toBe('is required');
    expect(targetProblem({ figure: 'mass', kind: 'equal', value: 0 })).toBe('must be greater than zero');
    expect(targetProblem({ figure: 'I1', kind: 'equal', value: -2 })).toBe('must be greater than zero');
    expect(targetProblem({ figure: 'steadyMargin', kind: 'atLeast', value: -3 })).toBeNull();
    expect(targetProblem({ figure: 'balancePoint', kind: 'equal', value: 310 })).toBeNull();
  });

  it('read as words with their units', () => {
    expect(targetText({ figure: 'swingweight', value: 0.032 })).toBe('swingweight 320 kg·cm²');
    expect(targetText({ figure: 'mass', min: 0.25 })).toBe('mass ≥ 250 g');
    expect(targetText({ figure: 'balancePoint', max: 0.3 })).toBe('balance point ≤ 300 mm');
    expect(targetText({ figure: 'I1', value: 0.00125 })).toBe('I1 12.5 kg·cm²');
    expect(targetText({ figure: 'steadyMargin', min: 0.05 })).toBe('steady margin ≥ 5 %');
    expect(showFigure('centreOfPercussion', null)).toBe('—');
  });
});

describe('the draft’s figures now', () => {
  // An invented solid rod, 600 mm long and 10 mm in radius, of 700 kg/m³, from the butt at z = 0, spun about its long axis.
  const r = 0.01,
    L = 0.6,
    rho = 700;
  const report = analyzePart({
    name: 'Harbour test rod',
    primitives: [{ id: 'rod', shape: 'cylinder', radius: r, length: L, position: [0, 0, L / 2], density: rho }],
    spin: { axis: [0, 0, 1], rate: 10 },
    grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
  });
  const figures = currentFigures(report);
  // Machinery's Handbook, solid cylinder: m = ρπr²L; about its axis mr²/2; about a diameter through the centre m(3r² + L²)/12.
  const m = rho * Math.PI * r * r * L;
  const across = (m * (3 * r * r + L * L)) / 12;

  it('give mass, balance point and principal moments as the handbook formulas do', () => {
    expect(figures.mass).toBeCloseTo(m, 10);
    expect(figures.balancePoint).toBeCloseTo(L / 2, 10);
    expect(figures.I1).toBeCloseTo(across, 10);
    expect(figures.I3).toBeCloseTo((m * r * r) / 2, 10);
  });

  it('give the swingweight about the axis 100 mm from the butt by the parallel-axis theorem', () => {
    // The 100 mm swingweight axis is common practice in the trade; the parallel-axis theorem adds m·d².
    expect(figures.swingweight).toBeCloseTo(across + m * (L / 2 - 0.1) ** 2, 10);
    expect(figures.twistweight).toBeCloseTo((m * r * r) / 2, 10);
  });

  it('give the steady margin of spin about the minor axis as (I2 − I3)/I2', () => {
    expect(figures.steadyMargin).toBeCloseTo((across - (m * r * r) / 2) / across, 8);
  });

  it('start a new target at the value now, to four significant digits in its display unit', () => {
    expect(startingValue('mass', figures.mass)).toBe(Number((m * 1000).toPrecision(4)));
    expect(startingValue('centreOfPercussion', null)).toBeNull();
  });
});
