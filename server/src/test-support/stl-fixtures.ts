/** Small STL files for upload tests: a unit cube (12 outward triangles), and ways to break it. */
type Tri = [number, number, number][];

/** Unit cube [0,1]³, counter-clockwise seen from outside (outward normals). */
export function cubeTriangles(size = 1): Tri[] {
  const v = (x: number, y: number, z: number): [number, number, number] => [x * size, y * size, z * size];
  const quads: [number, number, number][][] = [
    [v(0, 0, 0), v(0, 1, 0), v(1, 1, 0), v(1, 0, 0)], // bottom (−z)
    [v(0, 0, 1), v(1, 0, 1), v(1, 1, 1), v(0, 1, 1)], // top (+z)
    [v(0, 0, 0), v(1, 0, 0), v(1, 0, 1), v(0, 0, 1)], // front (−y)
    [v(0, 1, 0), v(0, 1, 1), v(1, 1, 1), v(1, 1, 0)], // back (+y)
    [v(0, 0, 0), v(0, 0, 1), v(0, 1, 1), v(0, 1, 0)], // left (−x)
    [v(1, 0, 0), v(1, 1, 0), v(1, 1, 1), v(1, 0, 1)], // right (+x)
  ];
  return quads.flatMap(([a, b, c, d]) => [
    [a, b, c],
    [a, c, d],
  ]);
}

export function binaryStl(triangles: Tri[], countOverride?: number): Buffer {
  const buf = Buffer.alloc(84 + 50 * triangles.length);
  buf.write('tumblewise test cube', 0, 'ascii');
  buf.writeUInt32LE(countOverride ?? triangles.length, 80);
  triangles.forEach((t, i) => {
    const off = 84 + 50 * i;
    t.forEach((p, k) => p.forEach((c, j) => buf.writeFloatLE(c, off + 12 + 12 * k + 4 * j)));
  });
  return buf;
}

export function asciiStl(triangles: Tri[]): Buffer {
  const facets = triangles.map(
    (t) => `  facet normal 0 0 0\n    outer loop\n${t.map((p) => `      vertex ${p.join(' ')}`).join('\n')}\n    endloop\n  endfacet`,
  );
  return Buffer.from(`solid cube\n${facets.join('\n')}\nendsolid cube\n`, 'ascii');
}
