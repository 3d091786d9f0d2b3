import type { GearCategory, PrimitiveShape } from '@tumblewise/shared';

/**
 * A part document while it is being edited: the shape of PartDocumentInput, but any field may hold
 * what the designer typed so far (null for an empty required field). The shared schema decides
 * whether it is valid; the editor never refuses to hold it.
 */
export interface DraftPrimitive {
  id: string;
  shape: PrimitiveShape;
  [key: string]: unknown;
}

/** The editor's working document (SI units, placement angles in degrees). */
export interface DraftDocument {
  name?: string;
  category?: GearCategory;
  division?: 'men' | 'women';
  primitives: DraftPrimitive[];
  spin: { axis: (number | null)[]; rate: number | null; misalignmentDeg?: number | null };
  grip?: { point: (number | null)[]; axis: (number | null)[]; faceNormal: (number | null)[]; pivotDistance?: number | null };
  dissipative?: boolean;
  [key: string]: unknown;
}

/** A document loaded from the server or a file, made safe to edit: missing parts get defaults, unknown keys stay. */
export function toDraftDocument(value: unknown, fallbackName?: string): DraftDocument {
  const source = value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : {};
  const primitives = Array.isArray(source['primitives'])
    ? (source['primitives'] as unknown[])
        .filter((p): p is DraftPrimitive => !!p && typeof p === 'object' && typeof (p as DraftPrimitive).shape === 'string')
        .map((p, i) => ({ ...p, id: typeof p.id === 'string' && p.id ? p.id : `primitive-${i + 1}` }))
    : [];
  const spin =
    source['spin'] && typeof source['spin'] === 'object'
      ? (source['spin'] as DraftDocument['spin'])
      : { axis: [0, 0, 1], rate: 10 * Math.PI, misalignmentDeg: 1 };
  const doc: DraftDocument = { ...source, primitives, spin: { ...spin, axis: Array.isArray(spin.axis) ? spin.axis : [0, 0, 1] } };
  if (doc.name === undefined && fallbackName) doc.name = fallbackName;
  return doc;
}

/** A deep copy of plain JSON data (documents and primitives hold nothing else). */
export function cloneJson<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
