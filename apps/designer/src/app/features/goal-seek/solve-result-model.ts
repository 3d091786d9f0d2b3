import type { DesignTarget, PartDocument, SolveAnswer } from '@tumblewise/shared';
import { siToDisplay } from '../part-editor/display-value';
import { formatFigure } from '../spin-report/report-figures';
import { parameterLabel } from './free-parameter-model';
import { FIGURE_LABELS, showFigure, targetText } from './target-model';

/** One changed field of the proposal, for the diff table. */
export interface DiffRow {
  primitive: string;
  /** The editor's label of the field ("Density", "Position z"). */
  field: string;
  /** The draft's value with its unit; "new" for a primitive the draft does not have. */
  from: string;
  to: string;
  /** Change against the draft in per cent ("+12.5 %"); a dash where there is no percentage (new, or from 0). */
  change: string;
}

/** One target as reached, for the achieved table. */
export interface AchievedRow {
  figure: string;
  /** The target in words ("= 320 kg·cm²", "≥ 250 g"). */
  target: string;
  achieved: string;
  met: boolean;
}

/** Longest label and notes a variant takes (the variant schema's limits). */
const MAX_LABEL = 120;
const MAX_NOTES = 5000;

/** A signed percentage ("+12.5 %", "−3.1 %", "0 %"). */
export function signedPercent(fraction: number): string {
  const shown = formatFigure(100 * fraction, 3);
  if (shown === '0') return '0 %';
  return fraction > 0 ? `+${shown} %` : `−${shown.replace(/^-/, '')} %`;
}

/**
 * The diff of a proposal against the draft it was solved from: one row per changed parameter, in the
 * answer's order, values in the editor's display units. `draft` is the document as sent (for shapes
 * and the ids the draft already had); `added` names primitives the request added (lead tape).
 */
export function diffRows(answer: Pick<SolveAnswer, 'changes'>, draft: PartDocument, added: readonly string[] = []): DiffRow[] {
  const shapes = new Map(draft.primitives.map((p) => [p.id, p.shape]));
  return answer.changes.map((c) => {
    const primitive: string | undefined = c.primitive;
    const change = { from: c.from, to: c.to };
    if (primitive === undefined) {
      // A named parameter of the part (SI, as the document states it); every field that refers to it moved with it.
      return {
        primitive: 'part',
        field: `Parameter ${c.parameter}`,
        from: formatFigure(c.from, 5),
        to: formatFigure(c.to, 5),
        change: percentOf(change),
      };
    }
    const isNew = added.includes(primitive);
    const { label, units } = parameterLabel(shapes.get(primitive) ?? 'point', c.parameter);
    const show = (si: number) => `${formatFigure(siToDisplay(si, units), 5)} ${units.unit}`;
    return {
      primitive,
      field: label,
      from: isNew ? 'new' : show(c.from),
      to: show(c.to),
      change: isNew ? '—' : percentOf(change),
    };
  });
}

/** The change from → to in per cent of `from`; a dash from 0. */
function percentOf(c: { from: number; to: number }): string {
  return c.from === 0 ? '—' : signedPercent((c.to - c.from) / Math.abs(c.from));
}

/** The achieved figures against their targets. */
export function achievedRows(answer: Pick<SolveAnswer, 'achieved'>): AchievedRow[] {
  return answer.achieved.map((a) => {
    const t = a.target;
    const target =
      t.value !== undefined
        ? `= ${showFigure(a.figure, t.value)}`
        : t.min !== undefined && t.max !== undefined
          ? `${showFigure(a.figure, t.min)} to ${showFigure(a.figure, t.max)}`
          : t.min !== undefined
            ? `≥ ${showFigure(a.figure, t.min)}`
            : `≤ ${showFigure(a.figure, t.max)}`;
    return { figure: FIGURE_LABELS[a.figure], target, achieved: showFigure(a.figure, a.value), met: a.met };
  });
}

/** Cuts text to `max` characters, ending with an ellipsis when cut. */
function cut(text: string, max: number): string {
  return text.length <= max ? text : `${text.slice(0, max - 1).trimEnd()}…`;
}

/** The label of a proposal saved as a variant: "Goal seek: swingweight 320 kg·cm²" (at most 120 characters). */
export function proposalLabel(targets: readonly DesignTarget[], leadTape = false): string {
  return cut(`${leadTape ? 'Lead tape' : 'Goal seek'}: ${targets.map((t) => targetText(t)).join(', ')}`, MAX_LABEL);
}

/** The notes of a proposal saved as a variant: where it came from and what changed. */
export function proposalNotes(draftVersion: number, status: SolveAnswer['status'], rows: readonly DiffRow[], reason?: string): string {
  const changes = rows.map((r) => `${r.primitive} ${r.field.toLowerCase()} ${r.from} → ${r.to}`).join('; ');
  const how = status === 'met' ? 'every target met' : `closest within the bounds${reason ? ` (${reason})` : ''}`;
  return cut(`Proposed by goal seek from draft version ${draftVersion}, ${how}. Changes: ${changes || 'none'}.`, MAX_NOTES);
}
