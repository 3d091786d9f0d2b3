import { EDITOR_UNITS } from '../part-editor/display-value';
import type { DraftDocument } from '../part-editor/draft-document';
import { describeChange, withFieldValues } from './draft-point';

// An invented practice baton, in SI as the draft holds it.
const DOC: DraftDocument = {
  name: 'Practice baton',
  primitives: [
    { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 },
    { id: 'foam', shape: 'cylinder', radius: 0.015, innerRadius: 0.009, length: 0.2, position: [0, 0, 0.3], density: 100 },
    { id: 'knob', shape: 'sphere', radius: 0.03, position: [0, 0, 0.57], density: 300 },
  ],
  spin: { axis: [1, 0, 0], rate: 12.6, misalignmentDeg: 1 },
  grip: { point: [0, 0, 0], axis: [0, 0, 1], faceNormal: [0, 1, 0] },
};

describe('withFieldValues', () => {
  it('writes each value at its field (a triple’s component in its array) and keeps everything else', () => {
    const next = withFieldValues(DOC, [
      { primitive: 'knob', parameter: 'position.0', value: 0.012 },
      { primitive: 'rod', parameter: 'radius', value: 0.0105 },
    ]);
    expect(next.primitives[2]['position']).toEqual([0.012, 0, 0.57]);
    expect(next.primitives[0]['radius']).toBe(0.0105);
    expect(next.primitives[1]).toEqual(DOC.primitives[1]);
    expect(next.spin).toEqual(DOC.spin);
    expect(next.grip).toEqual(DOC.grip);
    expect(next.name).toBe('Practice baton');
  });

  it('leaves the draft it was given untouched', () => {
    const before = JSON.stringify(DOC);
    withFieldValues(DOC, [{ primitive: 'knob', parameter: 'position.2', value: 0.6 }]);
    expect(JSON.stringify(DOC)).toBe(before);
  });

  it('removes an inner radius of 0 (the solid shape) and clears grid noise far below a micrometre', () => {
    const next = withFieldValues(DOC, [
      { primitive: 'foam', parameter: 'innerRadius', value: 0 },
      { primitive: 'rod', parameter: 'length', value: 0.35 + 0.15 * 0.1 + 1e-17 },
    ]);
    expect('innerRadius' in next.primitives[1]).toBe(false);
    expect(next.primitives[0]['length']).toBe(0.365);
  });

  it('refuses a primitive the draft no longer has, naming it', () => {
    expect(() => withFieldValues(DOC, [{ primitive: 'tape', parameter: 'mass', value: 0.003 }])).toThrow(/no primitive “tape”/);
  });
});

describe('describeChange', () => {
  it('names the field with its old and new value in display units, or that it stays', () => {
    expect(describeChange('knob · Position x', EDITOR_UNITS.length, 0, 0.012)).toBe('knob · Position x: 0 mm → 12 mm');
    expect(describeChange('tape · Mass', EDITOR_UNITS.mass, 0.003, 0.0045)).toBe('tape · Mass: 3 g → 4.5 g');
    expect(describeChange('foam · Inner radius', EDITOR_UNITS.length, 0.009, 0.009 + 1e-15)).toBe('foam · Inner radius stays 9 mm');
  });
});
