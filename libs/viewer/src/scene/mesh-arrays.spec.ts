import { BufferGeometry, Float32BufferAttribute } from 'three';
import { flatNormals, meshArraysFromData } from './mesh-arrays';

// Reference: three.js's own computeVertexNormals, which gives a geometry without an index one flat
// normal per triangle on all three corners.
function threeNormals(positions: Float32Array): Float32Array {
  const g = new BufferGeometry();
  g.setAttribute('position', new Float32BufferAttribute(Float32Array.from(positions), 3));
  g.computeVertexNormals();
  return g.getAttribute('normal').array as Float32Array;
}

describe('flatNormals', () => {
  it('gives the normals three.js computes for a triangle soup, a degenerate triangle included', () => {
    const positions = new Float32Array([
      0,
      0,
      0,
      1,
      0,
      0,
      0,
      1,
      0, // in the xy plane, counter-clockwise: +z
      0,
      0,
      0,
      0,
      0,
      2,
      3,
      0,
      0, // in the xz plane
      0.3,
      -1.2,
      4,
      2.5,
      0.7,
      -0.4,
      -1,
      2,
      1.5, // skewed
      1,
      1,
      1,
      2,
      2,
      2,
      3,
      3,
      3, // on one line: no normal
    ]);
    const ours = flatNormals(positions),
      theirs = threeNormals(positions);
    expect(ours).toHaveLength(theirs.length);
    ours.forEach((n, i) => expect(n).toBeCloseTo(theirs[i], 6));
    expect(Array.from(ours.slice(0, 3))).toEqual([0, 0, 1]);
    expect(Array.from(ours.slice(27, 30))).toEqual([0, 0, 0]);
  });
});

describe('meshArraysFromData', () => {
  it('scales the corners and gives a normal per corner', () => {
    const { positions, normals } = meshArraysFromData(new Float32Array([0, 0, 0, 10, 0, 0, 0, 10, 0]), 0.001);
    expect(Array.from(positions)).toEqual([0, 0, 0, Math.fround(0.01), 0, 0, 0, Math.fround(0.01), 0]);
    expect(normals).toHaveLength(9);
  });

  it('names the STL reader’s finding for a file that is not STL', () => {
    expect(() => meshArraysFromData(new TextEncoder().encode('not a mesh at all').buffer as ArrayBuffer, 1)).toThrow(
      /could not be read as STL: .+/,
    );
  });
});
