import { polygonArea, polygonHull } from 'd3-polygon';
import { rotationFromDegrees, validatePartDocument } from '@tumblewise/engine/worker';

/** A primitive's silhouette projected on a drawing plane (convex hull of surface samples), in m. */
export interface Outline {
  id: string;
  mode: 'add' | 'remove';
  points: [number, number][];
  /**
   * A shape that is not convex seen from some side (a torus, a mesh of up to
   * MAX_PIECEWISE_TRIANGLES triangles): convex pieces, each counter-clockwise, whose union is the
   * silhouette (a ring seen along its axis keeps its hole). `points` is then their hull.
   */
  pieces?: [number, number][][];
}

type Vec = [number, number, number];
type Prim = Record<string, unknown> & { id?: unknown; shape?: unknown; position?: unknown; rotationDeg?: unknown; mode?: unknown };

/** Points on the unit sphere (Fibonacci lattice). */
function sphere(n: number): Vec[] {
  const pts: Vec[] = [];
  const golden = Math.PI * (3 - Math.sqrt(5));
  for (let i = 0; i < n; i++) {
    const z = 1 - (2 * (i + 0.5)) / n,
      r = Math.sqrt(1 - z * z),
      a = i * golden;
    pts.push([r * Math.cos(a), r * Math.sin(a), z]);
  }
  return pts;
}

function ring(r: number, z: number, n = 32): Vec[] {
  return Array.from({ length: n }, (_, i) => [r * Math.cos((2 * Math.PI * i) / n), r * Math.sin((2 * Math.PI * i) / n), z] as Vec);
}

const num = (v: unknown, fallback = 0) => (typeof v === 'number' && Number.isFinite(v) ? v : fallback);
const vec = (v: unknown): Vec => (Array.isArray(v) && v.length === 3 ? [num(v[0]), num(v[1]), num(v[2])] : [0, 0, 0]);

/** The triangle corners of an uploaded mesh by its id (file units), or undefined when it is not at hand. */
export type MeshCorners = (meshId: string) => ArrayLike<number> | undefined;

/** Surface samples in the primitive's local frame (PRODUCT.md frames: symmetry axis local z). */
function localSamples(p: Prim, meshCorners: MeshCorners): Vec[] {
  switch (p.shape) {
    case 'box': {
      const [a, b, c] = vec(p.size);
      const pts: Vec[] = [];
      for (const x of [-a / 2, a / 2]) for (const y of [-b / 2, b / 2]) for (const z of [-c / 2, c / 2]) pts.push([x, y, z]);
      return pts;
    }
    case 'cylinder': {
      const r = num(p.radius),
        h = num(p.length);
      return [...ring(r, -h / 2), ...ring(r, h / 2)];
    }
    case 'cone': {
      const r = num(p.radius),
        h = num(p.length),
        t = num(p.topRadius);
      return [...ring(r, 0), ...(t > 0 ? ring(t, h) : [[0, 0, h] as Vec])];
    }
    case 'sphere': {
      const r = num(p.radius);
      return sphere(120).map(([x, y, z]) => [r * x, r * y, r * z]);
    }
    case 'ellipsoid': {
      const [a, b, c] = vec(p.semiAxes);
      return sphere(160).map(([x, y, z]) => [a * x, b * y, c * z]);
    }
    case 'torus': {
      const R = num(p.majorRadius),
        a = num(p.minorRadius);
      const pts: Vec[] = [];
      for (let i = 0; i < 36; i++)
        for (let j = 0; j < 12; j++) {
          const u = (2 * Math.PI * i) / 36,
            v = (2 * Math.PI * j) / 12;
          pts.push([(R + a * Math.cos(v)) * Math.cos(u), (R + a * Math.cos(v)) * Math.sin(u), a * Math.sin(v)]);
        }
      return pts;
    }
    case 'capsule': {
      const r = num(p.radius),
        h = num(p.length);
      return sphere(120).map(([x, y, z]) => [r * x, r * y, r * z + (z >= 0 ? h / 2 : -h / 2)]);
    }
    case 'point':
      return [[0, 0, 0]];
    case 'mesh': {
      const scale = num(p.scale, 1);
      if (typeof p.meshId === 'string') {
        const corners = meshCorners(p.meshId);
        return corners ? cornerSamples(corners, scale) : [];
      }
      const v = p.vertices;
      return Array.isArray(v)
        ? v
            .slice(0, 5000)
            .map((c) => vec(c))
            .map(([x, y, z]) => [x * scale, y * scale, z * scale])
        : [];
    }
    default:
      return [];
  }
}

