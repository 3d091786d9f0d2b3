import { meshArraysFromData, type MeshArrays } from './mesh-arrays';
import { startMeshArraysWorker } from './mesh-arrays-thread';

/** A job for the mesh-drawing worker. */
export interface MeshArraysRequest {
  id: number;
  data: ArrayBuffer | Float32Array;
  scale: number;
}

/** The worker's answer to one job. */
export type MeshArraysReply = { id: number; ok: true; arrays: MeshArrays } | { id: number; ok: false; message: string };

/** Builds a mesh's drawable arrays: at once (the answer itself) or later (a promise of it). */
export type MeshArraysBuild = (data: ArrayBuffer | Float32Array, scale: number) => MeshArrays | Promise<MeshArrays>;

/**
 * Reads uploaded meshes into drawable arrays on a worker thread (started on the first mesh, one per
 * view, ended by `dispose`), so reading a large STL never blocks the editor's page. Where there are
 * no workers, or the worker cannot start, it reads them on the page at once, as before.
 */
export class MeshArraysBuilder {
  private worker: Worker | null | undefined;
  private nextId = 1;
  private readonly waiting = new Map<
    number,
    { data: ArrayBuffer | Float32Array; scale: number; resolve: (a: MeshArrays) => void; reject: (e: unknown) => void }
  >();

  readonly build: MeshArraysBuild = (data, scale) => {
    const worker = this.workerOrNull();
    if (!worker) return meshArraysFromData(data, scale);
    const id = this.nextId++;
    return new Promise<MeshArrays>((resolve, reject) => {
      this.waiting.set(id, { data, scale, resolve, reject });
      // The data is copied, not moved: the view keeps it to build the mesh again at another scale.
      worker.postMessage({ id, data, scale } satisfies MeshArraysRequest);
    });
  };

  /** Ends the worker; builds still on their way never settle (their view is gone). */
  dispose(): void {
    this.worker?.terminate();
    this.worker = null;
    this.waiting.clear();
  }

  private workerOrNull(): Worker | null {
    if (this.worker !== undefined) return this.worker;
    let worker: Worker | null = null;
    try {
      worker = startMeshArraysWorker();
    } catch {
      worker = null;
    }
    if (worker) {
      worker.onmessage = ({ data: reply }: MessageEvent<MeshArraysReply>) => {
        const job = this.waiting.get(reply.id);
        if (!job) return;
        this.waiting.delete(reply.id);
        if (reply.ok) job.resolve(reply.arrays);
        else job.reject(new Error(reply.message));
      };
      // The worker's script failed to load or crashed: finish the waiting builds on the page.
      worker.onerror = (event) => {
        event.preventDefault();
        this.fallBackToPage();
      };
    }
    this.worker = worker;
    return worker;
  }

  private fallBackToPage(): void {
    this.worker?.terminate();
    this.worker = null;
    const jobs = [...this.waiting.values()];
    this.waiting.clear();
    for (const job of jobs) {
      try {
        job.resolve(meshArraysFromData(job.data, job.scale));
      } catch (err) {
        job.reject(err);
      }
    }
  }
}
