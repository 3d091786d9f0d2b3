import type { EChartsCoreOption } from 'echarts/core';
import type { SimulationResult } from '@tumblewise/engine';
import { CHART_TEXT } from '../charts/chart-style';
import { AXIS_ROLES, VIEWER_COLOURS } from '../scene/viewer-palette';

/** Most points per series handed to the chart; longer runs are thinned evenly (the end sample kept). */
export const OMEGA_CHART_POINTS = 1500;

const SERIES_NAMES = ['ω1 (major)', 'ω2 (intermediate)', 'ω3 (minor)'];

/** Colour of the end-of-flight line: a neutral grey apart from the three axis colours. */
const FLIGHT_LINE_COLOUR = '#5d6d7e';

/**
 * Line chart of the body-frame angular velocity components over time (rad/s against s), one
 * series per principal axis in the legend's colours. With a flight time (s) inside the run, a
 * dashed vertical line marks where the flight ends. Pure: the same input gives the same option.
 */
export function omegaChartOptions(sim: Pick<SimulationResult, 'times' | 'omega'>, flightTime: number | null = null): EChartsCoreOption {
  const n = sim.times.length;
  const end = n ? sim.times[n - 1] : 0;
  const flight = flightTime !== null && flightTime > 0 && flightTime <= end ? flightTime : null;
  const flightLabel = flight === null ? '' : `flight ends, ${Number(flight.toPrecision(3))} s`;
  const stride = Math.max(1, Math.ceil(n / OMEGA_CHART_POINTS));
  const picks: number[] = [];
  for (let i = 0; i < n; i += stride) picks.push(i);
  if (n && picks[picks.length - 1] !== n - 1) picks.push(n - 1);
  return {
    animation: false,
    textStyle: CHART_TEXT,
    aria: {
      enabled: true,
      label: {
        description:
          'Angular velocity components ω1, ω2 and ω3 in the body frame, in rad/s, against time in seconds.' +
          (flight === null ? '' : ` A dashed line marks the end of the flight at ${Number(flight.toPrecision(3))} s.`),
      },
    },
    legend: { top: 0, textStyle: CHART_TEXT },
    grid: { left: 56, right: 16, top: 36, bottom: 40 },
    tooltip: { trigger: 'axis', valueFormatter: (v: unknown) => (typeof v === 'number' ? `${v.toFixed(3)} rad/s` : String(v)) },
    xAxis: {
      type: 'value',
      name: 'time (s)',
      nameLocation: 'middle',
      nameGap: 26,
      min: 0,
      max: n ? sim.times[n - 1] : 1,
      axisLabel: CHART_TEXT,
    },
    yAxis: { type: 'value', name: 'ω (rad/s)', nameLocation: 'middle', nameGap: 42, axisLabel: CHART_TEXT },
    series: AXIS_ROLES.map((role, k) => ({
      name: SERIES_NAMES[k],
      type: 'line',
      showSymbol: false,
      lineStyle: { width: 1.5 },
      color: VIEWER_COLOURS[role],
      data: picks.map((i) => [sim.times[i], sim.omega[i][k]]),
      ...(k === 0 && flight !== null
        ? {
            markLine: {
              silent: true,
              symbol: 'none',
              lineStyle: { color: FLIGHT_LINE_COLOUR, type: 'dashed', width: 1.5 },
              label: { formatter: flightLabel, position: 'insideEndTop', ...CHART_TEXT },
              data: [{ xAxis: flight }],
            },
          }
        : {}),
    })),
  };
}
