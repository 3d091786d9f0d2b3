import { analyzePart, EngineInputError, simulate, type InputIssue, type PartResolvers, type ResolvedMaterial } from '@tumblewise/engine';

/** Materials (and later meshes) a document refers to, loaded by the caller from the database. */
export interface TaskReferences {
  materials?: Record<string, ResolvedMaterial>;
}

/** Work the pool runs off the event loop. Inputs are untrusted JSON; the engine validates them. */
export type ComputeTask =
  | { kind: 'analyze'; part: unknown; references?: TaskReferences }
  | { kind: 'simulate'; input: unknown; references?: TaskReferences };

function resolvers(references: TaskReferences | undefined): PartResolvers {
  const materials = references?.materials ?? {};
  return { resolveMaterial: (id) => materials[id] };
}

/** Errors cross the thread boundary as data (class identity does not survive structured clone). */
export type ComputeOutcome =
  | { ok: true; value: unknown }
  | { ok: false; kind: 'invalid' | 'unanalysable'; issues: InputIssue[] };

/** Runs one task (in a worker thread, or inline for tiny inputs). */
export function runComputeTask(task: ComputeTask): ComputeOutcome {
  try {
    switch (task.kind) {
      case 'analyze': return { ok: true, value: analyzePart(task.part, resolvers(task.references)) };
      case 'simulate': return { ok: true, value: simulate(task.input, resolvers(task.references)) };
    }
  } catch (err) {
    if (err instanceof EngineInputError) return { ok: false, kind: err.kind, issues: err.issues };
    throw err;
  }
}
