/** One problem with a part document, located by its JSON path (e.g. `primitives[1].innerRadius`). */
export interface InputIssue {
  path: string;
  message: string;
}

/**
 * Thrown by the engine's entry points for input it refuses.
 * `kind: 'invalid'` — the document breaks the schema (the API answers 400);
 * `kind: 'unanalysable'` — the document is well-formed but the part cannot be analysed, e.g. removals
 * that leave no mass or an unknown material (the API answers 422).
 */
export class EngineInputError extends Error {
  override readonly name = 'EngineInputError';
  constructor(
    readonly kind: 'invalid' | 'unanalysable',
    readonly issues: InputIssue[],
  ) {
    super(issues.length > 0 ? `${issues[0].path || 'document'}: ${issues[0].message}` : 'invalid input');
  }

  /** Path of the first issue, for an API error's `field`. */
  get path(): string {
    return this.issues[0]?.path ?? '';
  }
}

/** Formats a zod-style path (['primitives', 1, 'radius']) as `primitives[1].radius` (the API's field names). */
export { formatJsonPath as formatPath } from '../../schemas/json-path';
