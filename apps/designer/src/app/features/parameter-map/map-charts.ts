import { CHART_TEXT, SERIES_COLOURS } from '@tumblewise/viewer';
import type { EChartsCoreOption } from 'echarts/core';
import { formatFigure } from '../spin-report/report-figures';
import { CELL_CLASSES, CELL_LOOKS, classRuns, gridCell, HATCH_COLOUR, type CellClass } from './map-cells';

/** One swept parameter as a chart shows it: its title and unit, the grid values and the current design's value (display units). */
export interface ChartAxis {
  /** "hoop · Ring radius". */
  title: string;
  unit: string;
  /** Grid values, ascending (display units). */
  values: readonly number[];
  /** The draft's value (display units); null when it is not known. */
  current: number | null;
}

/** A second figure drawn beside the margin in a line chart (display units, null where it does not exist). */
export interface SecondFigure {
  title: string;
  unit: string;
  values: readonly (number | null)[];
}

/** What the line chart of one parameter draws. */
export interface LineChartInput {
  axis: ChartAxis;
  /** Class of each grid point. */
  classes: readonly CellClass[];
  /** Steady margin of each grid point, in per cent; null where there is no valid part. */
  margins: readonly (number | null)[];
  second: SecondFigure | null;
  /** The chosen grid point, ringed. */
  selected: number | null;
  /** The text summary, for the chart's description. */
  summary: string;
}

/** What the map of two parameters draws. */
export interface MapChartInput {
  /** The first parameter (the grid's slow axis), across. */
  x: ChartAxis;
  /** The second parameter, up. */
  y: ChartAxis;
  /** Class of each grid point, row-major (first parameter slowest). */
  classes: readonly CellClass[];
  selected: number | null;
  summary: string;
}

const INK = '#1f2329';
const named = (a: Pick<ChartAxis, 'title' | 'unit'>) => (a.unit ? `${a.title} (${a.unit})` : a.title);
const short = (x: number) => formatFigure(x, 4);
/** Stripes of the "no valid part" class (an echarts decal pattern). */
const HATCH = { symbol: 'rect', symbolSize: 1, color: HATCH_COLOUR, dashArrayX: [1, 0], dashArrayY: [2, 5], rotation: -Math.PI / 4 };

/** Half a grid step beyond each end, so the first and last cells are whole. */
function cellExtent(values: readonly number[]): { min: number; max: number } {
  const half = values.length > 1 ? (values[values.length - 1] - values[0]) / (values.length - 1) / 2 : 0;
  return { min: values[0] - half, max: values[values.length - 1] + half };
}

/** The current design's marker: a white disc ringed in ink, labelled. */
function currentMarker(position: number[], xAxisIndex = 0, yAxisIndex = 0) {
  return {
    name: 'Current design',
    type: 'scatter',
    xAxisIndex,
    yAxisIndex,
    silent: true,
    z: 5,
    symbol: 'circle',
    symbolSize: 14,
    itemStyle: { color: '#ffffff', borderColor: INK, borderWidth: 3 },
    label: { show: true, position: 'top', formatter: 'current', color: INK, backgroundColor: '#ffffffcc', padding: [1, 3] },
    data: [position],
  };
}

/** The chosen point's marker: a square outline. */
function selectedMarker(position: number[], xAxisIndex = 0, yAxisIndex = 0) {
  return {
    name: 'Chosen point',
    type: 'scatter',
    xAxisIndex,
    yAxisIndex,
    silent: true,
    z: 6,
    symbol: 'rect',
    symbolSize: 16,
    itemStyle: { color: 'transparent', borderColor: INK, borderWidth: 2.5 },
    data: [position],
  };
}

/**
 * Line chart of the steady margin (%) against one parameter: the verdict of each stretch shaded
 * behind the line in the map's colours, the current design marked by a vertical line, the chosen
 * point ringed, and optionally a second figure on its own axis at the right.
 */
