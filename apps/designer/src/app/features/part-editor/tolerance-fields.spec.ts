import { unit } from 'mathjs';
import type { Material } from '@tumblewise/shared';
import { validatePartDocument } from '@tumblewise/engine';
import type { DraftPrimitive } from './draft-document';
import { densityDefaultHint, hasSizeTolerance, toleranceToForm, withTolerance } from './tolerance-fields';

// Conversions checked against mathjs's unit system (1 mm = 0.001 m, SI Brochure) and the plain
// definition of per cent (1 % = 0.01).
const GRIP: DraftPrimitive = {
  id: 'grip',
  shape: 'cylinder',
  radius: 0.0135,
  length: 0.19,
  density: 650,
  tolerance: { density: 0.04, size: 0.0002 },
};
const ASH: Material = {
  id: 'ash',
  name: 'Ash (white)',
  density: 670,
  densityTolerance: 0.08,
  source: 'Wood Handbook',
  workspaceId: null,
} as unknown as Material;

describe('tolerance fields of the editor', () => {
  it('shows a relative density as per cent and a size in metres as millimetres', () => {
    expect(toleranceToForm(GRIP)).toEqual({ densityPercent: 4, sizeMm: unit(0.0002, 'm').toNumber('mm') });
    expect(toleranceToForm({ id: 'x', shape: 'box', size: [0.1, 0.1, 0.1] })).toEqual({ densityPercent: null, sizeMm: null });
  });

  it('writes typed values back in SI and leaves the other keys of the primitive as they were', () => {
    const out = withTolerance(GRIP, { densityPercent: 2.5, sizeMm: 0.3 });
    expect(out['tolerance']).toEqual({ density: 0.025, size: unit(0.3, 'mm').toNumber('m') });
    expect({ ...out, tolerance: undefined }).toEqual({ ...GRIP, tolerance: undefined });
  });

  it('drops what is empty, and the whole tolerance when both are empty', () => {
    expect(withTolerance(GRIP, { densityPercent: 3, sizeMm: null })['tolerance']).toEqual({ density: 0.03 });
    expect('tolerance' in withTolerance(GRIP, { densityPercent: null, sizeMm: null })).toBe(false);
  });

  it('has no dimension tolerance for point masses and meshes (the scatter study varies neither)', () => {
    expect(hasSizeTolerance('point')).toBe(false);
    expect(hasSizeTolerance('mesh')).toBe(false);
    expect(hasSizeTolerance('torus')).toBe(true);
    const point: DraftPrimitive = { id: 'tip', shape: 'point', mass: 0.01, tolerance: { size: 0.001 } };
    expect(toleranceToForm(point).sizeMm).toBeNull();
    expect(withTolerance(point, { densityPercent: 1, sizeMm: 2 })['tolerance']).toEqual({ density: 0.01 });
  });

  it('gives the schema a negative value to name at its field, with nothing else changed', () => {
    const doc = { primitives: [withTolerance(GRIP, { densityPercent: -1, sizeMm: null })], spin: { axis: [1, 0, 0], rate: 31.4 } };
    const result = validatePartDocument(doc);
    expect(result.ok).toBe(false);
    expect(result.ok ? [] : result.errors.map((i) => i.path)).toContain('primitives[0].tolerance.density');
  });

  it('says what an empty density field stands for: the material, else the ±5 % fallback', () => {
    expect(densityDefaultHint({ ...GRIP, materialId: 'ash' }, [ASH])).toBe('Empty: ±8 % density, typical of Ash (white)');
    expect(densityDefaultHint(GRIP, [ASH])).toBe('Empty: ±5 % density (common practice)');
    expect(densityDefaultHint({ id: 'tip', shape: 'point', mass: 0.01 }, [])).toBe('Empty: ±5 % mass (common practice)');
  });
});
