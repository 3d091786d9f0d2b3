import type { DesignParameter } from '@tumblewise/shared';
import { roundSignificant, siToDisplay, type UnitChoice } from '../part-editor/display-value';
import { cloneJson, type DraftDocument } from '../part-editor/draft-document';

/** Significant digits a value keeps when written into the draft (SI): grid arithmetic leaves binary noise far below any tolerance. */
const SI_DIGITS = 12;

/** One field the map stepped, and the value a chosen grid point gives it (SI). */
export interface FieldValue {
  primitive: string;
  parameter: DesignParameter;
  value: number;
}

/**
 * A copy of the draft with each field set to its value (SI), as the editor would write it: a
 * triple's component in its array, an inner radius of 0 removed (the solid shape), everything else
 * kept as it was. Throws when a primitive is no longer in the draft or a triple is missing, naming it.
 */
export function withFieldValues(doc: DraftDocument, fields: readonly FieldValue[]): DraftDocument {
  const next = cloneJson(doc);
  for (const f of fields) {
    const p = next.primitives.find((x) => x.id === f.primitive);
    if (!p) throw new Error(`The draft has no primitive “${f.primitive}” any more; run the map again.`);
    const value = roundSignificant(f.value, SI_DIGITS);
    const [field, component] = f.parameter.split('.');
    if (component !== undefined) {
      const triple = p[field];
      if (!Array.isArray(triple)) throw new Error(`${f.primitive} has no ${field} in the draft any more; run the map again.`);
      triple[Number(component)] = value;
    } else if (field === 'innerRadius' && value === 0) {
      delete p[field];
    } else {
      p[field] = value;
    }
  }
  return next;
}

/** A field's old and new value as the confirmation names them ("knob · Radius: 30 mm → 33 mm", "knob · Radius stays 30 mm"). */
export function describeChange(name: string, units: UnitChoice, before: number, after: number): string {
  const shown = (si: number) => `${roundSignificant(siToDisplay(si, units) ?? 0, 4)} ${units.unit}`;
  return shown(before) === shown(after) ? `${name} stays ${shown(after)}` : `${name}: ${shown(before)} → ${shown(after)}`;
}
