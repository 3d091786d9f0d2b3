import type { DraftDocument } from '../part-editor/draft-document';
import { allChoices, choiceName, defaultChoices, parameterChoices } from './parameter-choices';

// An invented practice baton; values in SI as the draft holds them.
const doc = (primitives: DraftDocument['primitives']): DraftDocument => ({ primitives, spin: { axis: [1, 0, 0], rate: 12 } });

describe('parameterChoices', () => {
  it('offers each primitive’s dimensions, stated density or mass, then position, with the editor’s labels and units', () => {
    const groups = parameterChoices(
      doc([
        { id: 'rod', shape: 'cylinder', radius: 0.009, length: 0.5, innerRadius: 0.004, position: [0, 0, 0.3], density: 1200 },
        { id: 'hoop', shape: 'torus', majorRadius: 0.11, minorRadius: 0.008, position: [0, 0, 0.42], materialId: 'carbon' },
        { id: 'tape', shape: 'point', mass: 0.003, position: [0.11, 0, 0.42] },
      ]),
    );
    expect(groups.map((g) => g.heading)).toEqual(['rod (Cylinder)', 'hoop (Torus)', 'tape (Point mass)']);
    expect(groups[0].choices.map((c) => [c.parameter, c.label, c.units.unit, c.current])).toEqual([
      ['radius', 'Radius', 'mm', 0.009],
      ['length', 'Length', 'mm', 0.5],
      ['innerRadius', 'Inner radius', 'mm', 0.004],
      ['density', 'Density', 'kg/m³', 1200],
      ['position.0', 'Position x', 'mm', 0],
      ['position.1', 'Position y', 'mm', 0],
      ['position.2', 'Position z', 'mm', 0.3],
    ]);
    // The torus takes its density from a material: only its size and place can be stepped.
    expect(groups[1].choices.map((c) => c.label)).toEqual(['Ring radius', 'Tube radius', 'Position x', 'Position y', 'Position z']);
    expect(groups[2].choices.map((c) => [c.label, c.units.unit])).toEqual([
      ['Mass', 'g'],
      ['Position x', 'mm'],
      ['Position y', 'mm'],
      ['Position z', 'mm'],
    ]);
    expect(allChoices(groups)[0].key).toBe('rod|radius');
    expect(choiceName(groups[1].choices[0])).toBe('hoop · Ring radius');
  });

  it('names triple components as the sweep does and reads an absent bore as 0, a missing wall not at all', () => {
    const [box, sphere] = parameterChoices(
      doc([
        { id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], position: [0, 0, 0.25], density: 1500 },
        { id: 'knob', shape: 'sphere', radius: 0.03, position: [0, 0, 0.57], density: 300 },
      ]),
    );
    expect(box.choices.slice(0, 3).map((c) => [c.parameter, c.label, c.current])).toEqual([
      ['size.0', 'Size x', 0.02],
      ['size.1', 'Size y', 0.015],
      ['size.2', 'Size z', 0.12],
    ]);
    expect(box.choices.some((c) => c.parameter === 'wall')).toBe(false);
    expect(sphere.choices.find((c) => c.parameter === 'innerRadius')?.current).toBe(0);
  });

  it('leaves out empty fields, fields taken from a named parameter, rotations, and primitives with nothing to step', () => {
    const groups = parameterChoices(
      doc([
        {
          id: 'grip',
          shape: 'cylinder',
          radius: null,
          length: { param: 'gripLength' },
          position: [0, 0, 0.1],
          rotationDeg: [90, 0, 0],
          density: 650,
          refs: { density: { param: 'wood', scale: 1, offset: 0 } },
        },
      ]),
    );
    expect(groups[0].choices.map((c) => c.parameter)).toEqual(['innerRadius', 'position.0', 'position.1', 'position.2']);
    expect(parameterChoices(doc([]))).toEqual([]);
  });

  it('starts a map from the first field of the first primitive and the first field of the second', () => {
    const groups = parameterChoices(
      doc([
        { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 },
        { id: 'knob', shape: 'sphere', radius: 0.03, position: [0, 0, 0.57], density: 300 },
      ]),
    );
    expect(defaultChoices(groups).map((c) => c?.key)).toEqual(['rod|radius', 'knob|radius']);
    expect(defaultChoices(groups.slice(0, 1)).map((c) => c?.key)).toEqual(['rod|radius', 'rod|length']);
    expect(defaultChoices([])).toEqual([null, null]);
  });
});
