import { solveRequestSchema, sweepRequestSchema } from '../../schemas/design-targets';
import type { PartDocument } from '../../schemas/part-document';
import { EngineInputError, formatPath } from '../part/engine-input-error';
import type { DesignOptions } from './design-figures';
import { goalSeek, type GoalSeekResult } from './goal-seek';
import { sweepDesign, type SweepProgress, type SweepResult } from './sweep';

/** The body of `POST /solve` or `POST /sweep` as sent (untrusted JSON), checked as a whole: errors name paths like `part.primitives[0].radius`. */
function parseRequest<T extends { part: PartDocument }>(
  schema: {
    safeParse: (
      x: unknown,
    ) => { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } };
  },
  input: unknown,
): T {
  const parsed = schema.safeParse(input);
  if (!parsed.success)
    throw new EngineInputError(
      'invalid',
      parsed.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    );
  return parsed.data;
}

/** A goal seek from its request body (`{ part, free, targets }`). Throws EngineInputError as goalSeek does. */
export function solveDesignRequest(input: unknown, options: DesignOptions = {}): GoalSeekResult {
  const { part, free, targets } = parseRequest(solveRequestSchema, input);
  return goalSeek(part, { free, targets }, options);
}

/** A sweep from its request body (`{ part, axes, figures }`). Throws EngineInputError as sweepDesign does. */
export function sweepDesignRequest(input: unknown, options: DesignOptions = {}, onProgress?: SweepProgress): SweepResult {
  const { part, axes, figures } = parseRequest(sweepRequestSchema, input);
  return sweepDesign(part, { axes, figures }, options, onProgress);
}
