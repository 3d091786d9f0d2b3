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

/**
 * The primitive the form describes, in SI, built on `base` so fields the form does not show stay.
 * Empty required dimensions become null (the schema names them); empty optional ones are left out;
 * empty placement components count as 0. Exactly one of materialId, density and mass is written.
 */
export function formValueToPrimitive(value: PrimitiveFormValue, base: DraftPrimitive): DraftPrimitive {
  const out: DraftPrimitive = { id: String(value['id'] ?? ''), shape: base.shape };
  for (const [key, v] of Object.entries(base)) {
    if (!MANAGED.includes(key) && !(SHAPE_FIELDS[base.shape] ?? []).some((f) => f.key === key)) out[key] = v;
  }
  for (const field of SHAPE_FIELDS[base.shape] ?? []) {
    if (field.components) {
      const parts = field.components.map((_, i) => siOf(value[`${field.key}_${i}`], field.units));
      if (!(field.optional && parts.every((x) => x === null))) out[field.key] = parts;
    } else {
      const si = siOf(value[field.key], field.units);
      if (si !== null || !field.optional) out[field.key] = si;
    }
  }
  out['position'] = [0, 1, 2].map((i) => siOf(value[`position_${i}`], EDITOR_UNITS.length) ?? 0);
  out['rotationDeg'] = [0, 1, 2].map((i) => siOf(value[`rotation_${i}`], EDITOR_UNITS.angle) ?? 0);
  const source: MaterialSource = base.shape === 'point' ? 'mass' : ((value['source'] as MaterialSource) ?? 'density');
  if (source === 'material') out['materialId'] = (value['materialId'] as string | null) ?? '';
  else if (source === 'mass') out['mass'] = siOf(value['mass'], EDITOR_UNITS.mass);
  else out['density'] = siOf(value['density'], EDITOR_UNITS.density);
  out['mode'] = base.shape === 'point' ? 'add' : value['mode'] === 'remove' ? 'remove' : 'add';
  if (base.shape === 'mesh') {
    const meshId = String(value['meshId'] ?? '').trim();
    if (meshId) out['meshId'] = meshId;
    const scale = value['scale'];
    out['scale'] = scale === null || scale === '' ? null : Number(scale);
  }
  return out;
}
