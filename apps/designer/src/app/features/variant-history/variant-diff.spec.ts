import { diffDocuments, flattenLeaves } from './variant-diff';

const V1 = {
  name: 'Junior racket',
  primitives: [
    { id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, position: [0, 0, 0.095], density: 650 },
    { id: 'bore', shape: 'cylinder', radius: 0.008, length: 0.17, position: [0, 0, 0.095], density: 650, mode: 'remove' },
    { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
  ],
  spin: { axis: [1, 0, 0], rate: 31.4 },
};

describe('diffDocuments', () => {
  it('finds nothing between a document and itself, and treats absent defaults as equal', () => {
    const withDefaults = {
      ...V1,
      dissipative: false,
      spin: { ...V1.spin, misalignmentDeg: 1 },
      primitives: V1.primitives.map((p) => ({ rotationDeg: [0, 0, 0], mode: 'add', ...p })),
    };
    expect(diffDocuments(V1, withDefaults)).toEqual({ primitives: [], settings: [], same: true });
  });

  it('lists added, removed and changed primitives with the fields that changed', () => {
    const v2 = {
      ...V1,
      primitives: [
        { ...V1.primitives[0], radius: 0.014 },
        { ...V1.primitives[2], size: [0.4, 0.015, 0.12] },
        { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.42] },
      ],
    };
    const diff = diffDocuments(V1, v2);
    expect(diff.same).toBe(false);
    expect(diff.primitives).toEqual([
      { id: 'grip', shape: 'cylinder', change: 'changed', fields: [{ path: 'radius', before: 0.0135, after: 0.014 }] },
      { id: 'bore', shape: 'cylinder', change: 'removed', fields: [] },
      { id: 'throat', shape: 'box', change: 'changed', fields: [{ path: 'size[0]', before: 0.02, after: 0.4 }] },
      { id: 'tape', shape: 'point', change: 'added', fields: [] },
    ]);
  });

  it('reports a primitive moved in the list, with its places', () => {
    const v2 = { ...V1, primitives: [V1.primitives[2], V1.primitives[0], V1.primitives[1]] };
    const moved = diffDocuments(V1, v2).primitives.filter((p) => p.change === 'moved');
    expect(moved.map((p) => [p.id, p.from, p.to])).toContainEqual(['throat', 2, 0]);
  });

  it('lists the part-wide changes by path', () => {
    const v2 = {
      ...V1,
      spin: { axis: [0, 0, 1], rate: 31.4 },
      dissipative: true,
      grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
    };
    const paths = diffDocuments(V1, v2).settings.map((f) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['spin.axis[0]', 'spin.axis[2]', 'dissipative', 'grip.point[0]', 'grip.faceNormal[1]']));
    expect(paths).not.toContain('spin.rate');
  });

  it('compares long inline meshes whole', () => {
    const vertices = Array.from({ length: 20 }, (_, i) => [i, 0, 0]);
    const leaves = flattenLeaves({ vertices });
    expect([...leaves.keys()]).toEqual(['vertices']);
  });
});
