import type { MeshProblem } from './mesh-problem';

/** Result of checking an indexed mesh. `triangles` is flipped in place when the mesh was inside-out. */
export interface MeshCheck {
  problems: MeshProblem[];
  /** True when nothing blocks integration (problems, if any, are all `fixed`). */
  ok: boolean;
  /** Signed volume before any flip, in the mesh's units³. */
  signedVolume: number;
}

/**
 * Checks that an indexed triangle mesh bounds a solid: at least one triangle, finite coordinates, no
 * degenerate triangle (a repeated corner or an area below 1e-12 of the bounding box's diagonal²),
 * a closed 2-manifold with consistent orientation (every directed edge a→b exactly once and its
 * reverse b→a exactly once), and positive volume — an inside-out mesh (negative volume, all else
 * fine) is flipped in place and reported as fixed.
 * Not checked: self-intersection and vertex-only (bow-tie) contacts.
 */
export function validateIndexedMesh(vertices: ArrayLike<number>, triangles: Uint32Array): MeshCheck {
  const problems: MeshProblem[] = [];
  const nt = Math.floor(triangles.length / 3);
  if (nt === 0) {
    problems.push({ code: 'no_triangles', message: 'the mesh has no triangles' });
    return { problems, ok: false, signedVolume: 0 };
  }
  let lo0 = Infinity,
    lo1 = Infinity,
    lo2 = Infinity,
    hi0 = -Infinity,
    hi1 = -Infinity,
    hi2 = -Infinity;
  let nonFinite = 0;
  for (let i = 0; i < vertices.length; i += 3) {
    const x = vertices[i],
      y = vertices[i + 1],
      z = vertices[i + 2];
    if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) {
      nonFinite++;
      continue;
    }
    if (x < lo0) lo0 = x;
    if (x > hi0) hi0 = x;
    if (y < lo1) lo1 = y;
    if (y > hi1) hi1 = y;
    if (z < lo2) lo2 = z;
    if (z > hi2) hi2 = z;
  }
  if (nonFinite > 0) {
    problems.push({ code: 'non_finite', message: `${nonFinite} vertices have NaN or infinite coordinates`, count: nonFinite });
    return { problems, ok: false, signedVolume: 0 };
  }
  const diag2 = (hi0 - lo0) ** 2 + (hi1 - lo1) ** 2 + (hi2 - lo2) ** 2;
  const areaFloor = 1e-12 * diag2;
  let degenerate = 0,
    firstDegenerate = -1;
  let v6 = 0;
  for (let t = 0; t < nt; t++) {
    const a = triangles[3 * t],
      b = triangles[3 * t + 1],
      c = triangles[3 * t + 2];
    const ax = vertices[3 * a],
      ay = vertices[3 * a + 1],
      az = vertices[3 * a + 2];
    const e1x = vertices[3 * b] - ax,
      e1y = vertices[3 * b + 1] - ay,
      e1z = vertices[3 * b + 2] - az;
    const e2x = vertices[3 * c] - ax,
      e2y = vertices[3 * c + 1] - ay,
      e2z = vertices[3 * c + 2] - az;
    const nx = e1y * e2z - e1z * e2y,
      ny = e1z * e2x - e1x * e2z,
      nz = e1x * e2y - e1y * e2x;
    const area2 = Math.hypot(nx, ny, nz);
    if (a === b || b === c || a === c || area2 <= areaFloor) {
      degenerate++;
      if (firstDegenerate < 0) firstDegenerate = t;
    }
    // Signed volume about the bounding-box corner (only its sign is used here).
    v6 += (ax - lo0) * nx + (ay - lo1) * ny + (az - lo2) * nz;
  }
  if (degenerate > 0) {
    problems.push({
      code: 'degenerate',
      message: `${degenerate} triangles have no area (repeated or collinear corners)`,
      count: degenerate,
      firstTriangle: firstDegenerate,
    });
  }
  checkEdges(triangles, nt, problems);
  const blocking = problems.length > 0;
  if (!blocking && v6 < 0) {
    for (let t = 0; t < nt; t++) {
      const b = triangles[3 * t + 1];
      triangles[3 * t + 1] = triangles[3 * t + 2];
      triangles[3 * t + 2] = b;
    }
    problems.push({ code: 'inside_out', message: 'the triangles faced inwards (negative volume); they were flipped', fixed: true });
  } else if (!blocking && v6 === 0) {
    problems.push({ code: 'degenerate', message: 'the mesh encloses no volume' });
  }
  return { problems, ok: problems.every((p) => p.fixed), signedVolume: v6 / 6 };
}

/**
 * Directed-edge census in an open-addressing hash table keyed on (from, to): for a closed,
 * consistently oriented 2-manifold each directed edge occurs once and its reverse once.
 */
function checkEdges(triangles: Uint32Array, nt: number, problems: MeshProblem[]): void {
  const ne = 3 * nt;
  let size = 1;
  while (size < 2 * ne) size <<= 1;
  const mask = size - 1;
  const from = new Int32Array(size).fill(-1);
  const to = new Int32Array(size);
  const uses = new Int32Array(size);
  const slot = (a: number, b: number, insert: boolean): number => {
    let s = (Math.imul(a, 0x9e3779b1) ^ Math.imul(b, 0x85ebca6b)) & mask;
    for (;;) {
      if (from[s] < 0) {
        if (!insert) return -1;
        from[s] = a;
        to[s] = b;
        return s;
      }
      if (from[s] === a && to[s] === b) return s;
      s = (s + 1) & mask;
    }
  };
  let sameDirection = 0,
    firstSame = -1;
  for (let t = 0; t < nt; t++) {
    for (let e = 0; e < 3; e++) {
      const a = triangles[3 * t + e],
        b = triangles[3 * t + ((e + 1) % 3)];
      if (a === b) continue;
      const s = slot(a, b, true);
      uses[s]++;
      if (uses[s] === 2) {
        sameDirection++;
        if (firstSame < 0) firstSame = t;
      }
    }
  }
  let open = 0,
    nonManifold = 0;
  for (let s = 0; s < size; s++) {
    if (from[s] < 0) continue;
    const r = slot(to[s], from[s], false);
    const back = r < 0 ? 0 : uses[r];
    const total = uses[s] + back;
    if (total === 1) open++;
    else if (total > 2) nonManifold++;
  }
  if (open > 0) problems.push({ code: 'open', message: `the mesh is not closed: ${open} edges belong to one triangle only`, count: open });
  if (nonManifold > 0)
    problems.push({
      code: 'non_manifold',
      message: `${nonManifold} directed edges are shared by more than two triangles`,
      count: nonManifold,
    });
  if (sameDirection > 0 && nonManifold === 0) {
    problems.push({
      code: 'inconsistent_orientation',
      message: `${sameDirection} edges run the same way in both their triangles (mixed orientation)`,
      count: sameDirection,
      firstTriangle: firstSame,
    });
  }
}
