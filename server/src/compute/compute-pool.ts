import os from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import { AppError } from '../http/app-error';
import { runComputeTask, type ComputeOutcome, type ComputeTask, type ReferenceIds, type TaskReferences } from './compute-tasks';

/**
 * Analyses of already parsed parts (a variant being saved) of at most this many primitives and no
 * mesh run on the event loop: such an analysis takes a few hundred microseconds, about what handing
 * the parsed document to a worker thread and its report back costs (measured 2026-12-01 with
 * `npm run bench -- web:throughput`, when `POST /analyze` still parsed on the event loop). The live
 * report's `POST /analyze` sends its body unparsed to a worker instead (`analyzeJson`).
 */
export const EVENT_LOOP_ANALYSIS_PRIMITIVES = 64;

/** Whether a task is a small analysis that costs less than a trip to a worker thread. */
export function isSmallAnalysis(task: ComputeTask): boolean {
  if (task.kind !== 'analyze' || Object.keys(task.references?.meshes ?? {}).length > 0) return false;
  const primitives = (task.part as { primitives?: unknown } | null)?.primitives;
  return (
    Array.isArray(primitives) &&
    primitives.length <= EVENT_LOOP_ANALYSIS_PRIMITIVES &&
    primitives.every((p) => (p as { shape?: unknown } | null)?.shape !== 'mesh')
  );
}

/**
 * Analyses a worker thread is handed at once. It still runs them one after another, but finds the
 * next waiting when it finishes one instead of idling until the event loop has taken the answer
 * and posted another: with one at a time, `POST /analyze` answered ~0.34 of the liveness route's
 * requests per second, with several ~0.5–0.6 (`npm run bench -- web:throughput`).
 */
export const ANALYSES_PER_WORKER = 8;

/**
 * Threads for simulations, scatter studies and mesh checks, at least: a check of a large upload
 * (seconds for a million triangles) or a long study then shares the processor with a tumble
 * preview's simulation instead of making it wait, even where there is one core to spare.
 */
export const MIN_INTERRUPTIBLE_THREADS = 2;

/** Whether a task ends with its thread when cancelled (see ComputePool.run). */
const interruptible = (task: ComputeTask) => task.kind !== 'analyze' && task.kind !== 'analyze-json';

/**
 * Worker threads (piscina) for the engine, so a large mesh, a long simulation or a scatter study
 * never blocks the event loop: the server keeps answering other requests meanwhile. Small
 * analyses (`isSmallAnalysis`) are the exception.
 *
 * Two pools: analyses, which are never interrupted, queue several to a thread
 * (ANALYSES_PER_WORKER); simulations, scatter studies and mesh checks take a thread each, since
 * cancelling one ends its thread and must not take other tasks with it, and have at least
 * MIN_INTERRUPTIBLE_THREADS.
 */
export class ComputePool {
  private readonly analyses: Piscina;
  private readonly interruptibles: Piscina;

  constructor(threads = Math.max(1, os.availableParallelism() - 1)) {
    const options = {
      filename: path.join(__dirname, 'compute-worker-entry.js'),
      minThreads: 0, // started on first use; kept for a minute after
      maxThreads: threads,
      idleTimeout: 60_000,
      maxQueue: 200,
    };
    this.analyses = new Piscina({ ...options, concurrentTasksPerWorker: ANALYSES_PER_WORKER });
    this.interruptibles = new Piscina({ ...options, maxThreads: Math.max(MIN_INTERRUPTIBLE_THREADS, threads) });
  }

  /**
   * Runs the task on a worker; engine refusals become 400 (invalid) or 422 (unanalysable).
   * `signal` cancels the task: a queued one is dropped, a running one ends with its worker thread.
   * An analysis is the exception: it takes milliseconds, far less than starting a replacement
   * worker (the live report cancels a request at nearly every keystroke), so once handed over it
   * runs to the end and only then answers `cancelled`.
   */
  async run<T>(task: ComputeTask, signal?: AbortSignal): Promise<T> {
    return answer<T>(await this.outcome(task, signal));
  }

  /**
   * The spin report, as JSON text, of a part document given as JSON text (a request body): parsed,
   * checked, analysed and serialised on a worker thread, which is what lets `POST /analyze` answer
   * about twice as many requests per second as parsing on the event loop (README, "Performance").
   * A document that names stored materials or meshes is sent back for `loadReferences` to look
   * them up, then analysed with them; without `loadReferences` there are none to find.
   */
  async analyzeJson(
    json: string,
    loadReferences: ((ids: ReferenceIds) => Promise<TaskReferences>) | undefined,
    signal?: AbortSignal,
  ): Promise<string> {
    let outcome = await this.outcome({ kind: 'analyze-json', json, askForReferences: loadReferences !== undefined }, signal);
    if (!outcome.ok && outcome.kind === 'needs-references' && loadReferences) {
      outcome = await this.outcome({ kind: 'analyze-json', json, references: await loadReferences(outcome.ids) }, signal);
    }
    return answer<string>(outcome);
  }

  /** Runs a task where it belongs (see isSmallAnalysis); cancellation and a full queue become errors. */
  private async outcome(task: ComputeTask, signal?: AbortSignal): Promise<ComputeOutcome> {
    try {
      const transferList = task.kind === 'scatter' && task.progress ? [task.progress] : undefined;
      if (!interruptible(task) && signal?.aborted) throw Object.assign(new Error('The client went away.'), { name: 'AbortError' });
      const outcome = isSmallAnalysis(task)
        ? await runComputeTask(task)
        : interruptible(task)
          ? await this.interruptibles.run(task, { signal, transferList: transferList as never })
          : await this.analyses.run(task);
      if (!interruptible(task) && signal?.aborted) throw Object.assign(new Error('The client went away.'), { name: 'AbortError' });
      return outcome;
    } catch (err) {
      // The client went away (or a study was cancelled): not a server fault, nothing to log.
      if ((err as Error)?.name === 'AbortError') throw new AppError(499, 'cancelled', 'The request was cancelled before it finished.');
      if ((err as Error)?.message?.includes('Task queue is at limit')) {
        throw new AppError(503, 'busy', 'The server is busy with other computations. Try again in a moment.', undefined, {
          'Retry-After': '5',
        });
      }
      throw err;
    }
  }

  close(): Promise<void> {
    return Promise.all([this.analyses.destroy(), this.interruptibles.destroy()]).then(() => undefined);
  }
}

/** The value of a finished task, or the engine's refusal as an HTTP error naming the field. */
function answer<T>(outcome: ComputeOutcome): T {
  if (outcome.ok) return outcome.value as T;
  if (outcome.kind === 'needs-references') throw new Error('a task that needs references was not given them');
  const first = outcome.issues[0];
  if (outcome.kind === 'invalid-json')
    throw AppError.badRequest(first?.message ?? 'The request body is not valid JSON.', undefined, 'invalid_json');
  const message = first ? `${first.path ? `${first.path} ` : ''}${first.message}` : 'The part cannot be analysed.';
  if (outcome.kind === 'invalid') throw AppError.badRequest(capitalise(message), first?.path || undefined);
  throw new AppError(422, 'unanalysable', capitalise(message), first?.path || undefined);
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1) + (/[.!?]$/.test(s) ? '' : '.');
