import { analyzePart, EngineInputError, simulate, type InputIssue } from '@tumblewise/engine';

/** Work the pool runs off the event loop. Inputs are untrusted JSON; the engine validates them. */
export type ComputeTask =
  | { kind: 'analyze'; part: unknown }
  | { kind: 'simulate'; input: unknown };

/** Errors cross the thread boundary as data (class identity does not survive structured clone). */
export type ComputeOutcome =
  | { ok: true; value: unknown }
  | { ok: false; kind: 'invalid' | 'unanalysable'; issues: InputIssue[] };

/** Runs one task (in a worker thread, or inline for tiny inputs). */
export function runComputeTask(task: ComputeTask): ComputeOutcome {
  try {
    switch (task.kind) {
      case 'analyze': return { ok: true, value: analyzePart(task.part) };
      case 'simulate': return { ok: true, value: simulate(task.input) };
    }
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, kind: err.kind, issues: err.issues };
    throw err;
  }
}
