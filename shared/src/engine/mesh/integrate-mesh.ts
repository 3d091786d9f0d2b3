import { createSolid, type Solid } from '../primitives/solid';

/**
 * Mass properties (unit density) of a closed, outward-oriented triangle solid, by signed tetrahedra
 * from a reference point o = the mean of the triangle corners (so a mesh far from the origin keeps
 * its accuracy). For each triangle (v1, v2, v3) taken relative to o, with d = det[v1 v2 v3] and
 * s = v1 + v2 + v3:  V = Σ d/6,  ∫r = Σ d·s/24,  ∫x² = Σ d/120·(x1² + x2² + x3² + sx²),
 * ∫xy = Σ d/120·(x1y1 + x2y2 + x3y3 + sx·sy).
 * Sources: Kallay, "Computing the moment of inertia of a solid defined by a triangle mesh",
 * J. Graphics Tools 11(2), 2006 (equivalent to Mirtich 1996 and to Tonon 2005).
 * Then I = tr(C)E − C for the covariance C = ∫r rᵀ, shifted to the centroid.
 *
 * Input: `corners`, 9 numbers per triangle (x1 y1 z1 x2 … z3), the first `count` triangles, in the
 * mesh's own units; `scale` multiplies every coordinate (0.001 for an STL in millimetres).
 * Output: the solid in scaled units (m³, m, m⁵). The volume is negative for an inside-out mesh;
 * the caller decides (see validateIndexedMesh). `reference` skips the mean pass when the caller
 * already has the corner mean (parseStl computes it while reading).
 */
export function integrateTriangleSoup(
  out: Solid = createSolid(),
  corners: ArrayLike<number>,
  count = Math.floor(corners.length / 9),
  scale = 1,
  reference?: ArrayLike<number>,
): Solid {
  let ox = 0,
    oy = 0,
    oz = 0;
  const n9 = count * 9;
  if (reference) {
    ox = reference[0];
    oy = reference[1];
    oz = reference[2];
  } else {
    for (let i = 0; i < n9; i += 3) {
      ox += corners[i];
      oy += corners[i + 1];
      oz += corners[i + 2];
    }
    const inv = count > 0 ? 1 / (3 * count) : 0;
    ox *= inv;
    oy *= inv;
    oz *= inv;
  }
  let v6 = 0,
    rx = 0,
    ry = 0,
    rz = 0,
    xx = 0,
    yy = 0,
    zz = 0,
    xy = 0,
    yz = 0,
    xz = 0;
  for (let i = 0; i < n9; i += 9) {
    const x1 = corners[i] - ox,
      y1 = corners[i + 1] - oy,
      z1 = corners[i + 2] - oz;
    const x2 = corners[i + 3] - ox,
      y2 = corners[i + 4] - oy,
      z2 = corners[i + 5] - oz;
    const x3 = corners[i + 6] - ox,
      y3 = corners[i + 7] - oy,
      z3 = corners[i + 8] - oz;
    const d = x1 * (y2 * z3 - z2 * y3) - y1 * (x2 * z3 - z2 * x3) + z1 * (x2 * y3 - y2 * x3);
    const sx = x1 + x2 + x3,
      sy = y1 + y2 + y3,
      sz = z1 + z2 + z3;
    v6 += d;
    rx += d * sx;
    ry += d * sy;
    rz += d * sz;
    xx += d * (x1 * x1 + x2 * x2 + x3 * x3 + sx * sx);
    yy += d * (y1 * y1 + y2 * y2 + y3 * y3 + sy * sy);
    zz += d * (z1 * z1 + z2 * z2 + z3 * z3 + sz * sz);
    xy += d * (x1 * y1 + x2 * y2 + x3 * y3 + sx * sy);
    yz += d * (y1 * z1 + y2 * z2 + y3 * z3 + sy * sz);
    xz += d * (x1 * z1 + x2 * z2 + x3 * z3 + sx * sz);
  }
  return finish(out, v6, rx, ry, rz, xx, yy, zz, xy, yz, xz, ox, oy, oz, scale);
}

/**
 * The same integration for an indexed mesh: `vertices` 3 numbers per vertex, `triangles` 3 vertex
 * indices per triangle (outward orientation = counter-clockwise seen from outside). The reference
 * point is the vertex mean.
 */
