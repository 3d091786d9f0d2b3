import { partDocumentSchema, type GearCategory, type PrimitiveShape } from '@tumblewise/shared';

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

/**
 * A primitive whose `refs` (the validated document's record of which fields follow a named
 * parameter) are written back into those fields as references, the form the editor keeps.
 */
function withInlineReferences(p: DraftPrimitive): DraftPrimitive {
  const refs = p['refs'];
  if (refs === undefined) return p;
  const { refs: _inlined, ...rest } = p;
  const out: DraftPrimitive = { ...rest };
  if (!refs || typeof refs !== 'object') return out;
  for (const [field, ref] of Object.entries(refs as Record<string, unknown>)) {
    const [key, component] = field.split('.');
    if (component === undefined) out[key] = ref;
    else if (Array.isArray(out[key])) {
      const triple = [...(out[key] as unknown[])];
      triple[Number(component)] = ref;
      out[key] = triple;
    }
  }
  return out;
}

/**
 * A document loaded from the server or a file, made safe to edit: missing parts get defaults, unknown
 * keys stay. Named `parameters` stay as they are, and fields that refer to them keep their
 * references (a validated document's `refs` are written back into the fields).
 */
export function toDraftDocument(value: unknown, fallbackName?: string): DraftDocument {
  const source = value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : {};
  const primitives = Array.isArray(source['primitives'])
    ? (source['primitives'] as unknown[])
        .filter((p): p is DraftPrimitive => !!p && typeof p === 'object' && typeof (p as DraftPrimitive).shape === 'string')
        .map((p, i) => withInlineReferences({ ...p, id: typeof p.id === 'string' && p.id ? p.id : `primitive-${i + 1}` }))
    : [];
  const spin =
    source['spin'] && typeof source['spin'] === 'object'
      ? (source['spin'] as DraftDocument['spin'])
      : { axis: [0, 0, 1], rate: 10 * Math.PI, misalignmentDeg: 1 };
  const doc: DraftDocument = { ...source, primitives, spin: { ...spin, axis: Array.isArray(spin.axis) ? spin.axis : [0, 0, 1] } };
  if (doc.name === undefined && fallbackName) doc.name = fallbackName;
  return doc;
}

/**
 * The document with its parameter references resolved to numbers (the shared schema's validated
 * form), for what draws it; one without `parameters`, or not valid, is returned as it is.
 */
export function withResolvedReferences(doc: DraftDocument): DraftDocument {
  if (doc['parameters'] === undefined) return doc;
  const parsed = partDocumentSchema.safeParse(doc);
  return parsed.success ? (parsed.data as unknown as DraftDocument) : doc;
}

/** A deep copy of plain JSON data (documents and primitives hold nothing else). */
export function cloneJson<T>(value: T): T {
  return JSON.parse(JSON.stringify(value)) as T;
}
