import type { Material } from '@tumblewise/shared';
import { FALLBACK_DENSITY_TOLERANCE } from '../scatter/scatter-tolerances';
import { roundSignificant } from './display-value';
import type { DraftPrimitive } from './draft-document';

/**
 * The scatter study's tolerances of one primitive as the editor shows them: ± per cent of density
 * (of mass for a point mass) and ± mm on every dimension, one standard deviation each. An empty
 * field means "use the default" (the material's typical scatter, else ±5 %; 0 mm on dimensions).
 */
export interface ToleranceFormValue {
  densityPercent: number | null;
  sizeMm: number | null;
}

/** Whether the shape has dimensions the scatter study varies (point masses and meshes do not). */
export function hasSizeTolerance(shape: DraftPrimitive['shape']): boolean {
  return shape !== 'point' && shape !== 'mesh';
}

/** The primitive's own tolerances in display units (empty where it has none). */
export function toleranceToForm(p: DraftPrimitive): ToleranceFormValue {
  const t = toleranceOf(p);
  return {
    densityPercent: typeof t['density'] === 'number' ? roundSignificant(t['density'] * 100) : null,
    sizeMm: typeof t['size'] === 'number' && hasSizeTolerance(p.shape) ? roundSignificant(t['size'] * 1000) : null,
  };
}

/**
 * The primitive with the typed tolerances in SI (relative density, size in m). Empty fields are left
 * out, and with both empty the `tolerance` key goes, so the document says only what was chosen. What
 * is not a number is kept as null for the schema to name at its field.
 */
export function withTolerance(p: DraftPrimitive, value: ToleranceFormValue): DraftPrimitive {
  const out: DraftPrimitive = { ...p };
  const tolerance: Record<string, number | null> = {};
  const density = parsed(value.densityPercent);
  const size = hasSizeTolerance(p.shape) ? parsed(value.sizeMm) : undefined;
  if (density !== undefined) tolerance['density'] = density === null ? null : roundSignificant(density / 100);
  if (size !== undefined) tolerance['size'] = size === null ? null : roundSignificant(size / 1000);
  if (Object.keys(tolerance).length) out['tolerance'] = tolerance;
  else delete out['tolerance'];
  return out;
}

/** Says what an empty density field stands for: the material's typical scatter, else the fallback. */
export function densityDefaultHint(p: DraftPrimitive, materials: readonly Material[]): string {
  const what = p.shape === 'point' ? 'mass' : 'density';
  const material = typeof p['materialId'] === 'string' ? materials.find((m) => m.id === p['materialId']) : undefined;
  if (material) return `Empty: ±${roundSignificant(material.densityTolerance * 100, 3)} % ${what}, typical of ${material.name}`;
  return `Empty: ±${roundSignificant(FALLBACK_DENSITY_TOLERANCE * 100, 3)} % ${what} (common practice)`;
}

function toleranceOf(p: DraftPrimitive): Record<string, unknown> {
  const t = p['tolerance'];
  return t && typeof t === 'object' && !Array.isArray(t) ? (t as Record<string, unknown>) : {};
}

/** undefined for an empty field, null for something that is not a finite number, else the number. */
function parsed(v: number | string | null): number | null | undefined {
  if (v === null || v === '') return undefined;
  const n = typeof v === 'number' ? v : Number(v);
  return Number.isFinite(n) ? n : null;
}
