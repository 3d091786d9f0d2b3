import { BufferGeometry, Float32BufferAttribute } from 'three';
import { CACHED_GEOMETRY } from './dispose-object';
import { meshArraysFromData, type MeshArrays } from './mesh-arrays';
import { MeshArraysBuilder, type MeshArraysBuild } from './mesh-arrays-builder';
import type { MeshGeometrySource } from './mesh-geometry-source';

export { signedVolumeOf } from './mesh-arrays';

/**
 * A drawable geometry of an uploaded mesh: corner positions times `scale` (file units → metres),
 * turned outward when the file lists its triangles inside out (negative signed volume), with flat
 * normals (see meshArraysFromData). Throws an Error saying what is wrong when the data holds no triangles.
 */
export function meshGeometryFromData(data: ArrayBuffer | Float32Array, scale: number): BufferGeometry {
  return meshGeometryFromArrays(meshArraysFromData(data, scale));
}

/** The geometry of arrays read by meshArraysFromData (here or on the mesh-drawing worker). */
export function meshGeometryFromArrays(arrays: MeshArrays): BufferGeometry {
  const g = new BufferGeometry();
  g.setAttribute('position', new Float32BufferAttribute(arrays.positions, 3));
  g.setAttribute('normal', new Float32BufferAttribute(arrays.normals, 3));
  g.computeBoundingBox();
  g.computeBoundingSphere();
  return g;
}

/** What the cache knows of one uploaded mesh at one scale. */
export type MeshGeometryState = { state: 'ready'; geometry: BufferGeometry } | { state: 'pending' } | { state: 'failed'; message: string };

/**
 * Uploaded meshes for the part scene, fetched once per `meshId` and built once per scale. Asking for
 * a mesh not yet at hand starts the fetch and answers `pending`; when it settles `changed` is called
 * so the viewer draws again. Building reads the file on the mesh-drawing worker where there is one
 * (`MeshArraysBuilder`), and is `pending` meanwhile too. A mesh that cannot be fetched or read
 * answers `failed` with a reason, never throws. `dispose()` frees every geometry, ends the worker
 * and ignores answers still on their way.
 */
export class MeshGeometryCache {
  private readonly data = new Map<
    string,
    { state: 'pending' } | { state: 'ready'; data: ArrayBuffer | Float32Array } | { state: 'failed'; message: string }
  >();
  private readonly built = new Map<string, MeshGeometryState>();
  private readonly builder: MeshArraysBuilder | null;
  private readonly build: MeshArraysBuild;
  private disposed = false;

  /** `build` replaces the worker-backed builder (tests). */
  constructor(
    private readonly source: MeshGeometrySource | null,
    private readonly changed: () => void,
    build?: MeshArraysBuild,
  ) {
    this.builder = build ? null : new MeshArraysBuilder();
    this.build = build ?? this.builder!.build;
  }

  /** The geometry of `meshId` at `scale`, or where its loading stands. */
  lookup(meshId: string, scale: number): MeshGeometryState {
    if (!this.source) return { state: 'failed', message: 'this view has no access to uploaded meshes' };
    const key = `${meshId}|${scale}`;
    const done = this.built.get(key);
    if (done) return done;
    const entry = this.data.get(meshId);
    if (!entry) {
      this.fetch(meshId, this.source);
      return { state: 'pending' };
    }
    if (entry.state === 'pending') return entry;
    if (entry.state === 'failed') return entry;
    let arrays: MeshArrays | Promise<MeshArrays>;
    try {
      arrays = this.build(entry.data, scale);
    } catch (err) {
      return this.finish(key, { state: 'failed', message: reasonOf(err) });
    }
    if (!(arrays instanceof Promise)) return this.finish(key, ready(arrays));
    this.built.set(key, { state: 'pending' });
    arrays.then(
      (a) => {
        if (!this.disposed) {
          this.finish(key, ready(a));
          this.changed();
        }
      },
      (err: unknown) => {
        if (!this.disposed) {
          this.finish(key, { state: 'failed', message: reasonOf(err) });
          this.changed();
        }
      },
    );
    return { state: 'pending' };
  }

  private finish(key: string, result: MeshGeometryState): MeshGeometryState {
    this.built.set(key, result);
    return result;
  }

  /** Frees every geometry built; later answers are dropped. */
  dispose(): void {
    this.disposed = true;
    this.builder?.dispose();
    for (const entry of this.built.values()) if (entry.state === 'ready') entry.geometry.dispose();
    this.built.clear();
    this.data.clear();
  }

  private fetch(meshId: string, source: MeshGeometrySource): void {
    this.data.set(meshId, { state: 'pending' });
    let request: Promise<ArrayBuffer | Float32Array>;
    try {
      request = Promise.resolve(source(meshId));
    } catch (err) {
      request = Promise.reject(err);
    }
    request.then(
      (data) =>
        this.settle(
          meshId,
          data instanceof Float32Array || isArrayBuffer(data)
            ? { state: 'ready', data }
            : { state: 'failed', message: 'the server sent no mesh data' },
        ),
      (err: unknown) => this.settle(meshId, { state: 'failed', message: reasonOf(err) }),
    );
  }

  private settle(meshId: string, entry: { state: 'ready'; data: ArrayBuffer | Float32Array } | { state: 'failed'; message: string }): void {
    if (this.disposed) return;
    this.data.set(meshId, entry);
    this.changed();
  }
}

/** True for an ArrayBuffer from any realm (a test's or a worker's as well as the page's). */
function isArrayBuffer(x: unknown): x is ArrayBuffer {
  return Object.prototype.toString.call(x) === '[object ArrayBuffer]';
}

function ready(arrays: MeshArrays): MeshGeometryState {
  const geometry = meshGeometryFromArrays(arrays);
  geometry.userData[CACHED_GEOMETRY] = true;
  return { state: 'ready', geometry };
}

function reasonOf(err: unknown): string {
  const message = err instanceof Error ? err.message : typeof err === 'string' ? err : '';
  return message || 'it could not be loaded';
}
