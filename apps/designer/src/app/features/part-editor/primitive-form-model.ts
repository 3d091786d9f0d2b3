import { displayToSi, EDITOR_UNITS, roundSignificant, siToDisplay, type UnitChoice } from './display-value';
import type { DraftPrimitive } from './draft-document';
import { SHAPE_FIELDS } from './primitive-fields';

/** Where a primitive's mass comes from: a material of the list, a density, or its mass directly. */
export type MaterialSource = 'material' | 'density' | 'mass';

/** One numeric control of a primitive's form and the document field behind it. */
export interface NumericControl {
  /** Name of the form control (`size_0`, `radius`, `position_2`). */
  name: string;
  /** JSON path inside the primitive (`size[0]`, `radius`), as the API names fields. */
  path: string;
  /** Label on screen. */
  label: string;
  units: UnitChoice;
}

/** The value of a primitive's form (display units). */
export type PrimitiveFormValue = Record<string, string | number | null>;

/** Keys of the primitive the form writes; anything else (tolerance, inline mesh) is kept as it was. */
const MANAGED = ['id', 'mode', 'position', 'rotationDeg', 'density', 'materialId', 'mass', 'meshId', 'scale'];
/** Significant digits kept in SI after conversion (clears mm→m binary noise, far beyond any tolerance). */
const SI_DIGITS = 12;

const siOf = (value: unknown, units: UnitChoice) => {
  const si = displayToSi(value as number | string | null, units);
  return si === null ? null : roundSignificant(si, SI_DIGITS);
};

/** The numeric controls a primitive of `shape` has, dimension fields first, then placement. */
export function numericControls(shape: DraftPrimitive['shape']): NumericControl[] {
  const controls: NumericControl[] = [];
  for (const field of SHAPE_FIELDS[shape] ?? []) {
    if (field.components)
      field.components.forEach((c, i) =>
        controls.push({ name: `${field.key}_${i}`, path: `${field.key}[${i}]`, label: `${field.label} ${c}`, units: field.units }),
      );
    else controls.push({ name: field.key, path: field.key, label: field.label, units: field.units });
  }
  ['x', 'y', 'z'].forEach((c, i) =>
    controls.push({ name: `position_${i}`, path: `position[${i}]`, label: `Position ${c}`, units: EDITOR_UNITS.length }),
  );
  ['x', 'y', 'z'].forEach((c, i) =>
    controls.push({ name: `rotation_${i}`, path: `rotationDeg[${i}]`, label: `Rotation about ${c}`, units: EDITOR_UNITS.angle }),
  );
  return controls;
}

/** Where the primitive's mass comes from as the document states it. */
export function materialSourceOf(p: DraftPrimitive): MaterialSource {
  if (p.shape === 'point') return 'mass';
  if (p.materialId !== undefined) return 'material';
  if (p.mass !== undefined) return 'mass';
  return 'density';
}

/** The form value showing primitive `p` in display units (mm, g, °, kg/m³). */
export function primitiveToFormValue(p: DraftPrimitive): PrimitiveFormValue {
  const value: PrimitiveFormValue = {
    id: p.id,
    mode: p.mode === 'remove' ? 'remove' : 'add',
    source: materialSourceOf(p),
    materialId: typeof p.materialId === 'string' ? p.materialId : null,
    density: siToDisplay(p.density as number | undefined, EDITOR_UNITS.density),
    mass: siToDisplay(p.mass as number | undefined, EDITOR_UNITS.mass),
    meshId: typeof p.meshId === 'string' ? p.meshId : '',
    scale: typeof p.scale === 'number' ? p.scale : 1,
  };
  for (const field of SHAPE_FIELDS[p.shape] ?? []) {
    const v = p[field.key];
    if (field.components)
      field.components.forEach(
        (_, i) => (value[`${field.key}_${i}`] = siToDisplay(Array.isArray(v) ? (v[i] as number) : null, field.units)),
      );
    else value[field.key] = siToDisplay(v as number | undefined, field.units);
  }
  const position = Array.isArray(p.position) ? p.position : [0, 0, 0];
  const rotation = Array.isArray(p.rotationDeg) ? p.rotationDeg : [0, 0, 0];
  for (let i = 0; i < 3; i++) {
    value[`position_${i}`] = siToDisplay(position[i] as number, EDITOR_UNITS.length);
    value[`rotation_${i}`] = siToDisplay(rotation[i] as number, EDITOR_UNITS.angle);
  }
  return value;
}

