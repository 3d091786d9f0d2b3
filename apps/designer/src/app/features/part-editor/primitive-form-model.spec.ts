import { unit } from 'mathjs';
import { displayToSi, EDITOR_UNITS, siToDisplay } from './display-value';
import { documentIssues } from './document-issues';
import type { DraftDocument, DraftPrimitive } from './draft-document';
import { formValueToPrimitive, numericControls, primitiveToFormValue } from './primitive-form-model';

// References: SI Brochure (BIPM, 9th ed.): 1 mm = 10⁻³ m, 1 g = 10⁻³ kg exactly; one revolution is
// 2π rad (definition of the radian). mathjs's own unit system is the second, independent reference.
const HANDLE: DraftPrimitive = {
  id: 'grip',
  shape: 'cylinder',
  radius: 0.0135,
  length: 0.19,
  position: [0, 0, 0.095],
  rotationDeg: [0, 0, 0],
  density: 650,
  mode: 'add',
  tolerance: { density: 0.05 },
};

function documentWith(primitive: DraftPrimitive): DraftDocument {
  return { primitives: [primitive], spin: { axis: [1, 0, 0], rate: 31.4, misalignmentDeg: 1 } };
}

describe('display units of the editor', () => {
  it('shows metres as millimetres and grams without binary noise (SI Brochure: 1 mm = 0.001 m)', () => {
    expect(siToDisplay(0.0135, EDITOR_UNITS.length)).toBe(13.5);
    expect(siToDisplay(0.003, EDITOR_UNITS.mass)).toBe(3);
    expect(siToDisplay(null, EDITOR_UNITS.length)).toBeNull();
  });

  it('converts typed millimetres back to metres, agreeing with mathjs', () => {
    expect(displayToSi(13.5, EDITOR_UNITS.length)).toBeCloseTo(unit(13.5, 'mm').toNumber('m'), 15);
    expect(displayToSi('190', EDITOR_UNITS.length)).toBeCloseTo(0.19, 15);
    expect(displayToSi('', EDITOR_UNITS.length)).toBeNull();
    expect(displayToSi('abc', EDITOR_UNITS.length)).toBeNull();
  });

  it('shows rad/s as rev/s: 1 rev = 2π rad, so 10π rad/s is 5 rev/s', () => {
    expect(siToDisplay(10 * Math.PI, EDITOR_UNITS.rate)).toBe(5);
    expect(displayToSi(5, EDITOR_UNITS.rate)).toBeCloseTo(10 * Math.PI, 12);
  });
});

describe('the primitive form model', () => {
  it('shows a cylinder in mm, kg/m³ and degrees', () => {
    const value = primitiveToFormValue(HANDLE);
    expect(value).toMatchObject({
      id: 'grip',
      mode: 'add',
      source: 'density',
      density: 650,
      radius: 13.5,
      length: 190,
      position_2: 95,
      rotation_0: 0,
    });
  });

  it('round-trips a primitive and keeps the fields the form does not show (tolerance)', () => {
    const back = formValueToPrimitive(primitiveToFormValue(HANDLE), HANDLE);
    expect(back).toEqual(HANDLE);
  });

  it('converts an edited radius to metres', () => {
    const value = { ...primitiveToFormValue(HANDLE), radius: 15 };
    expect(formValueToPrimitive(value, HANDLE)['radius']).toBeCloseTo(0.015, 15);
  });

  it('leaves an empty optional field out and keeps an empty required one as null for the schema to name', () => {
    const value = { ...primitiveToFormValue(HANDLE), innerRadius: null, length: null };
    const back = formValueToPrimitive(value, HANDLE);
    expect('innerRadius' in back).toBe(false);
    expect(back['length']).toBeNull();
    expect(documentIssues(documentWith(back))['primitives[0].length']).toBe('must be a number');
  });

  it('writes exactly one of density, material and mass', () => {
    const base = primitiveToFormValue(HANDLE);
    const byMaterial = formValueToPrimitive({ ...base, source: 'material', materialId: 'ash-id' }, HANDLE);
    expect(byMaterial).toMatchObject({ materialId: 'ash-id' });
    expect('density' in byMaterial || 'mass' in byMaterial).toBe(false);
    const byMass = formValueToPrimitive({ ...base, source: 'mass', mass: 42 }, HANDLE);
    expect(byMass['mass']).toBeCloseTo(0.042, 15);
    expect('density' in byMass || 'materialId' in byMass).toBe(false);
  });

  it('asks for a material when "material" is chosen without one', () => {
    const back = formValueToPrimitive({ ...primitiveToFormValue(HANDLE), source: 'material', materialId: null }, HANDLE);
    expect(documentIssues(documentWith(back))['primitives[0].materialId']).toBe('is required');
  });

  it('gives a box three size controls and a point mass only its mass', () => {
    expect(
      numericControls('box')
        .slice(0, 4)
        .map((c) => c.path),
    ).toEqual(['size[0]', 'size[1]', 'size[2]', 'wall']);
    const point: DraftPrimitive = { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.5] };
    const value = primitiveToFormValue(point);
    expect(value).toMatchObject({ source: 'mass', mass: 3, position_0: 110, position_2: 500 });
    expect(formValueToPrimitive({ ...value, mass: 5 }, point)).toEqual({
      id: 'tape',
      shape: 'point',
      mass: 0.005,
      position: [0.11, 0, 0.5],
      rotationDeg: [0, 0, 0],
      mode: 'add',
    });
  });

  it('refuses a negative radius at its field with the shared schema rule', () => {
    const back = formValueToPrimitive({ ...primitiveToFormValue(HANDLE), radius: -2 }, HANDLE);
    expect(documentIssues(documentWith(back))).toEqual({ 'primitives[0].radius': 'must be greater than zero' });
  });

  it('refuses an inner radius not smaller than the radius', () => {
    const back = formValueToPrimitive({ ...primitiveToFormValue(HANDLE), innerRadius: 14 }, HANDLE);
    expect(documentIssues(documentWith(back))['primitives[0].innerRadius']).toBe('must be less than radius');
  });

  it('keeps a mesh primitive’s uploaded mesh and scale, and takes the one the picker chooses', () => {
    const scan: DraftPrimitive = {
      id: 'head',
      shape: 'mesh',
      meshId: 'mesh-a',
      scale: 0.001,
      position: [0, 0, 0.4],
      rotationDeg: [0, 0, 0],
      density: 1150,
      mode: 'add',
    };
    const value = primitiveToFormValue(scan);
    expect(value).toMatchObject({ meshId: 'mesh-a', scale: 0.001, position_2: 400 });
    expect(formValueToPrimitive(value, scan)).toEqual(scan);
    expect(formValueToPrimitive({ ...value, meshId: 'mesh-b' }, scan)['meshId']).toBe('mesh-b');
    // No mesh chosen: the reference is left out (the engine then asks for one); a cleared scale is null for the schema to name.
    const cleared = formValueToPrimitive({ ...value, meshId: '', scale: '' }, scan);
    expect('meshId' in cleared).toBe(false);
    expect(documentIssues(documentWith(cleared))['primitives[0].scale']).toBeDefined();
  });
});
