import { MAX_PRIMITIVES } from '../../schemas/part-document';
import { validatePartDocument } from './validate-part-document';

const good = () => ({
  name: 'Test rod',
  primitives: [{ id: 'shaft', shape: 'cylinder', radius: 0.01, length: 0.5, density: 700 }] as Record<string, unknown>[],
  spin: { axis: [1, 0, 0], rate: 10 } as Record<string, unknown>,
});

function errorsOf(doc: unknown) {
  const r = validatePartDocument(doc);
  if (r.ok) throw new Error('expected the document to be refused');
  return r.errors;
}

describe('validatePartDocument (PRODUCT.md list of bad documents)', () => {
  it('accepts a good document and fills defaults (position, rotation, mode, misalignment, dissipative)', () => {
    const r = validatePartDocument(good());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.primitives[0].position).toEqual([0, 0, 0]);
    expect(r.value.primitives[0].mode).toBe('add');
    expect(r.value.spin.misalignmentDeg).toBe(1);
    expect(r.value.dissipative).toBe(false);
  });

  it.each([
    ['unknown shape', (d: ReturnType<typeof good>) => (d.primitives[0].shape = 'hexagon'), 'primitives[0].shape'],
    ['zero size', (d: ReturnType<typeof good>) => (d.primitives[0].radius = 0), 'primitives[0].radius'],
    ['negative size', (d: ReturnType<typeof good>) => (d.primitives[0].length = -1), 'primitives[0].length'],
    ['inner ≥ outer radius', (d: ReturnType<typeof good>) => (d.primitives[0].innerRadius = 0.01), 'primitives[0].innerRadius'],
    ['NaN', (d: ReturnType<typeof good>) => (d.primitives[0].density = NaN), 'primitives[0].density'],
    ['Infinity', (d: ReturnType<typeof good>) => (d.primitives[0].position = [0, Infinity, 0]), 'primitives[0].position[1]'],
    ['non-unit axis', (d: ReturnType<typeof good>) => (d.spin.axis = [1, 1, 0]), 'spin.axis'],
    ['zero axis', (d: ReturnType<typeof good>) => (d.spin.axis = [0, 0, 0]), 'spin.axis'],
    ['no material', (d: ReturnType<typeof good>) => delete d.primitives[0].density, 'primitives[0].density'],
    ['two materials', (d: ReturnType<typeof good>) => (d.primitives[0].mass = 0.2), 'primitives[0].mass'],
    ['a misspelt field', (d: ReturnType<typeof good>) => (d.primitives[0].innerRadus = 0.002), 'primitives[0]'],
    ['unit slip (a radius of 13.5 m as if mm)', (d: ReturnType<typeof good>) => (d.primitives[0].radius = 135), 'primitives[0].radius'],
    ['zero spin rate', (d: ReturnType<typeof good>) => (d.spin.rate = 0), 'spin.rate'],
  ])('refuses %s and names the field', (_what, mutate, path) => {
    const d = good();
    mutate(d);
    expect(errorsOf(d).map((e) => e.path)).toContain(path);
  });

  it('refuses too many primitives, an empty list, duplicate ids and a part made only of removals', () => {
    const many = good();
    many.primitives = Array.from({ length: MAX_PRIMITIVES + 1 }, (_, i) => ({ id: `p${i}`, shape: 'sphere', radius: 0.01, density: 1 }));
    expect(errorsOf(many)[0].path).toBe('primitives');
    const none = good();
    none.primitives = [];
    expect(errorsOf(none)[0].path).toBe('primitives');
    const dup = good();
    dup.primitives.push({ ...dup.primitives[0] });
    expect(errorsOf(dup)[0].path).toBe('primitives[1].id');
    const removals = good();
    removals.primitives[0].mode = 'remove';
    expect(errorsOf(removals)[0].path).toBe('primitives');
  });

  it('checks shape rules: hollow box wall, torus radii, point mass material, inline mesh indices', () => {
    const d = good();
    d.primitives = [
      { id: 'b', shape: 'box', size: [0.1, 0.1, 0.02], wall: 0.01, density: 1 },
      { id: 't', shape: 'torus', majorRadius: 0.01, minorRadius: 0.02, density: 1 },
      { id: 'p', shape: 'point', density: 3 },
      {
        id: 'm',
        shape: 'mesh',
        vertices: [
          [0, 0, 0],
          [1, 0, 0],
          [0, 1, 0],
        ],
        triangles: [[0, 1, 3]],
        density: 1,
      },
    ];
    const paths = errorsOf(d).map((e) => e.path);
    expect(paths).toEqual(
      expect.arrayContaining([
        'primitives[0].wall',
        'primitives[1].minorRadius',
        'primitives[2].mass',
        'primitives[2].density',
        'primitives[3].triangles[0][2]',
      ]),
    );
  });

  it('grip: the face normal must be perpendicular to the long axis', () => {
    const d = { ...good(), grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 0.6, 0.8] } };
    expect(errorsOf(d).map((e) => e.path)).toContain('grip.faceNormal');
  });

  it('never throws, whatever it is given', () => {
    for (const x of [null, undefined, 42, 'text', [], { primitives: 'x' }, { primitives: [null] }])
      expect(validatePartDocument(x).ok).toBe(false);
  });
});
