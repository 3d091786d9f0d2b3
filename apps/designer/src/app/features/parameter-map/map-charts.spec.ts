import { marginChartOptions, verdictMapOptions, type ChartAxis } from './map-charts';
import { CELL_LOOKS, type CellClass } from './map-cells';

type Series = { type: string; name: string; data: number[][]; itemStyle?: { color?: string; decal?: unknown }; markArea?: unknown };
type Options = { series: Series[]; xAxis: unknown; yAxis: unknown; aria: { label: { description: string } } };

const across: ChartAxis = { title: 'knob · Position x', unit: 'mm', values: [-10, 0, 10], current: 0 };
const up: ChartAxis = { title: 'foam · Inner radius', unit: 'mm', values: [5, 10], current: 9 };

describe('verdictMapOptions', () => {
  // Row-major, first axis (across) slowest: (−10, 5) (−10, 10) (0, 5) (0, 10) (10, 5) (10, 10).
  const classes: CellClass[] = ['flip-prone', 'invalid', 'watch', 'invalid', 'steady', 'steady'];

  it('draws one heat map series per class, each cell at its grid position with its class code and row-major index', () => {
    const o = verdictMapOptions({ x: across, y: up, classes, selected: null, summary: 'Of 6 grid points.' }) as unknown as Options;
    const heat = o.series.filter((s) => s.type === 'heatmap');
    expect(heat.map((s) => s.name)).toEqual(['Steady', 'Watch', 'Flip-prone', 'No valid part']);
    expect(heat[0].data).toEqual([
      [2, 0, 0, 4],
      [2, 1, 0, 5],
    ]);
    expect(heat[2].data).toEqual([[0, 0, 2, 0]]);
    expect(heat[3].data).toEqual([
      [0, 1, 3, 1],
      [1, 1, 3, 3],
    ]);
    // The class code colours the cell through the visual map.
    const pieces = (o as unknown as { visualMap: { pieces: { value: number; color: string }[] } }).visualMap.pieces;
    expect(pieces.map((p) => p.color)).toEqual([
      CELL_LOOKS.steady.colour,
      CELL_LOOKS.watch.colour,
      CELL_LOOKS['flip-prone'].colour,
      CELL_LOOKS.invalid.colour,
    ]);
    expect(heat[0].itemStyle?.color).toBe(CELL_LOOKS.steady.colour);
    expect(heat[3].itemStyle?.decal).toBeDefined();
    expect(heat[0].itemStyle?.decal).toBeUndefined();
  });

  it('puts value axes in display units half a step beyond the ends, titled with their units', () => {
    const o = verdictMapOptions({ x: across, y: up, classes, selected: null, summary: '' }) as unknown as {
      xAxis: { min: number; max: number; name: string }[];
      yAxis: { min: number; max: number; name: string }[];
    };
    expect([o.xAxis[0].min, o.xAxis[0].max, o.xAxis[0].name]).toEqual([-15, 15, 'knob · Position x (mm)']);
    expect([o.yAxis[0].min, o.yAxis[0].max, o.yAxis[0].name]).toEqual([2.5, 12.5, 'foam · Inner radius (mm)']);
  });

  it('marks the current design inside the map, and the chosen point', () => {
    const o = verdictMapOptions({ x: across, y: up, classes, selected: 3, summary: 'S.' }) as unknown as Options;
    const current = o.series.find((s) => s.name === 'Current design');
    const chosen = o.series.find((s) => s.name === 'Chosen point');
    expect(current?.data).toEqual([[0, 9]]);
    expect(chosen?.data).toEqual([[0, 10]]);
    expect(o.aria.label.description).toContain('S.');
    const outside = verdictMapOptions({ x: { ...across, current: 40 }, y: up, classes, selected: null, summary: '' }) as unknown as Options;
    expect(outside.series.some((s) => s.name === 'Current design' || s.name === 'Chosen point')).toBe(false);
  });
});

describe('marginChartOptions', () => {
  it('shades each stretch of one verdict between the midpoints to its neighbours and marks the current value', () => {
    const o = marginChartOptions({
      axis: { title: 'throat · Size x', unit: 'mm', values: [40, 50, 60, 70], current: 55 },
      classes: ['flip-prone', 'flip-prone', 'watch', 'steady'],
      margins: [-3, -1, 0.5, 4],
      second: { title: 'Mass', unit: 'g', values: [100, 110, 120, 130] },
      selected: 1,
      summary: '',
    }) as unknown as {
      series: {
        name: string;
        data: unknown[];
        markArea?: { data: [{ xAxis: number }, { xAxis: number }][] };
        markLine?: { data: unknown[] };
      }[];
      yAxis: { name: string }[];
    };
    const line = o.series[0];
    expect(line.data).toEqual([
      [40, -3],
      [50, -1],
      [60, 0.5],
      [70, 4],
    ]);
    expect(line.markArea!.data.map(([a, b]) => [a.xAxis, b.xAxis])).toEqual([
      [40, 55],
      [55, 65],
      [65, 70],
    ]);
    expect(line.markLine!.data).toEqual([{ xAxis: 55 }]);
    expect(o.yAxis.map((a) => a.name)).toEqual(['Steady margin (%)', 'Mass (g)']);
    expect(o.series.find((s) => s.name === 'Chosen point')?.data).toEqual([[50, -1]]);
  });
});
