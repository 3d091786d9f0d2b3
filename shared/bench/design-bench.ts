// Goal seek and design sweep benchmarks (part of `npm run bench -- engine`). Target (issue "Design to
// target"): a 50-primitive part with four free parameters solves in under 200 ms on this machine.
// Parts: the 50-primitive part of the web benchmarks and a small invented racket.
import { goalSeek, sweepDesign, validatePartDocument, type GoalSeekRequest } from '../src/engine/public-api';
import { designFigures } from '../src/engine/design/design-figures';
import { writeDesignParameter } from '../src/engine/design/design-parameters';
import type { PartDocument } from '../src/schemas/part-document';
import { editorBenchPart } from './bench-part';
import type { BenchTable } from './bench-table';

function valid(json: unknown): PartDocument {
  const v = validatePartDocument(json);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

/** Milliseconds of each of `runs` calls: the first (cold) and the median of the rest. */
function time(fn: () => unknown, runs: number): { first: number; median: number } {
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    out.push(performance.now() - t0);
  }
  const warm = out.slice(1).sort((a, b) => a - b);
  return { first: out[0], median: warm[Math.floor(warm.length / 2)] };
}

/** Records the goal seek and sweep rows. */
export function designBench(table: BenchTable): void {
  const big = valid(editorBenchPart());
  const free: GoalSeekRequest['free'] = [
    { primitive: 'ballast', parameter: 'size.2', min: 0.01, max: 0.08 },
    { primitive: 'ballast', parameter: 'density', min: 2000, max: 9000 },
    { primitive: 'p1', parameter: 'position.2', min: -1, max: 1 },
    { primitive: 'p4', parameter: 'radius', min: 0.005, max: 0.06 },
  ];
  // Targets made from known values (recovery by construction), so the seek can meet them.
  let made = big;
  [0.052, 6100, 0.35, 0.031].forEach((v, i) => (made = writeDesignParameter(made, free[i].primitive!, free[i].parameter!, v)));
  const truth = designFigures(made, ['mass', 'balancePoint', 'swingweight', 'I1']);
  const reachable: GoalSeekRequest = {
    free,
    targets: Object.entries(truth).map(([figure, value]) => ({ figure: figure as 'mass', value: value! })),
  };
  const r = goalSeek(big, reachable);
  {
    const t = time(() => goalSeek(big, reachable), 30);
    table.record(
      `goal seek: 50 primitives, 4 free, 4 targets (${r.status}; target < 200 ms)`,
      t.median,
      'ms',
      `median; first call ${t.first.toFixed(1)} ms`,
    );
  }
  const unreachable: GoalSeekRequest = {
    free,
    targets: [
      { figure: 'mass', value: truth.mass! * 10 },
      { figure: 'swingweight', value: truth.swingweight! / 10 },
    ],
  };
  const u = goalSeek(big, unreachable);
  {
    const t = time(() => goalSeek(big, unreachable), 10);
    table.record(
      `goal seek: 50 primitives, 4 free, unreachable targets (${u.status}, every start runs)`,
      t.median,
      'ms',
      `median; first call ${t.first.toFixed(1)} ms`,
    );
  }

  const racket = valid({
    name: 'Kestrel Bay junior frame',
    primitives: [
      { id: 'handle', shape: 'cylinder', radius: 0.014, length: 0.2, position: [0, 0, 0.1], density: 650 },
      { id: 'hoop', shape: 'torus', majorRadius: 0.11, minorRadius: 0.008, position: [0, 0, 0.42], rotationDeg: [90, 0, 0], density: 1500 },
      { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
    ],
    spin: { axis: [0, 1, 0], rate: 20 },
    grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
  });
  const grid = {
    axes: [
      { primitive: 'hoop', parameter: 'majorRadius' as const, from: 0.08, to: 0.14, steps: 100 },
      { primitive: 'handle', parameter: 'length' as const, from: 0.1, to: 0.3, steps: 100 },
    ],
    figures: ['mass', 'swingweight', 'balancePoint', 'steadyMargin', 'I1', 'I2', 'I3'] as (
      'mass' | 'swingweight' | 'balancePoint' | 'steadyMargin' | 'I1' | 'I2' | 'I3'
    )[],
  };
  {
    const t = time(() => sweepDesign(racket, grid), 5);
    table.record('sweep 100 × 100 points, 3-primitive part, 7 figures', t.median, 'ms', `median; first call ${t.first.toFixed(1)} ms`);
  }
  const bigGrid = {
    ...grid,
    axes: [
      { ...grid.axes[0], primitive: 'ballast', parameter: 'size.2' as const, from: 0.01, to: 0.08 },
      { ...grid.axes[1], primitive: 'p4', parameter: 'radius' as const, from: 0.005, to: 0.06 },
    ],
  };
  {
    const t = time(() => sweepDesign(big, bigGrid), 5);
    table.record('sweep 100 × 100 points, 50-primitive part, 7 figures', t.median, 'ms', `median; first call ${t.first.toFixed(1)} ms`);
  }
}
