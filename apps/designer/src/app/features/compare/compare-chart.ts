import type { EChartsCoreOption } from 'echarts/core';
import type { Comparison } from '@tumblewise/shared';
import { AXIS_ROLES, CHART_TEXT, SERIES_COLOURS, VIEWER_COLOURS } from '@tumblewise/viewer';
import { displayUnitOf, formatNumber } from './compare-figures';

/** The chart's figure: the three principal moments side by side, or one numeric row of the table. */
export type ChartFigure = 'moments' | string;

const MOMENT_KEYS = ['I1', 'I2', 'I3'] as const;

/** The numeric rows a chart can show (text rows and rows without any value left out). */
export function chartableRows(c: Comparison): { key: string; label: string }[] {
  return c.rows.filter((r) => r.unit !== 'text' && r.values.some((v) => v !== null)).map((r) => ({ key: r.key, label: r.label }));
}

/**
 * Bar chart of the comparison: for `moments` one group per variant with I1, I2 and I3 in g·cm²
 * (coloured like the principal axes in the 3-D view); otherwise one bar per variant for the chosen
 * figure in its display unit, with the baseline's value drawn as a dashed line.
 */
export function compareChartOptions(c: Comparison, figure: ChartFigure): EChartsCoreOption {
  const labels = c.variants.map((v, i) => (i === c.baselineIndex ? `${v.label}\n(baseline)` : v.label));
  const base = {
    animation: false,
    textStyle: CHART_TEXT,
    grid: { left: 72, right: 24, top: 40, bottom: 56, containLabel: false },
    tooltip: { trigger: 'axis', axisPointer: { type: 'shadow' } },
    xAxis: { type: 'category', data: labels, axisLabel: { ...CHART_TEXT, interval: 0, lineHeight: 16 } },
  };
  if (figure === 'moments') {
    const rows = MOMENT_KEYS.map((k) => c.rows.find((r) => r.key === k)!);
    const unit = displayUnitOf('kg·m²');
    return {
      ...base,
      aria: { enabled: true, label: { description: `Principal moments I1, I2 and I3 of each variant in ${unit.unit}.` } },
      legend: { top: 0, textStyle: CHART_TEXT },
      yAxis: { type: 'value', name: unit.unit, axisLabel: { ...CHART_TEXT, formatter: (v: number) => formatNumber(v) } },
      series: rows.map((row, k) => ({
        name: row.label,
        type: 'bar',
        color: VIEWER_COLOURS[AXIS_ROLES[k]],
        data: row.values.map((v) => (typeof v === 'number' ? unit.convert(v) : null)),
      })),
    };
  }
  const row = c.rows.find((r) => r.key === figure);
  if (!row || row.unit === 'text') throw new RangeError(`no numeric figure "${figure}" in the comparison`);
  const unit = displayUnitOf(row.unit);
  const values = row.values.map((v) => (typeof v === 'number' ? unit.convert(v) : null));
  const baseline = values[c.baselineIndex];
  return {
    ...base,
    aria: { enabled: true, label: { description: `${row.label} of each variant${unit.unit ? ` in ${unit.unit}` : ''}.` } },
    yAxis: { type: 'value', name: unit.unit, axisLabel: { ...CHART_TEXT, formatter: (v: number) => formatNumber(v) } },
    series: [
      {
        name: row.label,
        type: 'bar',
        data: values.map((v, i) => ({ value: v, itemStyle: { color: SERIES_COLOURS[i % SERIES_COLOURS.length] } })),
        ...(baseline !== null
          ? {
              markLine: {
                symbol: 'none',
                silent: true,
                lineStyle: { type: 'dashed', color: '#37474f' },
                label: { formatter: 'baseline', color: CHART_TEXT.color },
                data: [{ yAxis: baseline }],
              },
            }
          : {}),
      },
    ],
  };
}
