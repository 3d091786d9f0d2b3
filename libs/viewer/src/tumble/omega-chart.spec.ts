import { simulate } from '@tumblewise/engine';
import { omegaChartOptions } from './omega-chart';

// I = (6.5, 5, 2.5) about the intermediate axis: the MECHANICS §4 check moments, simulated by the engine.
const SIM = simulate({ moments: [6.5, 5, 2.5], axis: 'intermediate', rate: 1, misalignmentDeg: 1, seconds: 12, sampleRate: 20 });

interface Series {
  markLine?: { data: { xAxis: number }[]; label: { formatter: string } };
}
const seriesOf = (o: ReturnType<typeof omegaChartOptions>) => o['series'] as Series[];

describe('omegaChartOptions', () => {
  it('marks the end of the flight on the time axis with a labelled line, and says so in the chart description', () => {
    const o = omegaChartOptions(SIM, 3.2);
    const marked = seriesOf(o).filter((s) => s.markLine);
    expect(marked).toHaveLength(1);
    expect(marked[0].markLine!.data).toEqual([{ xAxis: 3.2 }]);
    expect(marked[0].markLine!.label.formatter).toBe('flight ends, 3.2 s');
    expect(JSON.stringify(o['aria'])).toContain('end of the flight at 3.2 s');
  });

  it('draws no mark without a flight time, or when the flight lasts beyond the run', () => {
    expect(seriesOf(omegaChartOptions(SIM)).some((s) => s.markLine)).toBe(false);
    expect(seriesOf(omegaChartOptions(SIM, 30)).some((s) => s.markLine)).toBe(false);
  });
});
