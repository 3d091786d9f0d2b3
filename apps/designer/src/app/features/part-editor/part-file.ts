import { toDraftDocument, type DraftDocument } from './draft-document';

/** Largest part document file accepted for import (bytes); inline meshes make big files. */
export const MAX_IMPORT_BYTES = 32 * 1024 * 1024;

/** The outcome of reading a part document file. */
export type ImportedPart = { ok: true; document: DraftDocument } | { ok: false; message: string };

/**
 * Reads the text of a JSON part document. Refuses what is not JSON or not a part document (an
 * object with a `primitives` list and a `spin`); a document that breaks the schema in its values is
 * accepted and its problems are shown at their fields, so the designer can fix them.
 */
export function parsePartFile(text: string): ImportedPart {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    return { ok: false, message: `The file is not valid JSON (${error instanceof Error ? error.message : 'parse error'}).` };
  }
  if (!value || typeof value !== 'object' || Array.isArray(value))
    return { ok: false, message: 'The file does not hold a part document (expected a JSON object).' };
  const record = value as Record<string, unknown>;
  if (!Array.isArray(record['primitives']))
    return { ok: false, message: 'The file does not hold a part document: "primitives" must be a list.' };
  if (!record['spin'] || typeof record['spin'] !== 'object')
    return { ok: false, message: 'The file does not hold a part document: "spin" is missing.' };
  return { ok: true, document: toDraftDocument(value) };
}

/** The document as a JSON file's text (2-space indent, SI units as stored). */
export function partFileText(doc: DraftDocument): string {
  return `${JSON.stringify(doc, null, 2)}\n`;
}

/** A file name for the document: its name in kebab case, `.part.json`. */
export function partFileName(doc: DraftDocument): string {
  const base =
    (doc.name ?? 'part')
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '') || 'part';
  return `${base}.part.json`;
}