/** A named-parameter reference written in a field (`{ "param": "hoopRadius", "scale"?, "offset"? }`), or null. */
export function referenceIn(value: unknown): { param: string; scale?: number; offset?: number } | null {
  if (value === null || typeof value !== 'object' || Array.isArray(value)) return null;
  const param = (value as Record<string, unknown>)['param'];
  return typeof param === 'string' ? (value as { param: string; scale?: number; offset?: number }) : null;
}

/** The value `base` holds at a control's path (`radius`, `size[1]`), for keeping a reference there. */
function heldAt(base: DraftPrimitive, key: string, component?: number): unknown {
  const v = base[key];
  return component === undefined ? v : Array.isArray(v) ? (v as unknown[])[component] : undefined;
}

/**
 * The controls whose field refers to a named parameter, by control name (`radius`, `size_1`,
 * `position_2`, `mass`, `density`), with a short description: "the parameter hoopRadius",
 * "2 × hoopRadius + 0.01 (SI)". Such a control shows empty; typing a number replaces the reference.
 */
export function referencedControls(p: DraftPrimitive): Record<string, string> {
  const out: Record<string, string> = {};
  const describe = (v: unknown, name: string) => {
    const r = referenceIn(v);
    if (!r) return;
    const scale = typeof r.scale === 'number' && r.scale !== 1 ? `${r.scale} × ` : '';
    const offset = typeof r.offset === 'number' && r.offset !== 0 ? ` ${r.offset < 0 ? '−' : '+'} ${Math.abs(r.offset)}` : '';
    out[name] = scale || offset ? `${scale}${r.param}${offset} (SI)` : `the parameter ${r.param}`;
  };
  for (const key of ['mass', 'density']) describe(p[key], key);
  for (const field of SHAPE_FIELDS[p.shape] ?? []) {
    if (field.components) field.components.forEach((_, i) => describe(heldAt(p, field.key, i), `${field.key}_${i}`));
    else describe(p[field.key], field.key);
  }
  for (let i = 0; i < 3; i++) describe(heldAt(p, 'position', i), `position_${i}`);
  return out;
}

/**
 * The primitive the form describes, in SI, built on `base` so fields the form does not show stay.
 * Empty required dimensions become null (the schema names them); empty optional ones are left out;
 * empty placement components count as 0. Exactly one of materialId, density and mass is written.
 * A field that refers to a named parameter shows empty and keeps its reference while it stays
 * empty; a number typed there replaces the reference.
 */
export function formValueToPrimitive(value: PrimitiveFormValue, base: DraftPrimitive): DraftPrimitive {
  const out: DraftPrimitive = { id: String(value['id'] ?? ''), shape: base.shape };
  for (const [key, v] of Object.entries(base)) {
    if (!MANAGED.includes(key) && !(SHAPE_FIELDS[base.shape] ?? []).some((f) => f.key === key)) out[key] = v;
  }
  const kept = (si: number | null, held: unknown): unknown => (si === null && referenceIn(held) ? held : si);
  for (const field of SHAPE_FIELDS[base.shape] ?? []) {
    if (field.components) {
      const parts = field.components.map((_, i) => kept(siOf(value[`${field.key}_${i}`], field.units), heldAt(base, field.key, i)));
      if (!(field.optional && parts.every((x) => x === null))) out[field.key] = parts;
    } else {
      const si = kept(siOf(value[field.key], field.units), base[field.key]);
      if (si !== null || !field.optional) out[field.key] = si;
    }
  }
  out['position'] = [0, 1, 2].map((i) => kept(siOf(value[`position_${i}`], EDITOR_UNITS.length), heldAt(base, 'position', i)) ?? 0);
  out['rotationDeg'] = [0, 1, 2].map((i) => siOf(value[`rotation_${i}`], EDITOR_UNITS.angle) ?? 0);
  const source: MaterialSource = base.shape === 'point' ? 'mass' : ((value['source'] as MaterialSource) ?? 'density');
  if (source === 'material') out['materialId'] = (value['materialId'] as string | null) ?? '';
  else if (source === 'mass') out['mass'] = kept(siOf(value['mass'], EDITOR_UNITS.mass), base['mass']);
  else out['density'] = kept(siOf(value['density'], EDITOR_UNITS.density), base['density']);
  out['mode'] = base.shape === 'point' ? 'add' : value['mode'] === 'remove' ? 'remove' : 'add';
  if (base.shape === 'mesh') {
    const meshId = String(value['meshId'] ?? '').trim();
    if (meshId) out['meshId'] = meshId;
    const scale = value['scale'];
    out['scale'] = scale === null || scale === '' ? null : Number(scale);
  }
  return out;
}
