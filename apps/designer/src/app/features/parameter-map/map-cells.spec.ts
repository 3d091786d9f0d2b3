import type { SweepPoint } from '@tumblewise/shared';
import { VERDICT_LABELS } from '@tumblewise/ui';
import {
  CELL_LOOKS,
  cellClass,
  classRuns,
  classShares,
  gridCell,
  nearestPoint,
  nearestStep,
  pointIndex,
  sharePercent,
  summaryText,
  valuesAt,
} from './map-cells';

const point = (verdict: SweepPoint['verdict']): Pick<SweepPoint, 'verdict'> => ({ verdict });

describe('cell classes', () => {
  it('maps each verdict to its own class and a point without a valid part (verdict null) to "invalid"', () => {
    expect(cellClass(point('steady'))).toBe('steady');
    expect(cellClass(point('watch'))).toBe('watch');
    expect(cellClass(point('flip-prone'))).toBe('flip-prone');
    expect(cellClass(point(null))).toBe('invalid');
  });

  it('names the verdicts as the app’s chips do, and draws the invalid class hatched', () => {
    expect(CELL_LOOKS.steady.word).toBe(VERDICT_LABELS.steady.label);
    expect(CELL_LOOKS['flip-prone'].icon).toBe(VERDICT_LABELS['flip-prone'].icon);
    expect(CELL_LOOKS.invalid.word).toBe('No valid part');
    expect(Object.values(CELL_LOOKS).filter((l) => l.hatched)).toEqual([CELL_LOOKS.invalid]);
    expect(new Set(Object.values(CELL_LOOKS).map((l) => l.colour)).size).toBe(4);
  });

  it('counts every class, empty ones included, and writes the shares as a sentence', () => {
    const points = [point('steady'), point('steady'), point('flip-prone'), point(null)];
    const shares = classShares(points);
    expect(shares.map((s) => [s.cls, s.count, s.share])).toEqual([
      ['steady', 2, 0.5],
      ['watch', 0, 0],
      ['flip-prone', 1, 0.25],
      ['invalid', 1, 0.25],
    ]);
    expect(summaryText(shares)).toBe('Of 4 grid points: Steady 50 %, Watch 0 %, Flip-prone 25 %, No valid part 25 %.');
    expect(sharePercent(0.004)).toBe('0.4 %');
    expect(classShares([]).every((s) => s.share === 0)).toBe(true);
  });
});

describe('row-major grid indexing (first axis slowest)', () => {
  const answer = {
    axes: [
      { primitive: 'rod', parameter: 'radius' as const, values: [0.006, 0.009, 0.012] },
      { primitive: 'knob', parameter: 'position.0' as const, values: [-0.01, 0, 0.01, 0.02] },
    ],
  };

  it('turns a cell into its index and back', () => {
    expect(pointIndex(2, 1, 4)).toBe(9);
    expect(gridCell(9, 4)).toEqual({ i: 2, j: 1 });
    for (let k = 0; k < 12; k++) {
      const { i, j } = gridCell(k, 4);
      expect(pointIndex(i, j, 4)).toBe(k);
    }
  });

  it('reads a point’s values from the axes’ grids', () => {
    expect(valuesAt(answer, 0)).toEqual([0.006, -0.01]);
    expect(valuesAt(answer, 3)).toEqual([0.006, 0.02]);
    expect(valuesAt(answer, 4)).toEqual([0.009, -0.01]);
    expect(valuesAt(answer, 11)).toEqual([0.012, 0.02]);
    expect(valuesAt({ axes: answer.axes.slice(0, 1) }, 2)).toEqual([0.012]);
  });

  it('finds the grid point nearest to typed values', () => {
    expect(nearestStep([1, 2, 3], 2.4)).toBe(1);
    expect(nearestStep([1, 2, 3], 99)).toBe(2);
    expect(
      nearestPoint(
        answer.axes.map((a) => a.values),
        [0.0118, 0.004],
      ),
    ).toBe(pointIndex(2, 1, 4));
    expect(nearestPoint([[10, 20, 30]], [26])).toBe(2);
  });
});

describe('classRuns', () => {
  it('groups neighbouring points of the same class', () => {
    expect(classRuns(['flip-prone', 'flip-prone', 'watch', 'steady', 'steady', 'invalid'])).toEqual([
      { cls: 'flip-prone', first: 0, last: 1 },
      { cls: 'watch', first: 2, last: 2 },
      { cls: 'steady', first: 3, last: 4 },
      { cls: 'invalid', first: 5, last: 5 },
    ]);
    expect(classRuns([])).toEqual([]);
  });
});
