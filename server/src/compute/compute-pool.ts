import os from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import { AppError } from '../http/app-error';
import { runComputeTask, type ComputeOutcome, type ComputeTask } from './compute-tasks';

/**
 * Analyses of parts of at most this many primitives and no mesh run on the event loop: such an
 * analysis takes a few hundred microseconds, about what handing the document to a worker thread
 * and its report back costs (measured with `npm run bench -- web:throughput`: the 50-primitive
 * live-report part answered ~25 % more requests per second on the event loop than through a worker).
 */
export const EVENT_LOOP_ANALYSIS_PRIMITIVES = 64;

/** Whether a task is a small analysis that costs less than a trip to a worker thread. */
export function isSmallAnalysis(task: ComputeTask): boolean {
  if (task.kind !== 'analyze' || Object.keys(task.references?.meshes ?? {}).length > 0) return false;
  const primitives = (task.part as { primitives?: unknown } | null)?.primitives;
  return Array.isArray(primitives) && primitives.length <= EVENT_LOOP_ANALYSIS_PRIMITIVES
    && primitives.every((p) => (p as { shape?: unknown } | null)?.shape !== 'mesh');
}

/**
 * Worker threads (piscina) for the engine, so a large mesh, a long simulation or a scatter study
 * never blocks the event loop: the server keeps answering other requests meanwhile. Small
 * analyses (`isSmallAnalysis`) are the exception.
 */
export class ComputePool {
  private readonly pool: Piscina;

  constructor(threads = Math.max(1, os.availableParallelism() - 1)) {
    this.pool = new Piscina({
      filename: path.join(__dirname, 'compute-worker-entry.js'),
      minThreads: 0, // started on first use; kept for a minute after
      maxThreads: threads,
      idleTimeout: 60_000,
      maxQueue: 200,
    });
  }

  /**
   * Runs the task on a worker; engine refusals become 400 (invalid) or 422 (unanalysable).
   * `signal` cancels the task: a queued one is dropped, a running one ends with its worker thread.
   * An analysis is the exception: it takes milliseconds, far less than starting a replacement
   * worker (the live report cancels a request at nearly every keystroke), so once handed over it
   * runs to the end and only then answers `cancelled`.
   */
  async run<T>(task: ComputeTask, signal?: AbortSignal): Promise<T> {
    let outcome: ComputeOutcome;
    try {
      const transferList = task.kind === 'scatter' && task.progress ? [task.progress] : undefined;
      const interruptible = task.kind !== 'analyze';
      if (!interruptible && signal?.aborted) throw Object.assign(new Error('The client went away.'), { name: 'AbortError' });
      outcome = isSmallAnalysis(task) ? runComputeTask(task) : await this.pool.run(task, { signal: interruptible ? signal : undefined, transferList: transferList as never });
      if (!interruptible && signal?.aborted) throw Object.assign(new Error('The client went away.'), { name: 'AbortError' });
    } catch (err) {
      // The client went away (or a study was cancelled): not a server fault, nothing to log.
      if ((err as Error)?.name === 'AbortError') throw new AppError(499, 'cancelled', 'The request was cancelled before it finished.');
      if ((err as Error)?.message?.includes('Task queue is at limit')) {
        throw new AppError(503, 'busy', 'The server is busy with other computations. Try again in a moment.', undefined, { 'Retry-After': '5' });
      }
      throw err;
    }
    if (outcome.ok) return outcome.value as T;
    const first = outcome.issues[0];
    const message = first ? `${first.path ? `${first.path} ` : ''}${first.message}` : 'The part cannot be analysed.';
    if (outcome.kind === 'invalid') throw AppError.badRequest(capitalise(message), first?.path || undefined);
    throw new AppError(422, 'unanalysable', capitalise(message), first?.path || undefined);
  }

  close(): Promise<void> {
    return this.pool.destroy();
  }
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1) + (/[.!?]$/.test(s) ? '' : '.');
