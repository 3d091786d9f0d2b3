import { displayToSi, EDITOR_UNITS, roundSignificant, siToDisplay } from './display-value';
import type { DraftDocument } from './draft-document';

/** The value of the part settings form (display units: rev/s, °, mm). */
export type PartSettingsValue = Record<string, string | number | boolean | null>;

/** Bat pivot distance shown when a part has none (6 in from the knob, ASTM F2398), in m. */
export const DEFAULT_PIVOT_DISTANCE = 0.1524;

type AxisField = 'spinAxis' | 'gripAxis' | 'faceNormal';
const NUMBER_DIGITS = 12;

/**
 * A direction typed as three components scaled to unit length, as the schema requires. Components
 * left empty stay null and a zero vector stays zero, so the schema names the problem at its field.
 */
export function unitDirection(components: readonly (number | null)[]): (number | null)[] {
  if (components.some((c) => c === null || !Number.isFinite(c))) return [...components];
  const [x, y, z] = components as number[];
  const length = Math.hypot(x, y, z);
  if (length === 0) return [0, 0, 0];
  return [x, y, z].map((c) => roundSignificant(c / length, NUMBER_DIGITS) + 0);
}

const numberOrNull = (v: unknown): number | null =>
  v === null || v === '' || v === undefined || !Number.isFinite(Number(v)) ? null : Number(v);
const triple = (v: unknown, fallback: number[]): (number | null)[] =>
  Array.isArray(v) ? [0, 1, 2].map((i) => numberOrNull(v[i])) : fallback;

/** The form value showing the part-wide settings of `doc` in display units. */
export function settingsToFormValue(doc: DraftDocument): PartSettingsValue {
  const value: PartSettingsValue = {
    category: doc.category ?? null,
    division: doc.division ?? 'men',
    rate: siToDisplay(numberOrNull(doc.spin?.rate), EDITOR_UNITS.rate),
    misalignment: numberOrNull(doc.spin?.misalignmentDeg) ?? 1,
    dissipative: doc.dissipative === true,
    gripOn: doc.grip !== undefined,
    pivot: siToDisplay(numberOrNull(doc.grip?.pivotDistance) ?? DEFAULT_PIVOT_DISTANCE, EDITOR_UNITS.length),
  };
  const spinAxis = triple(doc.spin?.axis, [0, 0, 1]);
  const point = triple(doc.grip?.point, [0, 0, 0]);
  const gripAxis = triple(doc.grip?.axis, [0, 0, 1]);
  const faceNormal = triple(doc.grip?.faceNormal, [0, 1, 0]);
  for (let i = 0; i < 3; i++) {
    value[`spinAxis_${i}`] = spinAxis[i] === null ? null : roundSignificant(spinAxis[i]!, 6);
    value[`gripPoint_${i}`] = siToDisplay(point[i], EDITOR_UNITS.length);
    value[`gripAxis_${i}`] = gripAxis[i] === null ? null : roundSignificant(gripAxis[i]!, 6);
    value[`faceNormal_${i}`] = faceNormal[i] === null ? null : roundSignificant(faceNormal[i]!, 6);
  }
  return value;
}

/** The part-wide fields of the document the form describes (SI: rad/s, m; directions unit length). */
export function formValueToSettings(value: PartSettingsValue, doc: DraftDocument): Partial<DraftDocument> {
  const read = (name: string, i: number) => numberOrNull(value[`${name}_${i}`]);
  const direction = (name: AxisField) => unitDirection([read(name, 0), read(name, 1), read(name, 2)]);
  const rate = displayToSi(value['rate'] as number | null, EDITOR_UNITS.rate);
  const changes: Partial<DraftDocument> = {
    spin: {
      ...doc.spin,
      axis: direction('spinAxis'),
      rate: rate === null ? null : roundSignificant(rate, NUMBER_DIGITS),
      misalignmentDeg: numberOrNull(value['misalignment']),
    },
    dissipative: value['dissipative'] === true,
  };
  if (value['category']) changes.category = value['category'] as DraftDocument['category'];
  if (changes.category === 'javelin') changes.division = value['division'] === 'women' ? 'women' : 'men';
  if (value['gripOn']) {
    const pivot = displayToSi(value['pivot'] as number | null, EDITOR_UNITS.length);
    changes.grip = {
      point: [0, 1, 2].map((i) => {
        const si = displayToSi(read('gripPoint', i), EDITOR_UNITS.length);
        return si === null ? 0 : roundSignificant(si, NUMBER_DIGITS);
      }),
      axis: direction('gripAxis'),
      faceNormal: direction('faceNormal'),
      ...(pivot === null ? {} : { pivotDistance: roundSignificant(pivot, NUMBER_DIGITS) }),
    };
  }
  return changes;
}

/** The document with the settings applied: removes the grip (and division) when the form turned them off. */
export function applySettings(doc: DraftDocument, changes: Partial<DraftDocument>): DraftDocument {
  const next: DraftDocument = { ...doc, ...changes };
  if (!('grip' in changes)) delete next.grip;
  if (next.category !== 'javelin') delete next.division;
  return next;
}
