/** One field that differs between two documents, by its path inside the primitive or the document. */
export interface FieldChange {
  path: string;
  before: unknown;
  after: unknown;
}

/** What happened to one primitive (matched by id) from the first document to the second. */
export interface PrimitiveChangeSummary {
  id: string;
  shape: string;
  change: 'added' | 'removed' | 'changed' | 'moved';
  /** For `changed` (and `moved` with edits): the fields that differ. */
  fields: FieldChange[];
  /** Places in the list, when it moved. */
  from?: number;
  to?: number;
}

/** The parameter differences of two part documents. */
export interface VariantDiff {
  primitives: PrimitiveChangeSummary[];
  /** Part-wide fields that differ (spin, grip, category, dissipative, name). */
  settings: FieldChange[];
  /** True when the two documents have the same parameters. */
  same: boolean;
}

/** Arrays longer than this (inline mesh vertices) are compared whole, not element by element. */
const WHOLE_ARRAY_LENGTH = 12;

/** Values the schema fills in when absent, so a missing field and its default compare equal. */
const PRIMITIVE_DEFAULTS: Record<string, unknown> = { position: [0, 0, 0], rotationDeg: [0, 0, 0], mode: 'add' };
const DOCUMENT_DEFAULTS: Record<string, unknown> = { dissipative: false };

/** Leaves of a JSON value by path (`spin.axis[0]`, `size[2]`). */
export function flattenLeaves(value: unknown, prefix = '', out: Map<string, unknown> = new Map()): Map<string, unknown> {
  if (Array.isArray(value)) {
    if (value.length > WHOLE_ARRAY_LENGTH) out.set(prefix, JSON.stringify(value));
    else value.forEach((v, i) => flattenLeaves(v, `${prefix}[${i}]`, out));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) flattenLeaves(v, prefix ? `${prefix}.${k}` : k, out);
  } else {
    out.set(prefix, value);
  }
  return out;
}

function changedFields(a: unknown, b: unknown): FieldChange[] {
  const left = flattenLeaves(a);
  const right = flattenLeaves(b);
  const paths = [...new Set([...left.keys(), ...right.keys()])];
  return paths.filter((p) => !Object.is(left.get(p), right.get(p))).map((p) => ({ path: p, before: left.get(p), after: right.get(p) }));
}

type Loose = Record<string, unknown>;
const asObject = (v: unknown): Loose => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Loose) : {});
const withDefaults = (v: Loose, defaults: Loose): Loose => ({ ...(JSON.parse(JSON.stringify(defaults)) as Loose), ...v });

/**
 * The differences between two part documents: primitives added, removed, changed (which fields) or
 * moved in the list, matched by id; then the part-wide fields. Absent fields count as their schema
 * default (position and rotation zero, mode "add", misalignment 1°, not dissipative).
 */
export function diffDocuments(before: unknown, after: unknown): VariantDiff {
  const a = asObject(before);
  const b = asObject(after);
  const listA = (Array.isArray(a['primitives']) ? a['primitives'] : []).map(asObject);
  const listB = (Array.isArray(b['primitives']) ? b['primitives'] : []).map(asObject);
  const indexB = new Map(listB.map((p, i) => [String(p['id']), i]));
  const indexA = new Map(listA.map((p, i) => [String(p['id']), i]));
  const primitives: PrimitiveChangeSummary[] = [];

  listA.forEach((p, i) => {
    const id = String(p['id']);
    const j = indexB.get(id);
    if (j === undefined) {
      primitives.push({ id, shape: String(p['shape']), change: 'removed', fields: [] });
      return;
    }
    const fields = changedFields(withDefaults(p, PRIMITIVE_DEFAULTS), withDefaults(listB[j], PRIMITIVE_DEFAULTS));
    // Order matters only relative to the others that stayed: compare ranks among the kept ids.
    const rankA = listA.slice(0, i).filter((q) => indexB.has(String(q['id']))).length;
    const rankB = listB.slice(0, j).filter((q) => indexA.has(String(q['id']))).length;
    if (rankA !== rankB) primitives.push({ id, shape: String(listB[j]['shape']), change: 'moved', fields, from: i, to: j });
    else if (fields.length > 0) primitives.push({ id, shape: String(listB[j]['shape']), change: 'changed', fields });
  });
  listB.forEach((p) => {
    const id = String(p['id']);
    if (!indexA.has(id)) primitives.push({ id, shape: String(p['shape']), change: 'added', fields: [] });
  });

  const rest = (d: Loose) => {
    const { primitives: _p, ...others } = d;
    const spin = asObject(others['spin']);
    return withDefaults({ ...others, ...(others['spin'] ? { spin: { misalignmentDeg: 1, ...spin } } : {}) }, DOCUMENT_DEFAULTS);
  };
  const settings = changedFields(rest(a), rest(b));
  return { primitives, settings, same: primitives.length === 0 && settings.length === 0 };
}
