import type { EChartsCoreOption } from 'echarts/core';
import type { Distribution } from '@tumblewise/engine';
import { CHART_TEXT } from '@tumblewise/viewer';

/** How a distribution's values are shown: axis title, unit and conversion from SI. */
export interface HistogramAxis {
  title: string;
  unit: string;
  convert: (si: number) => number;
}

const short = (x: number) => String(Number(x.toPrecision(3)));

/**
 * Bar chart of a scatter study's histogram: one bar per equal-width bin between the sampled minimum
 * and maximum (labelled by the bin's centre), with the nominal design's value drawn as a line.
 */
export function histogramOptions(d: Distribution, axis: HistogramAxis, nominal: number | null, colour: string): EChartsCoreOption {
  const { from, to, counts } = d.histogram;
  const width = counts.length ? (to - from) / counts.length : 0;
  const centres = counts.map((_, i) => axis.convert(from + (i + 0.5) * width));
  const labels = centres.map(short);
  const total = counts.reduce((a, b) => a + b, 0);
  // The nominal value's bin, for the marker line on the category axis.
  const nominalBin =
    nominal === null || width === 0 ? null : Math.min(counts.length - 1, Math.max(0, Math.floor((nominal - from) / width)));
  return {
    animation: false,
    textStyle: CHART_TEXT,
    aria: {
      enabled: true,
      label: {
        description: `Histogram of ${axis.title} over ${total} samples, from ${short(axis.convert(from))} to ${short(axis.convert(to))} ${axis.unit}; the middle 90 % lie between ${short(axis.convert(d.p05))} and ${short(axis.convert(d.p95))} ${axis.unit}.`,
      },
    },
    grid: { left: 56, right: 16, top: 24, bottom: 52 },
    tooltip: { trigger: 'axis', axisPointer: { type: 'shadow' } },
    xAxis: {
      type: 'category',
      data: labels,
      name: `${axis.title} (${axis.unit})`,
      nameLocation: 'middle',
      nameGap: 32,
      axisLabel: { ...CHART_TEXT, hideOverlap: true },
    },
    yAxis: { type: 'value', name: 'samples', axisLabel: CHART_TEXT, minInterval: 1 },
    series: [
      {
        name: axis.title,
        type: 'bar',
        barCategoryGap: '8%',
        color: colour,
        data: counts,
        ...(nominalBin !== null
          ? {
              markLine: {
                symbol: 'none',
                silent: true,
                lineStyle: { type: 'dashed', color: '#263238' },
                label: { formatter: 'nominal', color: CHART_TEXT.color },
                data: [{ xAxis: labels[nominalBin] }],
              },
            }
          : {}),
      },
    ],
  };
}
