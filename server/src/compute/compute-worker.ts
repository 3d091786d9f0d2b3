import { runComputeTask, type ComputeTask, type ComputeOutcome } from './compute-tasks';

/** Piscina entry point: one task in, its outcome out. */
export default function computeWorker(task: ComputeTask): ComputeOutcome | Promise<ComputeOutcome> {
  return runComputeTask(task);
}
