import type { MessagePort } from 'node:worker_threads';
import {
  analyzePart, EngineInputError, meshMassProperties, parseStl, runScatterStudy, simulate,
  type InputIssue, type MeshProblem, type PartResolvers, type ResolvedMaterial, type ResolvedMesh,
} from '@tumblewise/engine';

/** Materials and meshes a document refers to, loaded by the caller from the database. */
export interface TaskReferences {
  materials?: Record<string, ResolvedMaterial>;
  /** Stored STL bytes by mesh id; parsed on the worker. */
  meshes?: Record<string, Uint8Array>;
}

/** Work the pool runs off the event loop. Inputs are untrusted JSON; the engine validates them. */
export type ComputeTask =
  | { kind: 'analyze'; part: unknown; references?: TaskReferences }
  | { kind: 'simulate'; input: unknown; references?: TaskReferences }
  | { kind: 'check-mesh'; bytes: Uint8Array; maxTriangles: number }
  | { kind: 'scatter'; input: unknown; references?: TaskReferences; progress?: MessagePort };

/** What a mesh upload learns about the file. */
export interface MeshCheckResult {
  ok: boolean;
  format: 'binary' | 'ascii' | null;
  triangleCount: number;
  problems: MeshProblem[];
}

/** Errors cross the thread boundary as data (class identity does not survive structured clone). */
export type ComputeOutcome =
  | { ok: true; value: unknown }
  | { ok: false; kind: 'invalid' | 'unanalysable'; issues: InputIssue[] };

function resolvers(references: TaskReferences | undefined): PartResolvers {
  const materials = references?.materials ?? {};
  const stored = references?.meshes ?? {};
  const parsed = new Map<string, ResolvedMesh | undefined>();
  return {
    resolveMaterial: (id) => materials[id],
    resolveMesh: (id) => {
      if (!parsed.has(id)) {
        const bytes = stored[id];
        const result = bytes ? parseStl(bytes) : null;
        parsed.set(id, result?.ok ? { corners: result.mesh.corners, triangleCount: result.mesh.triangleCount } : undefined);
      }
      return parsed.get(id);
    },
  };
}

function checkMesh(bytes: Uint8Array, maxTriangles: number): MeshCheckResult {
  const parsed = parseStl(bytes, { maxTriangles, maxBytes: Number.MAX_SAFE_INTEGER });
  if (!parsed.ok) return { ok: false, format: null, triangleCount: 0, problems: parsed.problems };
  const analysis = meshMassProperties(parsed.mesh);
  const problems = [...parsed.problems, ...analysis.problems];
  return { ok: analysis.ok, format: parsed.mesh.format, triangleCount: parsed.mesh.triangleCount, problems };
}

/** Runs one task (on a worker thread). */
export function runComputeTask(task: ComputeTask): ComputeOutcome {
  try {
    switch (task.kind) {
      case 'analyze': return { ok: true, value: analyzePart(task.part, resolvers(task.references)) };
      case 'simulate': return { ok: true, value: simulate(task.input, resolvers(task.references)) };
      case 'check-mesh': return { ok: true, value: checkMesh(task.bytes, task.maxTriangles) };
      case 'scatter': {
        let last = 0;
        const value = runScatterStudy(task.input, (done, total) => {
          // Every 200 ms, and at each twentieth of the samples (a short study still shows its progress).
          const now = Date.now();
          const step = Math.max(1, Math.floor(total / 20));
          if (task.progress && (now - last > 200 || done === total || done % step === 0)) {
            last = now;
            task.progress.postMessage({ done, total });
          }
        }, resolvers(task.references));
        task.progress?.close();
        return { ok: true, value };
      }
    }
  } catch (err) {
    task.kind === 'scatter' && task.progress?.close();
    if (err instanceof EngineInputError) return { ok: false, kind: err.kind, issues: err.issues };
    throw err;
  }
}