export function integrateIndexedMesh(
  out: Solid = createSolid(),
  vertices: ArrayLike<number>,
  triangles: ArrayLike<number>,
  scale = 1,
): Solid {
  const nv = Math.floor(vertices.length / 3);
  let ox = 0,
    oy = 0,
    oz = 0;
  for (let i = 0; i < nv * 3; i += 3) {
    ox += vertices[i];
    oy += vertices[i + 1];
    oz += vertices[i + 2];
  }
  const inv = nv > 0 ? 1 / nv : 0;
  ox *= inv;
  oy *= inv;
  oz *= inv;
  let v6 = 0,
    rx = 0,
    ry = 0,
    rz = 0,
    xx = 0,
    yy = 0,
    zz = 0,
    xy = 0,
    yz = 0,
    xz = 0;
  for (let t = 0; t + 2 < triangles.length; t += 3) {
    const a = 3 * triangles[t],
      b = 3 * triangles[t + 1],
      c = 3 * triangles[t + 2];
    const x1 = vertices[a] - ox,
      y1 = vertices[a + 1] - oy,
      z1 = vertices[a + 2] - oz;
    const x2 = vertices[b] - ox,
      y2 = vertices[b + 1] - oy,
      z2 = vertices[b + 2] - oz;
    const x3 = vertices[c] - ox,
      y3 = vertices[c + 1] - oy,
      z3 = vertices[c + 2] - oz;
    const d = x1 * (y2 * z3 - z2 * y3) - y1 * (x2 * z3 - z2 * x3) + z1 * (x2 * y3 - y2 * x3);
    const sx = x1 + x2 + x3,
      sy = y1 + y2 + y3,
      sz = z1 + z2 + z3;
    v6 += d;
    rx += d * sx;
    ry += d * sy;
    rz += d * sz;
    xx += d * (x1 * x1 + x2 * x2 + x3 * x3 + sx * sx);
    yy += d * (y1 * y1 + y2 * y2 + y3 * y3 + sy * sy);
    zz += d * (z1 * z1 + z2 * z2 + z3 * z3 + sz * sz);
    xy += d * (x1 * y1 + x2 * y2 + x3 * y3 + sx * sy);
    yz += d * (y1 * z1 + y2 * z2 + y3 * z3 + sy * sz);
    xz += d * (x1 * z1 + x2 * z2 + x3 * z3 + sx * sz);
  }
  return finish(out, v6, rx, ry, rz, xx, yy, zz, xy, yz, xz, ox, oy, oz, scale);
}

function finish(
  out: Solid,
  v6: number,
  rx: number,
  ry: number,
  rz: number,
  xx: number,
  yy: number,
  zz: number,
  xy: number,
  yz: number,
  xz: number,
  ox: number,
  oy: number,
  oz: number,
  scale: number,
): Solid {
  const v = v6 / 6;
  const gx = v !== 0 ? rx / 24 / v : 0,
    gy = v !== 0 ? ry / 24 / v : 0,
    gz = v !== 0 ? rz / 24 / v : 0;
  // Covariance about the centroid: C = ∫r rᵀ − V g gᵀ (all relative to o).
  const cxx = xx / 120 - v * gx * gx,
    cyy = yy / 120 - v * gy * gy,
    czz = zz / 120 - v * gz * gz;
  const cxy = xy / 120 - v * gx * gy,
    cyz = yz / 120 - v * gy * gz,
    cxz = xz / 120 - v * gx * gz;
  const s3 = scale * scale * scale,
    s5 = s3 * scale * scale;
  out.volume = v * s3;
  out.centroid[0] = (ox + gx) * scale;
  out.centroid[1] = (oy + gy) * scale;
  out.centroid[2] = (oz + gz) * scale;
  const j = out.inertia;
  j[0] = (cyy + czz) * s5;
  j[4] = (cxx + czz) * s5;
  j[8] = (cxx + cyy) * s5;
  j[1] = j[3] = -cxy * s5;
  j[5] = j[7] = -cyz * s5;
  j[2] = j[6] = -cxz * s5;
  return out;
}
