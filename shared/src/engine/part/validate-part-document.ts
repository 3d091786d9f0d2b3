import { partDocumentSchema, type PartDocument } from '../../schemas/part-document';
import { formatPath, type InputIssue } from './engine-input-error';

/** Result of validating a part document. */
export type PartValidation = { ok: true; value: PartDocument } | { ok: false; errors: InputIssue[] };

/**
 * Checks untrusted JSON against the shared part-document schema. Errors name the JSON path of the
 * field (e.g. `primitives[2].innerRadius`) with a message; the valid value has defaults filled in.
 * Never throws.
 */
export function validatePartDocument(json: unknown): PartValidation {
  const r = partDocumentSchema.safeParse(json);
  if (r.success) return { ok: true, value: r.data };
  return { ok: false, errors: r.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })) };
}
