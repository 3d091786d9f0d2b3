import { boxMesh, sphereMesh, torusMesh } from '../../../shared/src/engine/testing/tessellate';
import { firstSelfIntersection, selfIntersectionProblem } from './self-intersection';

type Indexed = { vertices: Float64Array; triangles: Uint32Array };

/** Two indexed meshes as one (the second's vertex numbers shifted past the first's). */
function together(a: Indexed, b: Indexed): Indexed {
  const shift = a.vertices.length / 3;
  return {
    vertices: Float64Array.from([...a.vertices, ...b.vertices]),
    triangles: Uint32Array.from([...a.triangles, ...Array.from(b.triangles, (i) => i + shift)]),
  };
}

describe('a surface that crosses itself', () => {
  // Each tessellation is a closed surface without crossings by construction (vertices on a sphere,
  // a torus or a box, joined in rings): geometry, not a measured value.
  it.each<[string, Indexed]>([
    ['a box', boxMesh(0.04, 0.03, 0.2)],
    ['a sphere of 8 064 triangles', sphereMesh(0.05, 64, 64)],
    ['a torus', torusMesh(0.1, 0.02, 48, 16)],
    ['two boxes apart', together(boxMesh(1, 1, 1), boxMesh(1, 1, 1, [3, 0, 0]))],
  ])('is not found in %s', async (_name, mesh) => {
    await expect(firstSelfIntersection(mesh.vertices, mesh.triangles)).resolves.toBeNull();
  });

  it('is found where two boxes pass through each other, one facet of each', async () => {
    const mesh = together(boxMesh(1, 1, 1), boxMesh(1, 1, 1, [0.5, 0.3, 0.2]));
    const pair = await firstSelfIntersection(mesh.vertices, mesh.triangles);
    expect(pair).not.toBeNull();
    const [i, j] = pair!;
    expect(i).toBeLessThan(12); // a box has 12 triangles: the first is the first box's,
    expect(j).toBeGreaterThanOrEqual(12); // the second the other's
    expect(selfIntersectionProblem(pair!)).toMatchObject({
      code: 'self_intersecting',
      firstTriangle: i,
      message: expect.stringContaining(`facets ${i + 1} and ${j + 1}`),
    });
  });

  it('names the crossing facets by their place in the file, whatever order the tree keeps them in', async () => {
    // A small tetrahedron poking out through the +x face of a unit box: boxMesh lists its faces
    // −x, +x, −y, +y, −z, +z, two triangles each, so the +x face is triangles 2 and 3; the
    // tetrahedron's four follow the box's twelve.
    const tetra: Indexed = {
      vertices: Float64Array.from([0.4, 0.1, 0.1, 0.4, 0.25, 0.1, 0.4, 0.1, 0.25, 0.6, 0.15, 0.15]),
      triangles: Uint32Array.from([0, 2, 1, 0, 1, 3, 1, 2, 3, 2, 0, 3]),
    };
    const mesh = together(boxMesh(1, 1, 1), tetra);
    const [i, j] = (await firstSelfIntersection(mesh.vertices, mesh.triangles))!;
    expect([2, 3]).toContain(i);
    expect(j).toBeGreaterThanOrEqual(12);
    expect(j).toBeLessThan(16);
  });

  it('is found where a sphere sits half inside a box', async () => {
    const mesh = together(boxMesh(0.1, 0.1, 0.1), sphereMesh(0.03, 24, 24));
    for (let k = 0; k < mesh.vertices.length; k += 3) if (k >= 8 * 3) mesh.vertices[k] += 0.05; // the sphere's centre onto the box's +x face
    await expect(firstSelfIntersection(mesh.vertices, mesh.triangles)).resolves.not.toBeNull();
  });
});
