import type { Material, Primitive } from '@tumblewise/shared';

/** Fallback relative density scatter when neither the primitive nor its material states one (common practice: ±5 % is a usual design allowance for wood and moulded parts). */
export const FALLBACK_DENSITY_TOLERANCE = 0.05;
/** Limits the server accepts per primitive (startScatterBodySchema): density ≤ 0.5 (±50 %), size ≤ 0.05 m. */
export const TOLERANCE_LIMITS = { densityPercent: 50, sizeMm: 50 } as const;
/** Samples a study may draw (startScatterBodySchema). */
export const SAMPLE_LIMITS = { min: 10, max: 20_000, default: 2000 } as const;

/** One row of the tolerance form: what the designer sees and edits for a primitive, in display units. */
export interface ToleranceRow {
  primitiveId: string;
  shape: Primitive['shape'];
  mode: 'add' | 'remove';
  /** What the ± % applies to: the density, or the mass of a point mass. */
  scatters: 'density' | 'mass';
  /** Where the default came from, for the hint. */
  source: 'primitive' | 'material' | 'fallback';
  materialName: string | null;
  /** ± per cent (one standard deviation). */
  densityPercent: number;
  /** ± mm (one standard deviation); null when the shape has no dimensions to vary (point mass, mesh). */
  sizeMm: number | null;
}

/**
 * The starting tolerances of each primitive: the primitive's own `tolerance` if the document has
 * one, else its material's typical density scatter, else ±5 %; dimensions from the primitive's own
 * size tolerance, else 0 mm. Point masses scatter in mass; meshes vary in density only.
 */
export function defaultTolerances(primitives: readonly Primitive[], materials: readonly Material[]): ToleranceRow[] {
  const byId = new Map(materials.map((m) => [m.id, m]));
  return primitives.map((p) => {
    const material = p.materialId ? (byId.get(p.materialId) ?? null) : null;
    const own = p.tolerance?.density;
    const density = own ?? material?.densityTolerance ?? FALLBACK_DENSITY_TOLERANCE;
    const fixedShape = p.shape === 'point' || p.shape === 'mesh';
    return {
      primitiveId: p.id,
      shape: p.shape,
      mode: p.mode === 'remove' ? 'remove' : 'add',
      scatters: p.shape === 'point' ? 'mass' : 'density',
      source: own !== undefined ? 'primitive' : material ? 'material' : 'fallback',
      materialName: material?.name ?? null,
      densityPercent: round(density * 100),
      sizeMm: fixedShape ? null : round((p.tolerance?.size ?? 0) * 1000),
    };
  });
}

/** The request body's tolerances (SI: relative density, size in m) from the form's rows. */
export function tolerancesBody(
  rows: readonly Pick<ToleranceRow, 'primitiveId' | 'densityPercent' | 'sizeMm'>[],
): Record<string, { density: number; size?: number }> {
  const out: Record<string, { density: number; size?: number }> = {};
  for (const r of rows) out[r.primitiveId] = { density: r.densityPercent / 100, ...(r.sizeMm !== null ? { size: r.sizeMm / 1000 } : {}) };
  return out;
}

function round(x: number): number {
  return Number(x.toPrecision(10));
}
