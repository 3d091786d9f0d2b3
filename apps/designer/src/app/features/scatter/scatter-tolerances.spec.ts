import type { Material, Primitive } from '@tumblewise/shared';
import { defaultTolerances, tolerancesBody } from './scatter-tolerances';

// Invented material rows; the densities and tolerances are for the test only.
const ASH = {
  id: '80000000-0000-4000-8000-000000000001',
  name: 'Ash (test)',
  family: 'wood',
  density: 670,
  densityTolerance: 0.08,
  source: 'test',
  scope: 'library',
  createdAt: '2026-11-02T09:00:00.000Z',
} as Material;
const at = { position: [0, 0, 0], rotationDeg: [0, 0, 0], mode: 'add' } as const;

describe('defaultTolerances', () => {
  it('takes the primitive’s own tolerance first, then its material’s, then ±5 %', () => {
    const rows = defaultTolerances(
      [
        { ...at, id: 'grip', shape: 'cylinder', radius: 0.0135, length: 0.19, materialId: ASH.id },
        { ...at, id: 'throat', shape: 'box', size: [0.02, 0.015, 0.12], density: 1500, tolerance: { density: 0.03, size: 0.0002 } },
        { ...at, id: 'hoop', shape: 'torus', majorRadius: 0.11, minorRadius: 0.008, density: 1500 },
        { ...at, id: 'tape', shape: 'point', mass: 0.003 },
        { ...at, id: 'bore', shape: 'cylinder', radius: 0.008, length: 0.17, density: 650, mode: 'remove' },
      ] as Primitive[],
      [ASH],
    );
    expect(rows.map((r) => [r.primitiveId, r.source, r.densityPercent, r.sizeMm])).toEqual([
      ['grip', 'material', 8, 0],
      ['throat', 'primitive', 3, 0.2],
      ['hoop', 'fallback', 5, 0],
      ['tape', 'fallback', 5, null],
      ['bore', 'fallback', 5, 0],
    ]);
    expect(rows[0].materialName).toBe('Ash (test)');
    expect(rows[3].scatters).toBe('mass');
    expect(rows[4].mode).toBe('remove');
  });

  it('gives meshes a density scatter only', () => {
    const [row] = defaultTolerances([{ ...at, id: 'scan', shape: 'mesh', meshId: 'm-1', scale: 0.001, density: 900 } as Primitive], []);
    expect(row.sizeMm).toBeNull();
  });
});

describe('tolerancesBody', () => {
  it('converts per cent and millimetres to the API’s relative density and metres', () => {
    expect(
      tolerancesBody([
        { primitiveId: 'grip', densityPercent: 8, sizeMm: 0.25 },
        { primitiveId: 'tape', densityPercent: 5, sizeMm: null },
      ]),
    ).toEqual({
      grip: { density: 0.08, size: 0.00025 },
      tape: { density: 0.05 },
    });
  });
});
