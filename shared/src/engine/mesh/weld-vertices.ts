/**
 * Welds a triangle soup (9 coordinates per triangle, as an STL stores it) into an indexed mesh by
 * exact coordinate equality — STL writers repeat a shared corner bit for bit, so exact welding
 * recovers the topology without a tolerance that could merge distinct corners.
 * Open-addressing hash table on the float bit patterns; no per-vertex allocation.
 * Returns the unique vertices (3 per vertex) and the triangle indices (3 per triangle).
 */
export function weldVertices(corners: Float32Array | Float64Array, count: number): { vertices: Float64Array; triangles: Uint32Array } {
  const nCorners = count * 3;
  let size = 1;
  while (size < 2 * nCorners) size <<= 1;
  const mask = size - 1;
  const slots = new Int32Array(size).fill(-1);
  const vertices = new Float64Array(nCorners * 3);
  const triangles = new Uint32Array(nCorners);
  const f = new Float64Array(1);
  const bits = new Uint32Array(f.buffer);
  let nv = 0;
  for (let i = 0; i < nCorners; i++) {
    const x = corners[3 * i],
      y = corners[3 * i + 1],
      z = corners[3 * i + 2];
    // Normalise −0 to +0 so the two zeros weld.
    f[0] = x + 0;
    let h = Math.imul(bits[0] ^ bits[1], 0x9e3779b1);
    f[0] = y + 0;
    h = Math.imul(h ^ bits[0] ^ (bits[1] * 31), 0x85ebca6b);
    f[0] = z + 0;
    h = Math.imul(h ^ bits[0] ^ (bits[1] * 17), 0xc2b2ae35);
    h ^= h >>> 15;
    let s = h & mask;
    for (;;) {
      const k = slots[s];
      if (k < 0) {
        slots[s] = nv;
        vertices[3 * nv] = x;
        vertices[3 * nv + 1] = y;
        vertices[3 * nv + 2] = z;
        triangles[i] = nv++;
        break;
      }
      if (vertices[3 * k] === x && vertices[3 * k + 1] === y && vertices[3 * k + 2] === z) {
        triangles[i] = k;
        break;
      }
      s = (s + 1) & mask;
    }
  }
  return { vertices: vertices.subarray(0, 3 * nv), triangles };
}