/** Meshes of at most this many triangles are drawn triangle by triangle (holes kept); larger ones as their hull. */
export const MAX_PIECEWISE_TRIANGLES = 20_000;

/**
 * Groups of local points whose hulls together make the primitive's silhouette, for shapes that are
 * not convex: a torus as 36 segments of its tube, a mesh as its triangles. Null for the others.
 */
function localPieces(p: Prim, meshCorners: MeshCorners): Vec[][] | null {
  if (p.shape === 'torus') {
    const R = num(p.majorRadius),
      a = num(p.minorRadius);
    const tube = (u: number) =>
      Array.from({ length: 12 }, (_, j) => {
        const v = (2 * Math.PI * j) / 12;
        return [(R + a * Math.cos(v)) * Math.cos(u), (R + a * Math.cos(v)) * Math.sin(u), a * Math.sin(v)] as Vec;
      });
    return Array.from({ length: 36 }, (_, i) => [...tube((2 * Math.PI * i) / 36), ...tube((2 * Math.PI * (i + 1)) / 36)]);
  }
  if (p.shape !== 'mesh') return null;
  const scale = num(p.scale, 1);
  if (typeof p.meshId === 'string') {
    const corners = meshCorners(p.meshId);
    if (!corners || corners.length / 9 > MAX_PIECEWISE_TRIANGLES) return null;
    const at = (k: number): Vec => [corners[k] * scale, corners[k + 1] * scale, corners[k + 2] * scale];
    return Array.from({ length: Math.floor(corners.length / 9) }, (_, t) => [at(9 * t), at(9 * t + 3), at(9 * t + 6)]);
  }
  const vertices = Array.isArray(p.vertices) ? p.vertices : [],
    triangles = Array.isArray(p.triangles) ? p.triangles : [];
  if (triangles.length === 0 || triangles.length > MAX_PIECEWISE_TRIANGLES) return null;
  const at = (i: unknown): Vec => {
    const [x, y, z] = vec(vertices[num(i, -1)]);
    return [x * scale, y * scale, z * scale];
  };
  return triangles.map((t) => (Array.isArray(t) && t.length === 3 ? [at(t[0]), at(t[1]), at(t[2])] : []));
}

/**
 * A polygon counter-clockwise in the drawing plane (y up), so pieces filled together make their
 * union. d3-polygon's polygonArea is positive for counter-clockwise with y down, so negative here.
 */
function counterClockwise(polygon: [number, number][]): [number, number][] {
  return polygonArea(polygon) > 0 ? [...polygon].reverse() : polygon;
}

/** The convex hull of points in the plane (d3-polygon: Andrew's monotone chain); fewer than three are kept as they are. */
export function convexHull(points: [number, number][]): [number, number][] {
  return points.length < 3 ? points : (polygonHull(points) ?? points);
}

/** Most corners of an uploaded mesh taken into its outline; a larger mesh is sampled evenly. */
export const MAX_OUTLINE_CORNERS = 60_000;

/** Corners of a mesh's triangles (9 numbers a triangle) as points, every k-th when there are many. */
function cornerSamples(corners: ArrayLike<number>, scale: number): Vec[] {
  const count = Math.floor(corners.length / 3);
  const step = Math.max(1, Math.ceil(count / MAX_OUTLINE_CORNERS));
  const pts: Vec[] = [];
  for (let i = 0; i < count; i += step) pts.push([corners[3 * i] * scale, corners[3 * i + 1] * scale, corners[3 * i + 2] * scale]);
  return pts;
}

