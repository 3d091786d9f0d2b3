import type { Part as PartDto } from '@tumblewise/shared';

type Summary = NonNullable<PartDto['latestVariant']>['summary'];

/** The verdict line of a stored spin report, or null when the report lacks it. */
export function verdictSummary(report: unknown): Summary {
  const r = report as { mass?: unknown; spin?: { verdict?: unknown; nearestAxis?: unknown } } | null;
  const verdict = r?.spin?.verdict;
  const nearestAxis = r?.spin?.nearestAxis;
  if (typeof r?.mass !== 'number' || (verdict !== 'steady' && verdict !== 'watch' && verdict !== 'flip-prone')) return null;
  if (nearestAxis !== 'major' && nearestAxis !== 'intermediate' && nearestAxis !== 'minor') return null;
  return { verdict, nearestAxis, mass: r.mass };
}
