import { buildComparison } from '@tumblewise/shared';
import { unit } from 'mathjs';
import { chartableRows, compareChartOptions } from './compare-chart';

// Hand-written minimal reports with round invented numbers; the conversion reference is mathjs.
const report = (mass: number, moments: number[]) => ({ mass, principal: { moments }, spin: { verdict: 'steady' } });
const comparison = buildComparison(
  [
    { id: 'a', label: 'v1', report: report(0.25, [2e-3, 1.5e-3, 1e-4]) },
    { id: 'b', label: 'v2', report: report(0.3, [2.5e-3, 1.5e-3, 1e-4]) },
  ],
  'b',
);

describe('compareChartOptions', () => {
  it('groups the three principal moments per variant in g·cm²', () => {
    const o = compareChartOptions(comparison, 'moments') as { series: { data: number[] }[]; xAxis: { data: string[] } };
    expect(o.series).toHaveLength(3);
    expect(o.series[0].data[1]).toBeCloseTo(unit(2.5e-3, 'kg m^2').toNumber('g cm^2'), 6);
    expect(o.xAxis.data).toEqual(['v1', 'v2\n(baseline)']);
  });

  it('draws one figure with the baseline as a line', () => {
    const o = compareChartOptions(comparison, 'mass') as {
      series: { data: { value: number }[]; markLine: { data: { yAxis: number }[] } }[];
    };
    expect(o.series[0].data.map((d) => d.value)).toEqual([250, 300]);
    expect(o.series[0].markLine.data[0].yAxis).toBe(300);
  });

  it('offers only numeric figures that have a value', () => {
    const keys = chartableRows(comparison).map((r) => r.key);
    expect(keys).toContain('mass');
    expect(keys).not.toContain('verdict');
    expect(keys).not.toContain('swingweight');
    expect(() => compareChartOptions(comparison, 'verdict')).toThrow(RangeError);
  });
});
