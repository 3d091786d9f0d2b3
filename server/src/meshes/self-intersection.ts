import type { MeshProblem } from '@tumblewise/engine/worker';

/**
 * The first two triangles of a closed mesh that cut through each other, by their place in the file
 * (0-based), or null when none do. Triangles that share a vertex are neighbours on the surface and
 * are not compared (two such can still cross; that is rare and not looked for).
 *
 * A bounding-volume hierarchy over the mesh (three-mesh-bvh) is tested against itself, so only
 * triangles whose boxes overlap are compared. A pair is first tried against each triangle's plane
 * (when all three corners of one lie strictly on one side of the other's plane they cannot meet:
 * the first step of Möller's test, J. Graphics Tools 2(2), 1997), and only a pair that passes goes
 * to three-mesh-bvh's full triangle–triangle test. `npm run bench -- engine` measures it for a
 * million triangles; uploads run it on a compute thread.
 */
export async function firstSelfIntersection(vertices: Float64Array, triangles: Uint32Array): Promise<[number, number] | null> {
  // Loaded as ES modules: three.js's CommonJS build prints a deprecation warning when required.
  const [{ BufferAttribute, BufferGeometry, Matrix4 }, { MeshBVH }] = await Promise.all([import('three'), import('three-mesh-bvh')]);
  const geometry = new BufferGeometry();
  geometry.setAttribute('position', new BufferAttribute(Float32Array.from(vertices), 3));
  // The tree sorts this copy of the triangles in place; `fileNumber` finds a triangle's place again.
  const sorted = triangles.slice();
  geometry.setIndex(new BufferAttribute(sorted, 1));
  const bvh = new MeshBVH(geometry);
  const planes = trianglePlanes(vertices, sorted);
  let found: [number, number] | null = null;
  bvh.bvhcast(bvh, new Matrix4(), {
    intersectsTriangles(a, b, i, j) {
      if (i >= j || shareVertex(sorted, i, j)) return false;
      if (oneSide(planes, i, vertices, sorted, j) || oneSide(planes, j, vertices, sorted, i) || !a.intersectsTriangle(b)) return false;
      found = [i, j];
      return true; // stops the search
    },
  });
  geometry.dispose();
  if (!found) return null;
  const [first, second] = [fileNumber(triangles, sorted, found[0]), fileNumber(triangles, sorted, found[1])].sort((x, y) => x - y);
  return [first, second];
}

/** Each triangle's plane n·x = d (n = (b − a) × (c − a), not normalised), 4 numbers a triangle. */
function trianglePlanes(v: Float64Array, t: Uint32Array): Float64Array {
  const planes = new Float64Array((t.length / 3) * 4);
  for (let k = 0, p = 0; k < t.length; k += 3, p += 4) {
    const a = 3 * t[k],
      b = 3 * t[k + 1],
      c = 3 * t[k + 2];
    const ux = v[b] - v[a],
      uy = v[b + 1] - v[a + 1],
      uz = v[b + 2] - v[a + 2];
    const wx = v[c] - v[a],
      wy = v[c + 1] - v[a + 1],
      wz = v[c + 2] - v[a + 2];
    const nx = uy * wz - uz * wy,
      ny = uz * wx - ux * wz,
      nz = ux * wy - uy * wx;
    planes[p] = nx;
    planes[p + 1] = ny;
    planes[p + 2] = nz;
    planes[p + 3] = nx * v[a] + ny * v[a + 1] + nz * v[a + 2];
  }
  return planes;
}

/** Whether all three corners of triangle `j` lie strictly on one side of triangle `i`'s plane. */
function oneSide(planes: Float64Array, i: number, v: Float64Array, t: Uint32Array, j: number): boolean {
  const nx = planes[4 * i],
    ny = planes[4 * i + 1],
    nz = planes[4 * i + 2],
    d = planes[4 * i + 3];
  let above = 0,
    below = 0;
  for (let k = 3 * j; k < 3 * j + 3; k++) {
    const q = 3 * t[k];
    const s = nx * v[q] + ny * v[q + 1] + nz * v[q + 2] - d;
    if (s > 0) above++;
    else if (s < 0) below++;
  }
  return above === 3 || below === 3;
}

function shareVertex(t: Uint32Array, i: number, j: number): boolean {
  for (let p = 3 * i; p < 3 * i + 3; p++) {
    for (let q = 3 * j; q < 3 * j + 3; q++) if (t[p] === t[q]) return true;
  }
  return false;
}

/** Where the sorted triangle `i` stands in the file's order (its three vertex numbers, in turn). */
function fileNumber(original: Uint32Array, sorted: Uint32Array, i: number): number {
  const a = sorted[3 * i],
    b = sorted[3 * i + 1],
    c = sorted[3 * i + 2];
  for (let k = 0; k < original.length; k += 3) if (original[k] === a && original[k + 1] === b && original[k + 2] === c) return k / 3;
  return i;
}

/** The upload check's finding for a mesh whose surface crosses itself (facets numbered from 1, as in the file). */
export function selfIntersectionProblem([i, j]: [number, number]): MeshProblem {
  return {
    code: 'self_intersecting',
    message: `the surface crosses itself (facets ${i + 1} and ${j + 1} cut through each other), so some volume would be counted twice; export the part as one closed shell`,
    firstTriangle: i,
  };
}
