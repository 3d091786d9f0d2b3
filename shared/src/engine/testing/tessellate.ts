/** Indexed triangle mesh (outward, counter-clockwise seen from outside). Test and benchmark fixtures. */
export interface IndexedMesh {
  vertices: Float64Array;
  triangles: Uint32Array;
}

/** Axis-aligned box a×b×c centred on `center`: 8 vertices, 12 triangles. */
export function boxMesh(a: number, b: number, c: number, center: readonly number[] = [0, 0, 0]): IndexedMesh {
  const v: number[] = [];
  for (let i = 0; i < 8; i++)
    v.push(center[0] + (i & 1 ? a / 2 : -a / 2), center[1] + (i & 2 ? b / 2 : -b / 2), center[2] + (i & 4 ? c / 2 : -c / 2));
  // Faces as quads (outward): −x, +x, −y, +y, −z, +z.
  const quads = [
    [0, 4, 6, 2],
    [1, 3, 7, 5],
    [0, 1, 5, 4],
    [2, 6, 7, 3],
    [0, 2, 3, 1],
    [4, 5, 7, 6],
  ];
  const t: number[] = [];
  for (const [p, q, r, s] of quads) t.push(p, q, r, p, r, s);
  return { vertices: Float64Array.from(v), triangles: Uint32Array.from(t) };
}

/** Torus (centre circle R in the xy-plane, tube radius a), n segments round the ring and m round the tube. */
export function torusMesh(R: number, a: number, n: number, m: number): IndexedMesh {
  const v = new Float64Array(3 * n * m);
  for (let i = 0; i < n; i++) {
    const u = (2 * Math.PI * i) / n;
    for (let j = 0; j < m; j++) {
      const w = (2 * Math.PI * j) / m;
      const k = 3 * (i * m + j);
      v[k] = (R + a * Math.cos(w)) * Math.cos(u);
      v[k + 1] = (R + a * Math.cos(w)) * Math.sin(u);
      v[k + 2] = a * Math.sin(w);
    }
  }
  const t = new Uint32Array(6 * n * m);
  let o = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < m; j++) {
      const p = i * m + j,
        q = ((i + 1) % n) * m + j,
        r = ((i + 1) % n) * m + ((j + 1) % m),
        s = i * m + ((j + 1) % m);
      t[o++] = p;
      t[o++] = q;
      t[o++] = r;
      t[o++] = p;
      t[o++] = r;
      t[o++] = s;
    }
  }
  return { vertices: v, triangles: t };
}

/** UV sphere of radius r with n latitude bands and m longitude segments (poles as single vertices). */
export function sphereMesh(r: number, n: number, m: number): IndexedMesh {
  const v: number[] = [0, 0, r];
  for (let i = 1; i < n; i++) {
    const th = (Math.PI * i) / n;
    for (let j = 0; j < m; j++) {
      const ph = (2 * Math.PI * j) / m;
      v.push(r * Math.sin(th) * Math.cos(ph), r * Math.sin(th) * Math.sin(ph), r * Math.cos(th));
    }
  }
  v.push(0, 0, -r);
  const south = v.length / 3 - 1;
  const ring = (i: number, j: number) => 1 + (i - 1) * m + (j % m);
  const t: number[] = [];
  for (let j = 0; j < m; j++) t.push(0, ring(1, j), ring(1, j + 1));
  for (let i = 1; i < n - 1; i++) {
    for (let j = 0; j < m; j++) {
      t.push(ring(i, j), ring(i + 1, j), ring(i + 1, j + 1));
      t.push(ring(i, j), ring(i + 1, j + 1), ring(i, j + 1));
    }
  }
  for (let j = 0; j < m; j++) t.push(south, ring(n - 1, j + 1), ring(n - 1, j));
  return { vertices: Float64Array.from(v), triangles: Uint32Array.from(t) };
}

/** The triangle soup (9 coordinates per triangle) of an indexed mesh. */
export function toSoup(mesh: IndexedMesh): Float64Array {
  const nt = mesh.triangles.length / 3;
  const out = new Float64Array(9 * nt);
  for (let i = 0; i < 3 * nt; i++) {
    const v = mesh.triangles[i];
    out[3 * i] = mesh.vertices[3 * v];
    out[3 * i + 1] = mesh.vertices[3 * v + 1];
    out[3 * i + 2] = mesh.vertices[3 * v + 2];
  }
  return out;
}

/** A binary STL of a triangle soup (normals written as zero, which readers recompute). */
export function binaryStl(soup: ArrayLike<number>, header = 'fixture'): Uint8Array {
  const nt = Math.floor(soup.length / 9);
  const bytes = new Uint8Array(84 + 50 * nt);
  const view = new DataView(bytes.buffer);
  for (let i = 0; i < Math.min(80, header.length); i++) bytes[i] = header.charCodeAt(i) & 0x7f;
  view.setUint32(80, nt, true);
  for (let t = 0; t < nt; t++) for (let k = 0; k < 9; k++) view.setFloat32(84 + 50 * t + 12 + 4 * k, soup[9 * t + k], true);
  return bytes;
}

/** An ASCII STL of a triangle soup. */
export function asciiStl(soup: ArrayLike<number>, name = 'fixture'): Uint8Array {
  const lines = [`solid ${name}`];
  for (let t = 0; t < soup.length / 9; t++) {
    lines.push('  facet normal 0 0 0', '    outer loop');
    for (let k = 0; k < 3; k++) lines.push(`      vertex ${soup[9 * t + 3 * k]} ${soup[9 * t + 3 * k + 1]} ${soup[9 * t + 3 * k + 2]}`);
    lines.push('    endloop', '  endfacet');
  }
  lines.push(`endsolid ${name}`);
  return new TextEncoder().encode(lines.join('\n'));
}