/**
 * Silhouettes of every primitive seen along `viewAxis`, drawn with `right` to the right and
 * viewAxis × right upward (both unit, perpendicular). An uploaded mesh is drawn from its corners
 * as `meshCorners` gives them, and left out when it gives none.
 */
export function partOutlines(doc: unknown, right: Vec, up: Vec, meshCorners: MeshCorners = () => undefined): Outline[] {
  const primitives = (doc as { primitives?: unknown } | null)?.primitives;
  if (!Array.isArray(primitives)) return [];
  const m = new Float64Array(9);
  return primitives.slice(0, 500).flatMap((raw, i) => {
    const p = raw as Prim;
    const [rx, ry, rz] = vec(p.rotationDeg);
    rotationFromDegrees(m, rx, ry, rz);
    const [px, py, pz] = vec(p.position);
    const project = ([x, y, z]: Vec): [number, number] => {
      const wx = m[0] * x + m[1] * y + m[2] * z + px,
        wy = m[3] * x + m[4] * y + m[5] * z + py,
        wz = m[6] * x + m[7] * y + m[8] * z + pz;
      return [wx * right[0] + wy * right[1] + wz * right[2], wx * up[0] + wy * up[1] + wz * up[2]];
    };
    const id = typeof p.id === 'string' ? p.id : `#${i}`,
      mode = p.mode === 'remove' ? 'remove' : 'add';
    const pieces = localPieces(p, meshCorners)
      ?.filter((g) => g.length >= 3)
      .map((g) => counterClockwise(convexHull(g.map(project))));
    if (pieces && pieces.length > 0) return [{ id, mode, points: convexHull(pieces.flat()), pieces } as Outline];
    const projected = localSamples(p, meshCorners).map(project);
    if (projected.length === 0) return [];
    return [{ id, mode, points: p.shape === 'point' ? projected : convexHull(projected) } as Outline];
  });
}

/**
 * A document whose fields refer to named parameters, as the engine validates it (every field a
 * number); any other document, or one that does not validate, as it is.
 */
function withReferencesResolved(doc: unknown): unknown {
  if (!doc || typeof doc !== 'object' || !('parameters' in doc)) return doc;
  const checked = validatePartDocument(doc);
  return checked.ok ? checked.value : doc;
}

/** The side view the PDF draws: its axes in the part frame and each primitive's outline. */
export interface PartDrawing {
  right: Vec;
  up: Vec;
  outlines: Outline[];
  /** Uploaded meshes (distinct ids) the document names whose corners were not at hand (left out of the drawing). */
  meshesLeftOut: number;
}

/**
 * The part seen from the side: its long axis up when a grip frame is given (the view looks along
 * the grip's face normal), else part z up; right = up × face.
 */
export function partDrawing(stored: unknown, meshCorners: MeshCorners = () => undefined): PartDrawing {
  const doc = withReferencesResolved(stored);
  const grip = (doc as { grip?: { axis?: unknown; faceNormal?: unknown } } | null)?.grip;
  const up: Vec = Array.isArray(grip?.axis) && grip.axis.length === 3 ? vec(grip.axis) : [0, 0, 1];
  const face: Vec =
    Array.isArray(grip?.faceNormal) && grip.faceNormal.length === 3 ? vec(grip.faceNormal) : Math.abs(up[0]) < 0.9 ? [1, 0, 0] : [0, 1, 0];
  const right: Vec = [up[1] * face[2] - up[2] * face[1], up[2] * face[0] - up[0] * face[2], up[0] * face[1] - up[1] * face[0]];
  const missing = new Set<string>();
  const counted: MeshCorners = (id) => {
    const corners = meshCorners(id);
    if (!corners) missing.add(id);
    return corners;
  };
  return { right, up, outlines: partOutlines(doc, right, up, counted), meshesLeftOut: missing.size };
}
