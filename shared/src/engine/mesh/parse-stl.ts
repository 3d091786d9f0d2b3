import type { MeshProblem } from './mesh-problem';

/** A triangle soup read from an STL file (units as in the file; an STL in millimetres needs scale 0.001). */
export interface ParsedMesh {
  /** 9 coordinates per triangle (x1 y1 z1 x2 … z3); may be longer than 9·triangleCount when a reused buffer was passed. */
  corners: Float32Array;
  triangleCount: number;
  format: 'binary' | 'ascii';
  /** Mean of all triangle corners (file units): the reference point for integration. */
  mean: [number, number, number];
  /** Solid name (ASCII) or header text (binary), trimmed. */
  name: string;
}

/** Limits of parseStl. */
export interface StlLimits {
  /** Largest file accepted (bytes); default 100 MB. */
  maxBytes?: number;
  /** Most triangles accepted; default 2,000,000. */
  maxTriangles?: number;
  /** A buffer to parse into when it is large enough (no fresh allocation per file). */
  target?: Float32Array;
}

export type StlResult = { ok: true; mesh: ParsedMesh; problems: MeshProblem[] } | { ok: false; problems: MeshProblem[] };

const DEFAULT_MAX_BYTES = 100 * 1024 * 1024;
const DEFAULT_MAX_TRIANGLES = 2_000_000;

/**
 * Reads a binary or ASCII STL into a Float32Array of corners. Binary: an 80-byte header, a uint32
 * little-endian triangle count, then 50 bytes per triangle (normal, three corners as float32, a
 * 2-byte attribute); the file size must equal 84 + 50·count. ASCII: `solid … facet normal … outer
 * loop vertex x y z (×3) endloop endfacet … endsolid`. Normals are ignored (orientation comes from
 * the corner order). Problems: unreadable, too_large, count_mismatch, no_triangles, non_finite.
 * Topology is checked separately (validateIndexedMesh after weldVertices).
 */
export function parseStl(bytes: Uint8Array | ArrayBuffer, limits: StlLimits = {}): StlResult {
  const b = bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes);
  const maxBytes = limits.maxBytes ?? DEFAULT_MAX_BYTES;
  const maxTriangles = limits.maxTriangles ?? DEFAULT_MAX_TRIANGLES;
  if (b.length > maxBytes) return fail('too_large', `the file is ${b.length} bytes; at most ${maxBytes} are accepted`);
  if (b.length >= 84) {
    const view = new DataView(b.buffer, b.byteOffset, b.byteLength);
    const count = view.getUint32(80, true);
    if (84 + 50 * count === b.length) return parseBinary(b, view, count, maxTriangles, limits.target);
  }
  if (looksAscii(b)) return parseAscii(b, maxTriangles, limits.target);
  if (b.length < 84) return fail('unreadable', 'the file is neither an ASCII STL nor long enough for a binary STL header');
  const count = new DataView(b.buffer, b.byteOffset, b.byteLength).getUint32(80, true);
  return fail(
    'count_mismatch',
    `the binary header announces ${count} triangles (${84 + 50 * count} bytes) but the file has ${b.length} bytes`,
  );
}

function fail(code: MeshProblem['code'], message: string): StlResult {
  return { ok: false, problems: [{ code, message }] };
}

function buffer(target: Float32Array | undefined, n: number): Float32Array {
  return target && target.length >= n ? target : new Float32Array(n);
}

