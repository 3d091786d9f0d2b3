import { formatJsonPath, partDocumentSchema, type Material } from '@tumblewise/shared';
import type { DraftDocument } from './draft-document';

/** Problems of a document by JSON path (`primitives[2].radius`), the first message for each path. */
export type FieldIssues = Readonly<Record<string, string>>;

/** Checks the document with the shared part schema (the rule the server applies) and lists the problems by path. */
export function documentIssues(doc: DraftDocument): FieldIssues {
  const result = partDocumentSchema.safeParse(doc);
  if (result.success) return {};
  const issues: Record<string, string> = {};
  for (const issue of result.error.issues) {
    const path = formatJsonPath(issue.path);
    if (!(path in issues)) issues[path] = issue.message;
  }
  return issues;
}

/** What /analyze is sent for the live report, or the problems that keep it from being sent. */
export type AnalysisRequest = { ok: true; document: DraftDocument } | { ok: false; issues: FieldIssues };

/**
 * The document to analyse live, checked first with the shared schema (nothing invalid is sent) and,
 * once the material list is loaded, for material references that are not in it. The server resolves
 * the references (`POST /analyze?workspace=`), so the document goes as it will be saved.
 */
export function analysisRequest(doc: DraftDocument, materials: ReadonlyMap<string, Material>): AnalysisRequest {
  const issues: Record<string, string> = { ...documentIssues(doc) };
  if (materials.size > 0) {
    doc.primitives.forEach((p, i) => {
      const path = `primitives[${i}].materialId`;
      if (typeof p.materialId === 'string' && p.materialId && !materials.has(p.materialId) && !issues[path])
        issues[path] = 'is not in the material list';
    });
  }
  return Object.keys(issues).length > 0 ? { ok: false, issues } : { ok: true, document: doc };
}

/**
 * A server error's message for its field: the API writes "Primitives[2].radius must be …", the
 * field shows "must be …" after its own label.
 */
export function messageForField(message: string, field: string): string {
  const lower = message.toLowerCase();
  const prefix = field.toLowerCase();
  if (!lower.startsWith(prefix)) return message;
  const rest = message.slice(field.length).trim().replace(/\.$/, '');
  return rest || message;
}

/** The issue of a path, or of its parent triple (`size[1]` falls back to `size`). */
export function issueAt(issues: FieldIssues, path: string): string | null {
  if (issues[path]) return issues[path];
  const parent = path.replace(/\[\d+\]$/, '');
  return parent !== path ? (issues[parent] ?? null) : null;
}

/** A copy of the document with each known material reference replaced by the material's density. */
export function withMaterialDensities(doc: DraftDocument, materials: ReadonlyMap<string, Material>): DraftDocument {
  if (!doc.primitives.some((p) => typeof p.materialId === 'string' && materials.has(p.materialId))) return doc;
  return {
    ...doc,
    primitives: doc.primitives.map((p) => {
      const material = typeof p.materialId === 'string' ? materials.get(p.materialId) : undefined;
      if (!material) return p;
      const { materialId: _replaced, ...rest } = p;
      return { ...rest, density: material.density };
    }),
  };
}
