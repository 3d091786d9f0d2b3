import { MessageChannel } from 'node:worker_threads';
import PgBoss from 'pg-boss';
import type { AppContext } from '../app-context';
import { AppError } from '../http/app-error';
import { taskReferences } from '../compute/task-references';
import { ScatterStudy } from '../models/init-models';

const QUEUE = 'scatter-study';

/**
 * Scatter studies as background jobs: pg-boss on the same PostgreSQL queues them, a worker of any
 * server process picks one up and runs it on the compute pool, writing progress to the row.
 * Cancelling sets the row's state; the running job sees it at its next progress tick and stops, on
 * whichever instance it runs.
 */
export class ScatterQueue {
  private boss: Promise<PgBoss> | null = null;

  constructor(private readonly ctx: AppContext) {}

  /** Starts pg-boss and the worker (once). */
  start(): Promise<PgBoss> {
    this.boss ??= (async () => {
      const boss = new PgBoss({ connectionString: this.ctx.config.databaseUrl, max: 3, application_name: 'tumblewise-jobs' });
      boss.on('error', (err) => this.ctx.logger.warn({ err: String(err) }, 'job queue error'));
      await boss.start();
      await boss.createQueue(QUEUE, { name: QUEUE, retryLimit: 0, expireInSeconds: 3600 });
      await boss.work<{ studyId: string }>(QUEUE, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) =>
        this.run(job.data.studyId),
      );
      return boss;
    })();
    return this.boss;
  }

  async enqueue(studyId: string): Promise<void> {
    const boss = await this.start();
    const jobId = await boss.send(QUEUE, { studyId }, { retryLimit: 0 });
    await ScatterStudy.update({ jobId }, { where: { id: studyId } });
  }

  async stop(): Promise<void> {
    if (!this.boss) return;
    const boss = await this.boss.catch(() => null);
    this.boss = null;
    await boss?.stop({ graceful: false, wait: true, timeout: 5000 });
  }

  /** Runs one study; never throws to pg-boss (the row holds the outcome). */
  private async run(studyId: string): Promise<void> {
    const study = await ScatterStudy.findByPk(studyId);
    if (!study || study.state !== 'queued') return;
    await study.update({ state: 'running', progress: 0 });
    const controller = new AbortController();
    const { port1, port2 } = new MessageChannel();
    let writing = Promise.resolve();
    port1.on('message', ({ done, total }: { done: number; total: number }) => {
      writing = writing
        .then(async () => {
          // Progress tick: record it, and stop if someone cancelled meanwhile.
          const [, rows] = await ScatterStudy.update(
            { progress: Math.min(0.99, done / total) },
            { where: { id: studyId, state: 'running' }, returning: true },
          );
          if (rows.length === 0) controller.abort();
        })
        .catch(() => undefined);
    });
    try {
      const result = await this.ctx.compute.run<object>(
        {
          kind: 'scatter',
          input: { part: study.document, tolerances: { primitives: study.tolerances }, samples: study.samples, seed: study.seed },
          references: await taskReferences(study.workspaceId, study.document),
          progress: port2,
        },
        controller.signal,
      );
      await writing;
      await ScatterStudy.update({ state: 'done', progress: 1, result }, { where: { id: studyId, state: 'running' } });
    } catch (err) {
      await writing;
      if (controller.signal.aborted) return; // cancelled: the row already says so
      const message = err instanceof AppError ? err.message : 'The study failed on the server; it has been logged.';
      if (!(err instanceof AppError)) this.ctx.logger.error({ err, studyId }, 'scatter study failed');
      await ScatterStudy.update({ state: 'failed', error: message.slice(0, 1000) }, { where: { id: studyId, state: 'running' } });
    } finally {
      port1.close();
    }
  }
}
