import { BufferGeometry, Float32BufferAttribute } from 'three';
import { STLLoader } from 'three/examples/jsm/loaders/STLLoader.js';
import { CACHED_GEOMETRY } from './dispose-object';
import type { MeshGeometrySource } from './mesh-geometry-source';

/**
 * A drawable geometry of an uploaded mesh: corner positions times `scale` (file units → metres),
 * turned outward when the file lists its triangles inside out (negative signed volume), with flat
 * normals. Throws an Error saying what is wrong when the data holds no triangles.
 */
export function meshGeometryFromData(data: ArrayBuffer | Float32Array, scale: number): BufferGeometry {
  const positions = data instanceof Float32Array ? Float32Array.from(data) : stlPositions(data);
  if (positions.length === 0 || positions.length % 9 !== 0) throw new Error('the mesh holds no complete triangles');
  if (!(Number.isFinite(scale) && scale > 0)) throw new Error('the scale must be a positive number');
  for (let i = 0; i < positions.length; i++) {
    const v = positions[i] * scale;
    if (!Number.isFinite(v)) throw new Error('the mesh has a coordinate that is not a finite number');
    positions[i] = v;
  }
  if (signedVolumeOf(positions) < 0) flipWinding(positions);
  const g = new BufferGeometry();
  g.setAttribute('position', new Float32BufferAttribute(positions, 3));
  g.computeVertexNormals();
  g.computeBoundingBox();
  g.computeBoundingSphere();
  return g;
}

/** Corner positions of an STL file (binary or ASCII), as three's STL reader finds them. */
function stlPositions(bytes: ArrayBuffer): Float32Array {
  if (bytes.byteLength === 0) throw new Error('the file is empty');
  let geometry: BufferGeometry;
  try {
    geometry = new STLLoader().parse(bytes);
  } catch {
    throw new Error('the file could not be read as STL');
  }
  const attribute = geometry.getAttribute('position');
  const positions = attribute ? Float32Array.from(attribute.array as ArrayLike<number>) : new Float32Array(0);
  geometry.dispose();
  return positions;
}

/**
 * Signed volume enclosed by a triangle soup (9 numbers a triangle): the sum of the tetrahedra from
 * the origin to each triangle, v0·(v1 × v2)/6 (divergence theorem). Positive when faces point outward.
 */
export function signedVolumeOf(positions: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 0; k + 8 < positions.length; k += 9) {
    const ax = positions[k], ay = positions[k + 1], az = positions[k + 2];
    const bx = positions[k + 3], by = positions[k + 4], bz = positions[k + 5];
    const cx = positions[k + 6], cy = positions[k + 7], cz = positions[k + 8];
    sum += ax * (by * cz - bz * cy) + ay * (bz * cx - bx * cz) + az * (bx * cy - by * cx);
  }
  return sum / 6;
}

/** Swaps the second and third corner of every triangle (turns the mesh inside out). */
function flipWinding(positions: Float32Array): void {
  for (let k = 0; k + 8 < positions.length; k += 9) {
    for (let j = 0; j < 3; j++) {
      const t = positions[k + 3 + j];
      positions[k + 3 + j] = positions[k + 6 + j];
      positions[k + 6 + j] = t;
    }
  }
}

/** What the cache knows of one uploaded mesh at one scale. */
export type MeshGeometryState =
  | { state: 'ready'; geometry: BufferGeometry }
  | { state: 'pending' }
  | { state: 'failed'; message: string };

/**
 * Uploaded meshes for the part scene, fetched once per `meshId` and built once per scale. Asking for
 * a mesh not yet at hand starts the fetch and answers `pending`; when it settles `changed` is called
 * so the viewer draws again. A mesh that cannot be fetched or read answers `failed` with a reason,
 * never throws. `dispose()` frees every geometry and ignores answers still on their way.
 */
export class MeshGeometryCache {
  private readonly data = new Map<string, { state: 'pending' } | { state: 'ready'; data: ArrayBuffer | Float32Array } | { state: 'failed'; message: string }>();
  private readonly built = new Map<string, MeshGeometryState>();
  private disposed = false;

  constructor(
    private readonly source: MeshGeometrySource | null,
    private readonly changed: () => void,
  ) {}

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
    let result: MeshGeometryState;
    try {
      const geometry = meshGeometryFromData(entry.data, scale);
      geometry.userData[CACHED_GEOMETRY] = true;
      result = { state: 'ready', geometry };
    } catch (err) {
      result = { state: 'failed', message: reasonOf(err) };
    }
    this.built.set(key, result);
    return result;
  }

  /** Frees every geometry built; later answers are dropped. */
  dispose(): void {
    this.disposed = true;
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
      (data) => this.settle(meshId, data instanceof Float32Array || isArrayBuffer(data) ? { state: 'ready', data } : { state: 'failed', message: 'the server sent no mesh data' }),
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

function reasonOf(err: unknown): string {
  const message = err instanceof Error ? err.message : typeof err === 'string' ? err : '';
  return message || 'it could not be loaded';
}
