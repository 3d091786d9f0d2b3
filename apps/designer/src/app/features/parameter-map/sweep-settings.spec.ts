import { EDITOR_UNITS } from '../part-editor/display-value';
import type { DraftDocument } from '../part-editor/draft-document';
import type { ParameterChoice } from './parameter-choices';
import { defaultEnds, pointLimitMessage, primitiveScale, sweepRequest, totalPoints } from './sweep-settings';

const choice = (over: Partial<ParameterChoice>): ParameterChoice => ({
  key: 'rod|radius',
  primitive: 'rod',
  parameter: 'radius',
  label: 'Radius',
  units: EDITOR_UNITS.length,
  current: 0.009,
  ...over,
});
// An invented practice baton.
const DOC: DraftDocument = {
  primitives: [
    { id: 'rod', shape: 'capsule', radius: 0.009, length: 0.5, position: [0, 0, 0.3], density: 1200 },
    { id: 'weight', shape: 'point', mass: 0.02, position: [0, 0, 0.05] },
  ],
  spin: { axis: [1, 0, 0], rate: 12 },
};

describe('defaultEnds', () => {
  it('reaches ±30 % around the current value, in the display unit', () => {
    expect(defaultEnds(choice({ current: 0.009 }), 0.009)).toEqual({ from: 6.3, to: 11.7 });
    expect(defaultEnds(choice({ parameter: 'density', units: EDITOR_UNITS.density, current: 1200 }), 0.009)).toEqual({
      from: 840,
      to: 1560,
    });
    // A negative position keeps its ends in order.
    expect(defaultEnds(choice({ parameter: 'position.2', current: -0.1 }), 0.009)).toEqual({ from: -130, to: -70 });
  });

  it('spans a position at 0 by the primitive’s size, and a bore at 0 from 0 to 90 % of it', () => {
    expect(defaultEnds(choice({ parameter: 'position.0', current: 0 }), 0.03)).toEqual({ from: -30, to: 30 });
    expect(defaultEnds(choice({ parameter: 'innerRadius', current: 0 }), 0.03)).toEqual({ from: 0, to: 27 });
  });

  it('sizes a primitive by its first dimension, a point mass by 10 mm', () => {
    expect(primitiveScale(DOC, 'rod')).toBe(0.009);
    expect(primitiveScale(DOC, 'weight')).toBe(0.01);
  });
});

describe('the 10 000 point limit', () => {
  it('lets a 41-step line and a 31 × 31 map through', () => {
    expect(totalPoints([41])).toBe(41);
    expect(totalPoints([31, 31])).toBe(961);
    expect(pointLimitMessage([41])).toBeNull();
    expect(pointLimitMessage([100, 100])).toBeNull();
  });

  it('names the product and the limit when the grid is larger', () => {
    expect(pointLimitMessage([101, 100])).toBe('101 × 100 = 10 100 grid points is more than one map may hold (10 000). Use fewer steps.');
    expect(pointLimitMessage([12000])).toBe('12 000 grid points is more than one map may hold (10 000). Use fewer steps.');
  });
});

describe('sweepRequest', () => {
  it('sends the ends in SI: mm → m and g → kg by the SI prefixes (BIPM SI Brochure, 9th ed., Table 7: milli = 10⁻³)', () => {
    const request = sweepRequest(
      DOC,
      [
        { choice: choice({}), from: 6.3, to: 11.7, steps: 31 },
        {
          choice: choice({ key: 'weight|mass', primitive: 'weight', parameter: 'mass', label: 'Mass', units: EDITOR_UNITS.mass }),
          from: 14,
          to: 26,
          steps: 31,
        },
      ],
      ['steadyMargin', 'mass'],
    );
    expect(request.axes).toEqual([
      { primitive: 'rod', parameter: 'radius', from: 0.0063, to: 0.0117, steps: 31 },
      { primitive: 'weight', parameter: 'mass', from: 0.014, to: 0.026, steps: 31 },
    ]);
    expect(request.figures).toEqual(['steadyMargin', 'mass']);
    expect(request.part).toBe(DOC);
  });

  it('sends a density as typed: kg/m³ is the SI unit itself', () => {
    const request = sweepRequest(
      DOC,
      [{ choice: choice({ parameter: 'density', units: EDITOR_UNITS.density, current: 1200 }), from: 840, to: 1560, steps: 41 }],
      ['steadyMargin'],
    );
    expect(request.axes[0]).toEqual({ primitive: 'rod', parameter: 'density', from: 840, to: 1560, steps: 41 });
  });
});
