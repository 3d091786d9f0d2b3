import type { SimulationResult, SpinReport } from '@tumblewise/engine';
import { turnOvers } from './attitude-track';

const ROLE_INDEX = { major: 0, intermediate: 1, minor: 2 } as const;
const VERDICT_WORDS = { steady: 'steady', watch: 'watch (close to the limit)', 'flip-prone': 'flip-prone' } as const;

const fmt = (x: number, digits = 2) => Number(x.toPrecision(digits)).toString();

/**
 * The words a screen reader hears instead of the pictures: the verdict and its explanation, then
 * what the animation shows — read from the simulated motion itself (how often the angular momentum
 * changed sides in the body), not from the prediction.
 */
export function tumbleSummary(
  report: SpinReport,
  sim: Pick<SimulationResult, 'times' | 'polhode' | 'flipTime'> | null,
  misalignmentDeg: number,
): string {
  const verdict = `Verdict: ${VERDICT_WORDS[report.spin.verdict]}. ${report.spin.explanation}`.trim();
  if (!sim || sim.times.length === 0) return verdict;
  const seconds = sim.times[sim.times.length - 1];
  const axis = report.spin.nearestAxis;
  const flips = turnOvers(sim.polhode, ROLE_INDEX[axis]);
  const start = `The tumble preview plays ${fmt(seconds, 3)} s of free flight, started ${fmt(misalignmentDeg, 3)}° off the intended spin axis. The angular-momentum vector stays fixed while the body axes move.`;
  let motion: string;
  if (flips > 0) {
    const first = sim.flipTime !== null ? ` The first turn-over comes after about ${fmt(sim.flipTime, 2)} s.` : '';
    motion = ` The part turns over ${flips === 1 ? 'once' : `${flips} times`} in that time: the spin swaps ends about the ${axis} axis.${first}`;
  } else {
    motion = ` The spin stays about the ${axis} axis, wobbling slightly; the part does not turn over in that time.`;
  }
  return `${verdict} ${start}${motion}`;
}