export function marginChartOptions(input: LineChartInput): EChartsCoreOption {
  const { axis, classes, margins, second } = input;
  const xs = axis.values;
  const edge = (k: number, side: -1 | 1) => {
    const n = k + side;
    return n < 0 || n >= xs.length ? xs[k] : (xs[k] + xs[n]) / 2;
  };
  const bands = classRuns(classes).map((run) => [
    {
      xAxis: edge(run.first, -1),
      itemStyle: { color: CELL_LOOKS[run.cls].colour, opacity: run.cls === 'invalid' ? 0.6 : 0.35 },
    },
    { xAxis: edge(run.last, 1) },
  ]);
  const inRange = (v: number | null): v is number => v !== null && v >= xs[0] && v <= xs[xs.length - 1];
  const selected = input.selected;
  // Axis titles run along their axes, clear of the legend and the current design's label above the plot.
  const sideAxis = { type: 'value', nameLocation: 'middle', nameRotate: 90, nameTextStyle: CHART_TEXT, axisLabel: CHART_TEXT, scale: true };
  return {
    animation: false,
    textStyle: CHART_TEXT,
    aria: { enabled: true, label: { description: `Steady margin against ${named(axis)}. ${input.summary}` } },
    grid: { left: 72, right: second ? 80 : 24, top: 44, bottom: 56 },
    legend: { top: 0, textStyle: CHART_TEXT, data: ['Steady margin', ...(second ? [second.title] : [])] },
    tooltip: { trigger: 'axis', valueFormatter: (v: unknown) => (typeof v === 'number' ? short(v) : '—') },
    xAxis: {
      type: 'value',
      min: xs[0],
      max: xs[xs.length - 1],
      name: named(axis),
      nameLocation: 'middle',
      nameGap: 32,
      axisLabel: { ...CHART_TEXT, hideOverlap: true },
    },
    yAxis: [
      { ...sideAxis, name: 'Steady margin (%)', nameGap: 52 },
      ...(second ? [{ ...sideAxis, name: named(second), nameGap: 60, splitLine: { show: false } }] : []),
    ],
    series: [
      {
        name: 'Steady margin',
        type: 'line',
        color: INK,
        showSymbol: xs.length <= 60,
        symbolSize: 5,
        connectNulls: false,
        data: xs.map((x, k) => [x, margins[k]]),
        markArea: { silent: true, data: bands },
        ...(inRange(axis.current)
          ? {
              markLine: {
                symbol: 'none',
                silent: true,
                lineStyle: { type: 'dashed', color: INK },
                label: { formatter: 'current design', color: INK },
                data: [{ xAxis: axis.current }],
              },
            }
          : {}),
      },
      ...(second
        ? [
            {
              name: second.title,
              type: 'line',
              yAxisIndex: 1,
              color: SERIES_COLOURS[0],
              lineStyle: { type: 'dashed' },
              showSymbol: false,
              connectNulls: false,
              data: xs.map((x, k) => [x, second.values[k]]),
            },
          ]
        : []),
      ...(selected !== null && margins[selected] !== null ? [selectedMarker([xs[selected], margins[selected]])] : []),
    ],
  };
}

/**
 * Map of the verdict over two parameters: one cell per grid point coloured by its class (the
 * points without a valid part pale and hatched), drawn on hidden category axes under value axes
 * in display units (half a step wider at each end, so cell centres sit on their values); the
 * current design marked by a ringed disc, the chosen point by a square outline. A cell's values
 * are its grid position, its class's code (the index in CELL_CLASSES, coloured through a hidden
 * piecewise visual map, which echarts' heat maps draw by) and its row-major index.
 */
export function verdictMapOptions(input: MapChartInput): EChartsCoreOption {
  const { x, y, classes } = input;
  const ny = y.values.length;
  const cells = new Map<CellClass, number[][]>(CELL_CLASSES.map((c) => [c, []]));
  classes.forEach((cls, k) => {
    const { i, j } = gridCell(k, ny);
    cells.get(cls)?.push([i, j, CELL_CLASSES.indexOf(cls), k]);
  });
  const inside = (a: ChartAxis) => a.current !== null && a.current >= a.values[0] && a.current <= a.values[a.values.length - 1];
  const valueAxis = (a: ChartAxis, nameGap: number) => ({
    type: 'value',
    ...cellExtent(a.values),
    name: named(a),
    nameLocation: 'middle',
    nameGap,
    nameTextStyle: CHART_TEXT,
    // The ends lie half a step beyond the grid: their labels would read as grid values.
    axisLabel: { ...CHART_TEXT, hideOverlap: true, showMinLabel: false, showMaxLabel: false },
    axisLine: { onZero: false },
    splitLine: { show: false },
    z: 3,
  });
  const categoryAxis = (a: ChartAxis) => ({ type: 'category', show: false, data: a.values.map((_, k) => k) });
  const selected = input.selected === null ? null : gridCell(input.selected, ny);
  return {
    animation: false,
    textStyle: CHART_TEXT,
    aria: { enabled: true, label: { description: `Map of the verdict over ${named(x)} and ${named(y)}. ${input.summary}` } },
    grid: { left: 64, right: 16, top: 16, bottom: 56 },
    tooltip: {
      trigger: 'item',
      formatter: (p: { value?: number[] }) => {
        const v = p.value;
        if (!v || v.length < 4) return '';
        const cls = classes[v[3]];
        return `${named(x)}: ${short(x.values[v[0]])}<br>${named(y)}: ${short(y.values[v[1]])}<br>${cls ? CELL_LOOKS[cls].word : ''}`;
      },
    },
    // Each cell's class code (its third value) picks its colour; the legend is the page's own, so this one stays hidden.
    visualMap: {
      type: 'piecewise',
      show: false,
      dimension: 2,
      seriesIndex: CELL_CLASSES.map((_, k) => k),
      pieces: CELL_CLASSES.map((cls, code) => ({ value: code, color: CELL_LOOKS[cls].colour })),
    },
    xAxis: [valueAxis(x, 32), categoryAxis(x)],
    yAxis: [valueAxis(y, 48), categoryAxis(y)],
    series: [
      ...CELL_CLASSES.map((cls) => ({
        name: CELL_LOOKS[cls].word,
        type: 'heatmap',
        xAxisIndex: 1,
        yAxisIndex: 1,
        itemStyle: { color: CELL_LOOKS[cls].colour, ...(CELL_LOOKS[cls].hatched ? { decal: HATCH } : {}) },
        emphasis: { itemStyle: { borderColor: INK, borderWidth: 1 } },
        data: cells.get(cls),
      })),
      ...(inside(x) && inside(y) ? [currentMarker([x.current!, y.current!])] : []),
      ...(selected ? [selectedMarker([x.values[selected.i], y.values[selected.j]])] : []),
    ],
  };
}
