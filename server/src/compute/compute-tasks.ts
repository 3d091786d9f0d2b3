import type { MessagePort } from 'node:worker_threads';
import {
  analyzePart,
  analyzeValidatedPart,
  EngineInputError,
  meshMassProperties,
  parseStl,
  runScatterStudy,
  simulate,
  solveDesignRequest,
  sweepDesignRequest,
  validatePartDocument,
  type InputIssue,
  type MeshProblem,
  type PartResolvers,
  type ResolvedMaterial,
  type ResolvedMesh,
} from '@tumblewise/engine/worker';
import { partDrawing } from '../exports/part-outline';
import { firstSelfIntersection, selfIntersectionProblem } from '../meshes/self-intersection';

/** Materials and meshes a document refers to, loaded by the caller from the database. */
export interface TaskReferences {
  materials?: Record<string, ResolvedMaterial>;
  /** Stored STL bytes by mesh id; parsed on the worker. */
  meshes?: Record<string, Uint8Array>;
}

/** The stored materials and meshes a part document names, to be looked up in its workspace. */
export interface ReferenceIds {
  materialIds: string[];
  meshIds: string[];
}

/** Work the pool runs off the event loop. Inputs are untrusted JSON; the engine validates them. */
export type ComputeTask =
  | { kind: 'analyze'; part: unknown; references?: TaskReferences }
  /**
   * A part document as the request body's text: parsed, checked and analysed on the worker, the
   * report answered as JSON text, so the event loop neither parses nor serialises it. With
   * `askForReferences`, a document naming stored materials or meshes comes back as
   * `needs-references` (their ids) for the caller to load and send again as `references`.
   */
  | { kind: 'analyze-json'; json: string; references?: TaskReferences; askForReferences?: boolean }
  | { kind: 'simulate'; input: unknown; references?: TaskReferences }
  | { kind: 'check-mesh'; bytes: Uint8Array; maxTriangles: number }
  /** The side view of a part for its PDF (PartDrawing); uploaded meshes drawn from `references`. */
  | { kind: 'part-drawing'; document: unknown; references?: TaskReferences }
  | { kind: 'scatter'; input: unknown; references?: TaskReferences; progress?: MessagePort }
  /** Goal seek: the body of `POST /solve` (`{ part, free, targets }`), checked on the worker. */
  | { kind: 'solve'; input: unknown; references?: TaskReferences }
  /** Design sweep: the body of `POST /sweep` (`{ part, axes, figures }`), checked on the worker. */
  | { kind: 'sweep'; input: unknown; references?: TaskReferences };

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
  | { ok: false; kind: 'invalid' | 'invalid-json' | 'unanalysable'; issues: InputIssue[] }
  | { ok: false; kind: 'needs-references'; ids: ReferenceIds };

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

/**
 * Reads, checks and integrates an uploaded STL; a mesh that passes the engine's checks (closed,
 * consistent, not degenerate) is then searched for a surface that crosses itself.
 */
async function checkMesh(bytes: Uint8Array, maxTriangles: number): Promise<MeshCheckResult> {
  const parsed = parseStl(bytes, { maxTriangles, maxBytes: Number.MAX_SAFE_INTEGER });
  if (!parsed.ok) return { ok: false, format: null, triangleCount: 0, problems: parsed.problems };
  const analysis = meshMassProperties(parsed.mesh);
  const problems = [...parsed.problems, ...analysis.problems];
  let ok = analysis.ok;
  if (analysis.ok) {
    const crossing = await firstSelfIntersection(analysis.welded.vertices, analysis.welded.triangles);
    if (crossing) {
      problems.push(selfIntersectionProblem(crossing));
      ok = false;
    }
  }
  return { ok, format: parsed.mesh.format, triangleCount: parsed.mesh.triangleCount, problems };
}

/** The stored materials and meshes a checked document names (each id once). */
function referenceIdsOf(doc: { primitives: { materialId?: string; meshId?: string }[] }): ReferenceIds {
  const materialIds = new Set<string>(),
    meshIds = new Set<string>();
  for (const p of doc.primitives) {
    if (p.materialId !== undefined) materialIds.add(p.materialId);
    if (p.meshId !== undefined) meshIds.add(p.meshId);
  }
  return { materialIds: [...materialIds], meshIds: [...meshIds] };
}

function analyzeJson(task: Extract<ComputeTask, { kind: 'analyze-json' }>): ComputeOutcome {
  let doc: unknown;
  try {
    doc = JSON.parse(task.json);
  } catch {
    return { ok: false, kind: 'invalid-json', issues: [{ path: '', message: 'The request body is not valid JSON.' }] };
  }
  const checked = validatePartDocument(doc);
  if (!checked.ok) return { ok: false, kind: 'invalid', issues: checked.errors };
  if (task.askForReferences && !task.references) {
    const ids = referenceIdsOf(checked.value);
    if (ids.materialIds.length + ids.meshIds.length > 0) return { ok: false, kind: 'needs-references', ids };
  }
  return { ok: true, value: JSON.stringify(analyzeValidatedPart(checked.value, resolvers(task.references))) };
}

/** Runs one task (on a worker thread); a mesh check answers a promise (it loads three.js as an ES module). */
export function runComputeTask(task: ComputeTask): ComputeOutcome | Promise<ComputeOutcome> {
  try {
    switch (task.kind) {
      case 'analyze':
        return { ok: true, value: analyzePart(task.part, resolvers(task.references)) };
      case 'analyze-json':
        return analyzeJson(task);
      case 'simulate':
        return { ok: true, value: simulate(task.input, resolvers(task.references)) };
      case 'solve':
        return { ok: true, value: solveDesignRequest(task.input, resolvers(task.references)) };
      case 'sweep':
        return { ok: true, value: sweepDesignRequest(task.input, resolvers(task.references)) };
      case 'check-mesh':
        return checkMesh(task.bytes, task.maxTriangles).then((value) => ({ ok: true, value }));
      case 'part-drawing': {
        const meshes = resolvers(task.references);
        const corners = (id: string) => {
          const m = meshes.resolveMesh?.(id);
          return m && m.corners.subarray(0, 9 * m.triangleCount);
        };
        return { ok: true, value: partDrawing(task.document, corners) };
      }
      case 'scatter': {
        let last = 0;
        const value = runScatterStudy(
          task.input,
          (done, total) => {
            // Every 200 ms, and at each twentieth of the samples (a short study still shows its progress).
            const now = Date.now();
            const step = Math.max(1, Math.floor(total / 20));
            if (task.progress && (now - last > 200 || done === total || done % step === 0)) {
              last = now;
              task.progress.postMessage({ done, total });
            }
          },
          resolvers(task.references),
        );
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
