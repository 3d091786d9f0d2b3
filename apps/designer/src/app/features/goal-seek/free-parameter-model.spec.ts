import { partDocumentSchema, type Primitive } from '@tumblewise/shared';
import {
  boundsProblems,
  defaultBoundsSi,
  freeRequest,
  parameterFieldsOf,
  primitiveParameters,
  type ParameterField,
} from './free-parameter-model';

// Invented primitives of a practice baton (SI in the document). Unit factors are the SI definitions of the
// millimetre (1e-3 m) and the gram (1e-3 kg), NIST Special Publication 811 (2008), Appendix B.8.
const doc = partDocumentSchema.parse({
  name: 'Harbour practice baton',
  primitives: [
    { id: 'handle', shape: 'cylinder', radius: 0.0135, length: 0.19, position: [0, 0, 0.095], density: 650 },
    { id: 'bore', shape: 'cylinder', radius: 0.008, innerRadius: 0.0079, length: 0.17, position: [0, 0, 0.095], density: 650 },
    { id: 'nose', shape: 'cone', radius: 0.02, length: 0.05, position: [0, 0, 0.3], materialId: 'mat-1' },
    { id: 'weight', shape: 'point', mass: 0.012, position: [0, 0, 0.05] },
    { id: 'plate', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], mass: 0.05 },
  ],
  spin: { axis: [1, 0, 0], rate: 12 },
});
const byId = (id: string) => doc.primitives.find((p) => p.id === id)!;
const field = (id: string, parameter: string) => parameterFieldsOf(byId(id)).find((f) => f.parameter === parameter)!;

describe('free parameters of a primitive', () => {
  it('lists the fields the solver can vary with the editor’s labels and units, values in mm, g and kg/m³', () => {
    const handle = parameterFieldsOf(byId('handle'));
    expect(handle.map((f) => [f.parameter, f.label, f.units.unit, f.value])).toEqual([
      ['density', 'Density', 'kg/m³', 650],
      ['radius', 'Radius', 'mm', 13.5],
      ['innerRadius', 'Inner radius', 'mm', 0],
      ['length', 'Length', 'mm', 190],
      ['position.0', 'Position x', 'mm', 0],
      ['position.1', 'Position y', 'mm', 0],
      ['position.2', 'Position z', 'mm', 95],
    ]);
    // A cone's radius is its base radius in the editor; a material's density is not the primitive's to vary.
    const nose = parameterFieldsOf(byId('nose'));
    expect(nose.find((f) => f.parameter === 'radius')!.label).toBe('Base radius');
    expect(nose.map((f) => f.parameter)).not.toContain('density');
    expect(nose.map((f) => f.parameter)).not.toContain('mass');
    // A point mass: its mass in grams and its position.
    expect(parameterFieldsOf(byId('weight')).map((f) => [f.parameter, f.label, f.units.unit, f.value])).toEqual([
      ['mass', 'Mass', 'g', 12],
      ['position.0', 'Position x', 'mm', 0],
      ['position.1', 'Position y', 'mm', 0],
      ['position.2', 'Position z', 'mm', 50],
    ]);
    // A box given by its mass: mass, no wall (solid), then the three edges.
    expect(parameterFieldsOf(byId('plate')).map((f) => f.label)).toEqual([
      'Mass',
      'Position x',
      'Position y',
      'Position z',
      'Size x',
      'Size y',
      'Size z',
    ]);
  });

  it('offers ±20 % of the value as default bounds, in display units', () => {
    expect([field('handle', 'radius').defaultMin, field('handle', 'radius').defaultMax]).toEqual([10.8, 16.2]);
    expect([field('handle', 'density').defaultMin, field('handle', 'density').defaultMax]).toEqual([520, 780]);
    expect([field('weight', 'mass').defaultMin, field('weight', 'mass').defaultMax]).toEqual([9.6, 14.4]);
    expect([field('handle', 'position.2').defaultMin, field('handle', 'position.2').defaultMax]).toEqual([76, 114]);
  });

  it('keeps default bounds valid: a position at 0 gets ±20 mm, an absent bore 0 to half the radius, a bore stays under its radius', () => {
    expect(defaultBoundsSi(byId('handle'), 'position.0')).toEqual({ min: -0.02, max: 0.02 });
    expect(defaultBoundsSi(byId('handle'), 'innerRadius')).toEqual({ min: 0, max: 0.00675 });
    const bore = defaultBoundsSi(byId('bore'), 'innerRadius');
    expect(bore.max).toBeLessThan(0.008);
    expect(bore.min).toBeCloseTo(0.0079 * 0.8, 12);
    // The lower bound of a field that must be above zero never reaches zero.
    expect(field('handle', 'radius').lowerOpen).toBe(true);
    expect(field('handle', 'position.2').lowerOpen).toBe(false);
  });

  it('leaves out a field that follows a named parameter of the part', () => {
    const following = { ...byId('handle'), refs: { radius: { param: 'gripRadius', scale: 1, offset: 0 } } } as unknown as Primitive;
    expect(parameterFieldsOf(following).map((f) => f.parameter)).not.toContain('radius');
    expect(parameterFieldsOf(following).map((f) => f.parameter)).toContain('length');
  });

  it('lists every primitive of the document with its shape name', () => {
    expect(primitiveParameters(doc).map((p) => [p.id, p.shapeName])).toEqual([
      ['handle', 'Cylinder'],
      ['bore', 'Cylinder'],
      ['nose', 'Cone'],
      ['weight', 'Point mass'],
      ['plate', 'Box'],
    ]);
  });
});

describe('bounds typed in display units', () => {
  const radius = field('handle', 'radius');
  const position = field('handle', 'position.2');

  it('are refused when empty, out of the field’s range or not increasing', () => {
    expect(boundsProblems(radius, 10.8, 16.2)).toEqual({});
    expect(boundsProblems(radius, null, 16.2)).toEqual({ min: 'is required' });
    expect(boundsProblems(radius, 0, 16.2)).toEqual({ min: 'must be greater than zero' });
    expect(boundsProblems(radius, 12, 12)).toEqual({ max: 'must be greater than the lower bound' });
    expect(boundsProblems(radius, 12, 200_000)).toEqual({ max: 'must be at most 100000 mm' });
    expect(boundsProblems(position, -40, -10)).toEqual({});
  });

  it('go to the request in SI: mm → m and g → kg', () => {
    const fields: ParameterField[] = [radius, field('weight', 'mass'), field('handle', 'density')];
    const free = freeRequest(
      [
        { primitive: 'handle', parameter: 'radius', min: 10.8, max: 16.2 },
        { primitive: 'weight', parameter: 'mass', min: 5, max: 30 },
        { primitive: 'handle', parameter: 'density', min: 520, max: 780 },
      ],
      (c) => fields.find((f) => f.primitive === c.primitive && f.parameter === c.parameter),
    );
    expect(free).toEqual([
      { primitive: 'handle', parameter: 'radius', min: 0.0108, max: 0.0162 },
      { primitive: 'weight', parameter: 'mass', min: 0.005, max: 0.03 },
      { primitive: 'handle', parameter: 'density', min: 520, max: 780 },
    ]);
  });

  it('refuses to build a request from an incomplete choice', () => {
    expect(() => freeRequest([{ primitive: 'handle', parameter: 'radius', min: null, max: 3 }], () => radius)).toThrow(/not complete/);
  });
});