function parseBinary(b: Uint8Array, view: DataView, count: number, maxTriangles: number, target?: Float32Array): StlResult {
  if (count === 0) return fail('no_triangles', 'the file holds no triangles');
  if (count > maxTriangles) return fail('too_large', `the file holds ${count} triangles; at most ${maxTriangles} are accepted`);
  const corners = buffer(target, 9 * count);
  let sx = 0,
    sy = 0,
    sz = 0,
    bad = 0,
    firstBad = -1;
  for (let t = 0, off = 96, o = 0; t < count; t++, off += 50) {
    for (let k = 0; k < 3; k++, o += 3) {
      const x = view.getFloat32(off + 12 * k, true),
        y = view.getFloat32(off + 12 * k + 4, true),
        z = view.getFloat32(off + 12 * k + 8, true);
      corners[o] = x;
      corners[o + 1] = y;
      corners[o + 2] = z;
      sx += x;
      sy += y;
      sz += z;
    }
    // NaN and ±Infinity poison the running sum; check per triangle only when it has gone bad.
    if (!(sx - sx === 0 && sy - sy === 0 && sz - sz === 0)) {
      bad++;
      if (firstBad < 0) firstBad = t;
      sx = sy = sz = 0; // the mean is unused when the file is refused
    }
  }
  if (bad > 0)
    return {
      ok: false,
      problems: [
        {
          code: 'non_finite',
          message: `${bad} triangles have NaN or infinite coordinates (the first is triangle ${firstBad})`,
          count: bad,
          firstTriangle: firstBad,
        },
      ],
    };
  const name = new TextDecoder('latin1').decode(b.subarray(0, 80)).replace(/\0.*$/s, '').trim();
  const inv = 1 / (3 * count);
  return { ok: true, mesh: { corners, triangleCount: count, format: 'binary', mean: [sx * inv, sy * inv, sz * inv], name }, problems: [] };
}

function looksAscii(b: Uint8Array): boolean {
  let i = 0;
  while (i < b.length && (b[i] === 0x20 || b[i] === 0x09 || b[i] === 0x0a || b[i] === 0x0d)) i++;
  const head = new TextDecoder('latin1').decode(b.subarray(i, Math.min(b.length, i + 1024))).toLowerCase();
  return head.startsWith('solid') && (head.includes('facet') || head.includes('endsolid'));
}

const VERTEX = /vertex\s+(\S+)\s+(\S+)\s+(\S+)/g;

function parseAscii(b: Uint8Array, maxTriangles: number, target?: Float32Array): StlResult {
  const text = new TextDecoder('latin1').decode(b);
  const name = (/^\s*solid[ \t]*([^\r\n]*)/i.exec(text)?.[1] ?? '').trim();
  let n = 0;
  for (VERTEX.lastIndex = 0; VERTEX.exec(text);) n++;
  if (n === 0) return fail('no_triangles', 'the file holds no triangles');
  if (n % 3 !== 0) return fail('unreadable', `the file lists ${n} vertices, not a multiple of three`);
  const count = n / 3;
  if (count > maxTriangles) return fail('too_large', `the file holds ${count} triangles; at most ${maxTriangles} are accepted`);
  const facets = (text.match(/endfacet/gi) ?? []).length;
  if (facets !== count) return fail('unreadable', `the file has ${facets} facets but ${count} vertex triples`);
  const corners = buffer(target, 3 * n);
  let o = 0,
    sx = 0,
    sy = 0,
    sz = 0,
    bad = 0,
    firstBad = -1;
  for (VERTEX.lastIndex = 0, n = 0; ; n++) {
    const m = VERTEX.exec(text);
    if (!m) break;
    const x = Number(m[1]),
      y = Number(m[2]),
      z = Number(m[3]);
    if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) {
      bad++;
      if (firstBad < 0) firstBad = Math.floor(n / 3);
    }
    corners[o++] = x;
    corners[o++] = y;
    corners[o++] = z;
    sx += x;
    sy += y;
    sz += z;
  }
  if (bad > 0)
    return {
      ok: false,
      problems: [
        {
          code: 'non_finite',
          message: `${bad} vertices are not finite numbers (first in triangle ${firstBad})`,
          count: bad,
          firstTriangle: firstBad,
        },
      ],
    };
  const inv = 1 / (3 * count);
  return { ok: true, mesh: { corners, triangleCount: count, format: 'ascii', mean: [sx * inv, sy * inv, sz * inv], name }, problems: [] };
}
