import { formatJsonPath, partDocumentSchema, type PartDocument } from '@tumblewise/shared';
import { primitiveParameters, type PrimitiveParameters } from './free-parameter-model';

/** What the part's draft offers a goal seek. */
export type SolveDraft =
  /** The part has no draft document yet. */
  | { kind: 'none' }
  /** The draft has no primitives. */
  | { kind: 'empty' }
  /** The draft breaks the part document's rules (first problems by path): the editor shows them at their fields. */
  | { kind: 'invalid'; problems: string[] }
  /** A valid draft: as stored (`raw`, what the request sends), validated (`doc`), and its free-able fields. */
  | { kind: 'ready'; raw: Record<string, unknown>; doc: PartDocument; primitives: PrimitiveParameters[] };

/** Problems listed when a draft is invalid. */
const SHOWN_PROBLEMS = 3;

/** The draft as a goal seek sees it: checked with the shared part schema (the rule the server applies). */
export function solveDraft(draft: unknown): SolveDraft {
  if (draft === null || draft === undefined || typeof draft !== 'object' || Array.isArray(draft)) return { kind: 'none' };
  const raw = draft as Record<string, unknown>;
  if (!Array.isArray(raw['primitives']) || raw['primitives'].length === 0) return { kind: 'empty' };
  const parsed = partDocumentSchema.safeParse(raw);
  if (!parsed.success)
    return {
      kind: 'invalid',
      problems: parsed.error.issues.slice(0, SHOWN_PROBLEMS).map((i) => `${formatJsonPath(i.path) || 'The document'} ${i.message}`),
    };
  return { kind: 'ready', raw, doc: parsed.data, primitives: primitiveParameters(parsed.data) };
}
