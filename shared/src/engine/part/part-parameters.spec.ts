import { MAX_PARAMETERS, partDocumentInputOf, type PartDocument, type PartDocumentInput } from '../../schemas/part-document';
import { analyzeValidatedPart } from '../report/analyze-part';
import { expectRelClose } from '../testing/expect-close';
import { partMassProperties } from './part-mass-properties';
import { validatePartDocument } from './validate-part-document';

// References:
// - Machinery's Handbook, "Volumes of solids": rectangular prism V = a·b·c; torus V = 2π²·R·r²
//   (R the radius of the ring's centre line, r the radius of its section); cylinder V = π·r²·h.
// - Machinery's Handbook, "Moments of inertia": rectangular prism about its central axis parallel
//   to c, I = m·(a² + b²)/12.

function valid(doc: unknown): PartDocument {
  const v = validatePartDocument(doc);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

function errorsOf(doc: unknown): Record<string, string> {
  const v = validatePartDocument(doc);
  if (v.ok) throw new Error('expected the document to be refused');
  return Object.fromEntries(v.errors.map((e) => [e.path, e.message]));
}

const spin = { axis: [0, 0, 1] as [number, number, number], rate: 20 };
const RHO = 2700;
// Two invented bars of a Kestrel Bay practice frame whose length is one parameter.
const twoBars = (length: number): PartDocumentInput => ({
  name: 'Kestrel Bay frame',
  parameters: { barLength: length },
  primitives: [
    { id: 'left', shape: 'box', size: [0.02, 0.03, { param: 'barLength' }], density: RHO, position: [-0.1, 0, 0] },
    { id: 'right', shape: 'box', size: [0.04, 0.01, { param: 'barLength' }], density: RHO, position: [0.1, 0, 0] },
  ],
  spin,
});

describe('named parameters in the part document', () => {
  it('moves every primitive that refers to a parameter: two bars of one length, m = ρ·a·b·L each (Machinery’s Handbook)', () => {
    for (const L of [0.3, 0.45]) {
      const doc = valid(twoBars(L));
      expect(doc.primitives[0].shape === 'box' && doc.primitives[0].size[2]).toBe(L);
      expect(doc.primitives[1].shape === 'box' && doc.primitives[1].size[2]).toBe(L);
      const mp = partMassProperties(doc);
      expectRelClose(mp.pieces[0].body.mass, RHO * 0.02 * 0.03 * L, 1e-12, `left bar mass at L = ${L}`);
      expectRelClose(mp.pieces[1].body.mass, RHO * 0.04 * 0.01 * L, 1e-12, `right bar mass at L = ${L}`);
      const report = analyzeValidatedPart(doc);
      expectRelClose(report.mass, RHO * (0.02 * 0.03 + 0.04 * 0.01) * L, 1e-12, `part mass at L = ${L}`);
    }
  });

  it('gives the same report as the document written with plain numbers', () => {
    const L = 0.37;
    const byParameter = analyzeValidatedPart(valid(twoBars(L)));
    const plain = analyzeValidatedPart(
      valid({
        primitives: [
          { id: 'left', shape: 'box', size: [0.02, 0.03, L], density: RHO, position: [-0.1, 0, 0] },
          { id: 'right', shape: 'box', size: [0.04, 0.01, L], density: RHO, position: [0.1, 0, 0] },
        ],
        spin,
      }),
    );
    expect(byParameter.mass).toBe(plain.mass);
    expect(byParameter.inertia).toEqual(plain.inertia);
    // Each bar about its own axis parallel to c: I = m(a² + b²)/12 (Machinery's Handbook); the
    // bars sit on the z axis of the part at x = ±0.1, so I_zz adds m·d² for each (parallel-axis theorem).
    const mL = RHO * 0.02 * 0.03 * L,
      mR = RHO * 0.04 * 0.01 * L;
    const zBar = (mL * -0.1 + mR * 0.1) / (mL + mR);
    const izz =
      (mL * (0.02 ** 2 + 0.03 ** 2)) / 12 + mL * (-0.1 - zBar) ** 2 + (mR * (0.04 ** 2 + 0.01 ** 2)) / 12 + mR * (0.1 - zBar) ** 2;
    expectRelClose(byParameter.inertia[2][2], izz, 1e-9, 'I_zz about the centre of mass');
  });

  it('applies scale and offset: majorRadius = 2·r + 0.01 and a position that follows −r; torus V = 2π²·R·r² (Machinery’s Handbook)', () => {
    const r = 0.05;
    const doc = valid({
      parameters: { r, tube: 0.008 },
      primitives: [
        {
          id: 'hoop',
          shape: 'torus',
          majorRadius: { param: 'r', scale: 2, offset: 0.01 },
          minorRadius: { param: 'tube' },
          position: [0, { param: 'r', scale: -1 }, 0],
          density: 1200,
        },
      ],
      spin,
    });
    const hoop = doc.primitives[0];
    if (hoop.shape !== 'torus') throw new Error('expected the torus');
    expect(hoop.majorRadius).toBeCloseTo(2 * r + 0.01, 15);
    expect(hoop.minorRadius).toBe(0.008);
    expect(hoop.position).toEqual([0, -r, 0]);
    expect(hoop.refs).toEqual({
      majorRadius: { param: 'r', scale: 2, offset: 0.01 },
      minorRadius: { param: 'tube', scale: 1, offset: 0 },
      'position.1': { param: 'r', scale: -1, offset: 0 },
    });
    const R = 2 * r + 0.01;
    expectRelClose(analyzeValidatedPart(doc).mass, 1200 * 2 * Math.PI ** 2 * R * 0.008 ** 2, 1e-12, 'torus mass');
  });

  it('refuses a reference to an unknown parameter at the field’s path', () => {
    const doc = twoBars(0.3) as { primitives: Record<string, unknown>[] };
    doc.primitives.push({ id: 'hoop', shape: 'torus', majorRadius: { param: 'hoopRadius' }, minorRadius: 0.01, density: 1000 });
    expect(errorsOf(doc)).toEqual({ 'primitives[2].majorRadius': 'refers to an unknown parameter "hoopRadius"' });
    const none = { primitives: [{ id: 'a', shape: 'cylinder', radius: 0.01, length: { param: 'len' }, density: 1 }], spin };
    expect(errorsOf(none)['primitives[0].length']).toBe('refers to an unknown parameter "len"');
  });

  it('checks a resolved value by the field’s usual rules, at the same path', () => {
    const negative = errorsOf({
      parameters: { r: 0.02 },
      primitives: [{ id: 'rod', shape: 'cylinder', radius: { param: 'r', offset: -0.05 }, length: 0.3, density: 700 }],
      spin,
    });
    expect(Object.keys(negative)).toEqual(['primitives[0].radius']);
    expect(negative['primitives[0].radius']).toMatch(/^must be greater than zero \(it is -0\.03\d* from the parameter "r"\)$/);
    // Unit slip guard: a radius of 135 m.
    expect(
      errorsOf({ parameters: { r: 135 }, primitives: [{ id: 'rod', shape: 'sphere', radius: { param: 'r' }, density: 700 }], spin })[
        'primitives[0].radius'
      ],
    ).toMatch(/^must be at most 100 m/);
    // Relations between fields hold for resolved values: a bore as large as the radius.
    expect(
      errorsOf({
        parameters: { r: 0.01 },
        primitives: [{ id: 'tube', shape: 'cylinder', radius: { param: 'r' }, innerRadius: 0.01, length: 0.3, density: 700 }],
        spin,
      }),
    ).toEqual({ 'primitives[0].innerRadius': 'must be less than radius' });
    // A capsule's straight length may be 0 (a sphere), a cylinder's may not.
    const zero = { parameters: { len: 0 }, spin };
    expect(
      validatePartDocument({ ...zero, primitives: [{ id: 'c', shape: 'capsule', radius: 0.01, length: { param: 'len' }, density: 1 }] }).ok,
    ).toBe(true);
    expect(
      errorsOf({ ...zero, primitives: [{ id: 'c', shape: 'cylinder', radius: 0.01, length: { param: 'len' }, density: 1 }] })[
        'primitives[0].length'
      ],
    ).toMatch(/^must be greater than zero/);
  });

  it('refuses bad parameter names, too many parameters, non-numbers and broken references, naming each', () => {
    const errors = errorsOf({
      parameters: { '9lives': 1, ok: 'x' },
      primitives: [{ id: 'rod', shape: 'cylinder', radius: { param: 7 }, length: { param: 'ok', factor: 2 }, density: 700 }],
      spin,
    });
    expect(errors['parameters.ok']).toBe('must be a number');
    expect(errors['primitives[0].radius']).toBe('is a parameter reference whose param must be the name of a parameter');
    expect(errors['primitives[0].length']).toMatch(/unknown key factor/);
    expect(
      errorsOf({ parameters: { '9lives': 1 }, primitives: [{ id: 'rod', shape: 'sphere', radius: 0.01, density: 1 }], spin })[
        'parameters.9lives'
      ],
    ).toMatch(/not a valid parameter name/);
    const many = Object.fromEntries(Array.from({ length: MAX_PARAMETERS + 1 }, (_, i) => [`p${i}`, i]));
    expect(errorsOf({ parameters: many, primitives: [{ id: 'rod', shape: 'sphere', radius: 0.01, density: 1 }], spin })['parameters']).toBe(
      `must hold at most ${MAX_PARAMETERS} parameters (it holds ${MAX_PARAMETERS + 1})`,
    );
    // A field that is neither a number nor a reference keeps the plain message.
    expect(errorsOf({ primitives: [{ id: 'rod', shape: 'sphere', radius: 'big', density: 1 }], spin })['primitives[0].radius']).toBe(
      'must be a number',
    );
  });

  it('round-trips: the validated document validates to itself, and partDocumentInputOf gives back the references', () => {
    const input = twoBars(0.3);
    const doc = valid(input);
    expect(doc.parameters).toEqual({ barLength: 0.3 });
    expect(doc.primitives[0].refs).toEqual({ 'size.2': { param: 'barLength', scale: 1, offset: 0 } });
    // Stored as JSON and sent back as it is.
    const again = valid(JSON.parse(JSON.stringify(doc)));
    expect(again).toEqual(doc);
    // As a client writes it: the reference back in its field, no refs.
    const written = partDocumentInputOf(doc);
    expect(written.primitives[0]).not.toHaveProperty('refs');
    expect(written.primitives[0]).toMatchObject({ size: [0.02, 0.03, { param: 'barLength' }] });
    expect(valid(written)).toEqual(doc);
    // A parameter changed in the validated form moves every field that follows it.
    const moved = valid({ ...JSON.parse(JSON.stringify(doc)), parameters: { barLength: 0.5 } });
    expect(moved.primitives.map((p) => p.shape === 'box' && p.size[2])).toEqual([0.5, 0.5]);
    // A document without references is returned as validated before (no refs, no parameters).
    const plain = valid({ primitives: [{ id: 'rod', shape: 'sphere', radius: 0.01, density: 1 }], spin });
    expect(plain.primitives[0]).not.toHaveProperty('refs');
    expect(partDocumentInputOf(plain)).toBe(plain);
  });

  it('refuses a refs entry that does not fit its primitive', () => {
    const errors = errorsOf({
      parameters: { a: 0.02 },
      primitives: [
        {
          id: 'rod',
          shape: 'cylinder',
          radius: { param: 'a' },
          length: 0.3,
          density: 700,
          refs: { radius: { param: 'a' }, majorRadius: { param: 'a' }, innerRadius: { param: 'a' } },
        },
      ],
      spin,
    });
    expect(errors['primitives[0].refs.radius']).toMatch(/repeats the reference written in radius/);
    expect(errors['primitives[0].refs.majorRadius']).toBe('names majorRadius, which a cylinder does not have');
    expect(errors['primitives[0].refs.innerRadius']).toMatch(/names innerRadius, which this primitive does not give/);
  });
});
