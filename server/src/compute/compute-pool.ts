import os from 'node:os';
import path from 'node:path';
import { Piscina } from 'piscina';
import { AppError } from '../http/app-error';
import type { ComputeOutcome, ComputeTask } from './compute-tasks';

/**
 * Worker threads (piscina) for the engine, so a large mesh, a long simulation or a scatter study
 * never blocks the event loop: the server keeps answering other requests meanwhile.
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
      outcome = await this.pool.run(task, { signal: interruptible ? signal : undefined, transferList: transferList as never });
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
