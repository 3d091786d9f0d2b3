import { rotationFromDegrees } from '@tumblewise/engine';

/** A primitive's silhouette projected on a drawing plane (convex hull of surface samples), in m. */
export interface Outline {
  id: string;
  mode: 'add' | 'remove';
  points: [number, number][];
}

type Vec = [number, number, number];
type Prim = Record<string, unknown> & { id?: unknown; shape?: unknown; position?: unknown; rotationDeg?: unknown; mode?: unknown };

/** Points on the unit sphere (Fibonacci lattice). */
function sphere(n: number): Vec[] {
  const pts: Vec[] = [];
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < n; i++) {
    const z = 1 - (2 * (i + 0.5)) / n, r = Math.sqrt(1 - z * z), a = i * golden;
    pts.push([r * Math.cos(a), r * Math.sin(a), z]);
  }
  return pts;
}

function ring(r: number, z: number, n = 32): Vec[] {
  return Array.from({ length: n }, (_, i) => [r * Math.cos((2 * Math.PI * i) / n), r * Math.sin((2 * Math.PI * i) / n), z] as Vec);
}

const num = (v: unknown, fallback = 0) => (typeof v === 'number' && Number.isFinite(v) ? v : fallback);
const vec = (v: unknown): Vec => (Array.isArray(v) && v.length === 3 ? [num(v[0]), num(v[1]), num(v[2])] : [0, 0, 0]);

/** Surface samples in the primitive's local frame (PRODUCT.md frames: symmetry axis local z). */
function localSamples(p: Prim): Vec[] {
  switch (p.shape) {
    case 'box': { const [a, b, c] = vec(p.size); const pts: Vec[] = []; for (const x of [-a / 2, a / 2]) for (const y of [-b / 2, b / 2]) for (const z of [-c / 2, c / 2]) pts.push([x, y, z]); return pts; }
    case 'cylinder': { const r = num(p.radius), h = num(p.length); return [...ring(r, -h / 2), ...ring(r, h / 2)]; }
    case 'cone': { const r = num(p.radius), h = num(p.length), t = num(p.topRadius); return [...ring(r, 0), ...(t > 0 ? ring(t, h) : [[0, 0, h] as Vec])]; }
    case 'sphere': { const r = num(p.radius); return sphere(120).map(([x, y, z]) => [r * x, r * y, r * z]); }
    case 'ellipsoid': { const [a, b, c] = vec(p.semiAxes); return sphere(160).map(([x, y, z]) => [a * x, b * y, c * z]); }
    case 'torus': {
      const R = num(p.majorRadius), a = num(p.minorRadius); const pts: Vec[] = [];
      for (let i = 0; i < 36; i++) for (let j = 0; j < 12; j++) {
        const u = (2 * Math.PI * i) / 36, v = (2 * Math.PI * j) / 12;
        pts.push([(R + a * Math.cos(v)) * Math.cos(u), (R + a * Math.cos(v)) * Math.sin(u), a * Math.sin(v)]);
      }
      return pts;
    }
    case 'capsule': { const r = num(p.radius), h = num(p.length); return sphere(120).map(([x, y, z]) => [r * x, r * y, r * z + (z >= 0 ? h / 2 : -h / 2)]); }
    case 'point': return [[0, 0, 0]];
    case 'mesh': { const v = p.vertices; return Array.isArray(v) ? v.slice(0, 5000).map((c) => vec(c)).map(([x, y, z]) => [x * num(p.scale, 1), y * num(p.scale, 1), z * num(p.scale, 1)]) : []; }
    default: return [];
  }
}

/** Andrew's monotone chain convex hull (Andrew, Inf. Process. Lett. 9(5), 1979). */
export function convexHull(points: [number, number][]): [number, number][] {
  const pts = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (pts.length < 3) return pts;
  const cross = (o: number[], a: number[], b: number[]) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: [number, number][] = [];
  for (const p of pts) { while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], p) <= 0) lower.pop(); lower.push(p); }
  const upper: [number, number][] = [];
  for (let i = pts.length - 1; i >= 0; i--) { const p = pts[i]; while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], p) <= 0) upper.pop(); upper.push(p); }
  return [...lower.slice(0, -1), ...upper.slice(0, -1)];
}

/**
 * Silhouettes of every primitive seen along `viewAxis`, drawn with `right` to the right and
 * viewAxis × right upward (both unit, perpendicular). Mesh primitives by uploaded id are skipped.
 */
export function partOutlines(doc: unknown, right: Vec, up: Vec): Outline[] {
  const primitives = (doc as { primitives?: unknown } | null)?.primitives;
  if (!Array.isArray(primitives)) return [];
  const m = new Float64Array(9);
  return primitives.slice(0, 500).flatMap((raw, i) => {
    const p = raw as Prim;
    const [rx, ry, rz] = vec(p.rotationDeg);
    rotationFromDegrees(m, rx, ry, rz);
    const [px, py, pz] = vec(p.position);
    const projected = localSamples(p).map(([x, y, z]) => {
      const wx = m[0] * x + m[1] * y + m[2] * z + px, wy = m[3] * x + m[4] * y + m[5] * z + py, wz = m[6] * x + m[7] * y + m[8] * z + pz;
      return [wx * right[0] + wy * right[1] + wz * right[2], wx * up[0] + wy * up[1] + wz * up[2]] as [number, number];
    });
    if (projected.length === 0) return [];
    return [{ id: typeof p.id === 'string' ? p.id : `#${i}`, mode: p.mode === 'remove' ? 'remove' : 'add', points: p.shape === 'point' ? projected : convexHull(projected) } as Outline];
  });
}
