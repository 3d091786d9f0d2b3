import { parseStl } from '@tumblewise/engine/stl';

/** What drawing an uploaded mesh needs: triangle corners in metres, wound outward, and a flat normal per corner. */
export interface MeshArrays {
  positions: Float32Array;
  normals: Float32Array;
}

/**
 * The corner positions of an uploaded mesh times `scale` (file units → metres), turned outward
 * when the file lists its triangles inside out (negative signed volume), with flat normals. Reads
 * STL bytes (binary or ASCII) with the engine's reader, the one the server analyses with. Plain
 * arithmetic, no three.js: it runs in the mesh-drawing worker as well as on the page. Throws an
 * Error saying what is wrong when the data holds no triangles.
 */
export function meshArraysFromData(data: ArrayBuffer | Float32Array, scale: number): MeshArrays {
  const positions = data instanceof Float32Array ? Float32Array.from(data) : stlCorners(data);
  if (positions.length === 0 || positions.length % 9 !== 0) throw new Error('the mesh holds no complete triangles');
  if (!(Number.isFinite(scale) && scale > 0)) throw new Error('the scale must be a positive number');
  for (let i = 0; i < positions.length; i++) {
    const v = positions[i] * scale;
    if (!Number.isFinite(v)) throw new Error('the mesh has a coordinate that is not a finite number');
    positions[i] = v;
  }
  if (signedVolumeOf(positions) < 0) flipWinding(positions);
  return { positions, normals: flatNormals(positions) };
}

/** Corner positions of an STL file (binary or ASCII). */
function stlCorners(bytes: ArrayBuffer): Float32Array {
  if (bytes.byteLength === 0) throw new Error('the file is empty');
  const result = parseStl(bytes, { maxBytes: Number.MAX_SAFE_INTEGER });
  if (!result.ok) throw new Error(`the file could not be read as STL: ${result.problems[0]?.message ?? 'no triangles found'}`);
  return result.mesh.corners.slice(0, 9 * result.mesh.triangleCount);
}

/**
 * Signed volume enclosed by a triangle soup (9 numbers a triangle): the sum of the tetrahedra from
 * the origin to each triangle, v0·(v1 × v2)/6 (divergence theorem). Positive when faces point outward.
 */
export function signedVolumeOf(positions: ArrayLike<number>): number {
  let sum = 0;
  for (let k = 0; k + 8 < positions.length; k += 9) {
    const ax = positions[k],
      ay = positions[k + 1],
      az = positions[k + 2];
    const bx = positions[k + 3],
      by = positions[k + 4],
      bz = positions[k + 5];
    const cx = positions[k + 6],
      cy = positions[k + 7],
      cz = positions[k + 8];
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

/**
 * The unit normal of each triangle, (c − b) × (a − b) for corners a, b, c, on all three of its
 * corners; zero for a degenerate triangle. The same as three.js's `computeVertexNormals` gives a
 * geometry without an index.
 */
export function flatNormals(positions: Float32Array): Float32Array {
  const normals = new Float32Array(positions.length);
  for (let k = 0; k + 8 < positions.length; k += 9) {
    const ax = positions[k],
      ay = positions[k + 1],
      az = positions[k + 2];
    const bx = positions[k + 3],
      by = positions[k + 4],
      bz = positions[k + 5];
    const cx = positions[k + 6] - bx,
      cy = positions[k + 7] - by,
      cz = positions[k + 8] - bz;
    const ux = ax - bx,
      uy = ay - by,
      uz = az - bz;
    let nx = cy * uz - cz * uy,
      ny = cz * ux - cx * uz,
      nz = cx * uy - cy * ux;
    const length = Math.hypot(nx, ny, nz);
    if (length > 0) {
      nx /= length;
      ny /= length;
      nz /= length;
    }
    for (let j = 0; j < 9; j += 3) {
      normals[k + j] = nx;
      normals[k + j + 1] = ny;
      normals[k + j + 2] = nz;
    }
  }
  return normals;
}
