import type { SweepAnswer } from '@tumblewise/shared';
import { EDITOR_UNITS } from '../part-editor/display-value';
import type { ParameterChoice } from './parameter-choices';
import { pointDetail } from './point-detail';

const choices: ParameterChoice[] = [
  { key: 'knob|position.0', primitive: 'knob', parameter: 'position.0', label: 'Position x', units: EDITOR_UNITS.length, current: 0 },
  {
    key: 'foam|innerRadius',
    primitive: 'foam',
    parameter: 'innerRadius',
    label: 'Inner radius',
    units: EDITOR_UNITS.length,
    current: 0.009,
  },
];
// A 2 × 3 grid, first axis slowest; the last column makes the bore wider than the foam.
const figures = (margin: number) => ({ steadyMargin: margin, mass: 0.2, I1: 0.004, I2: 0.0039, I3: 0.0001 });
const ANSWER: SweepAnswer = {
  axes: [
    { primitive: 'knob', parameter: 'position.0', values: [-0.01, 0.01] },
    { primitive: 'foam', parameter: 'innerRadius', values: [0.005, 0.01, 0.02] },
  ],
  figures: ['steadyMargin', 'mass', 'I1', 'I2', 'I3'],
  points: [
    { values: [-0.01, 0.005], verdict: 'flip-prone', nearestAxis: 'intermediate', figures: figures(-0.012) },
    { values: [-0.01, 0.01], verdict: 'flip-prone', nearestAxis: 'intermediate', figures: figures(-0.011) },
    {
      values: [-0.01, 0.02],
      verdict: null,
      nearestAxis: null,
      figures: { steadyMargin: null, mass: null, I1: null, I2: null, I3: null },
      error: 'foam: innerRadius must be less than radius',
    },
    { values: [0.01, 0.005], verdict: 'watch', nearestAxis: 'major', figures: figures(0.004) },
    { values: [0.01, 0.01], verdict: 'steady', nearestAxis: 'major', figures: figures(0.12) },
    {
      values: [0.01, 0.02],
      verdict: null,
      nearestAxis: null,
      figures: { steadyMargin: null, mass: null, I1: null, I2: null, I3: null },
      error: 'foam: innerRadius must be less than radius',
    },
  ],
};

describe('pointDetail', () => {
  it('reads a clicked cell’s values from the grids by its row-major index, in display units', () => {
    const d = pointDetail(ANSWER, choices, 4)!;
    expect(d.values).toEqual([0.01, 0.01]);
    expect(d.shownValues).toEqual([
      { name: 'knob · Position x', shown: '10 mm' },
      { name: 'foam · Inner radius', shown: '10 mm' },
    ]);
    expect(d.cls).toBe('steady');
    expect(d.nearestAxis).toBe('major');
    expect(d.error).toBeNull();
    expect(d.figures).toEqual([
      { name: 'Steady margin', shown: '12 %' },
      { name: 'Mass', shown: '200 g' },
      { name: 'Principal moment I1', shown: '40 kg·cm²' },
      { name: 'Principal moment I2', shown: '39 kg·cm²' },
      { name: 'Principal moment I3', shown: '1 kg·cm²' },
    ]);
    expect(pointDetail(ANSWER, choices, 3)!.values).toEqual([0.01, 0.005]);
  });

  it('says why a point makes no valid part', () => {
    const d = pointDetail(ANSWER, choices, 2)!;
    expect(d.cls).toBe('invalid');
    expect(d.word).toBe('No valid part');
    expect(d.verdict).toBeNull();
    expect(d.error).toBe('foam: innerRadius must be less than radius');
    expect(d.figures[0].shown).toBe('—');
  });

  it('answers null outside the grid', () => {
    expect(pointDetail(ANSWER, choices, 6)).toBeNull();
    expect(pointDetail(ANSWER, choices, -1)).toBeNull();
  });
});
