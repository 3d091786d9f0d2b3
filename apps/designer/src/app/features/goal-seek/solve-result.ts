import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { PartDocument, SolveAnswer } from '@tumblewise/shared';
import { formatFigure } from '../spin-report/report-figures';
import { tapePlacement } from './lead-tape-model';
import { achievedRows, diffRows } from './solve-result-model';
import { figureToDisplay } from './target-model';

const STATUS_TEXT: Record<SolveAnswer['status'], { icon: string; heading: string }> = {
  met: { icon: 'check_circle', heading: 'Every target met' },
  closest: { icon: 'adjust', heading: 'Closest within the bounds: not every target is met' },
  infeasible: { icon: 'block', heading: 'No valid part within the bounds' },
};

/**
 * A goal seek's answer: the status with the solver's reason, the proposed changes against the draft
 * (from → to in the editor's units, change in per cent) and each target beside what the proposal
 * achieves. The page projects its actions (save as a variant, apply to the draft) below.
 */
@Component({
  selector: 'tw-solve-result',
  changeDetection: ChangeDetectionStrategy.OnPush,
  templateUrl: './solve-result.html',
  styleUrl: './solve-result.scss',
})
export class SolveResult {
  /** The server's answer. */
  readonly answer = input.required<SolveAnswer>();
  /** The draft the request was built from (validated), for the shapes and the draft's values. */
  readonly draft = input.required<PartDocument>();
  /** Primitives the request added to the draft. */
  readonly added = input<readonly string[]>([]);
  /** The draft version the request was built from. */
  readonly draftVersion = input.required<number>();

  protected readonly status = computed(() => STATUS_TEXT[this.answer().status]);
  protected readonly diff = computed(() => diffRows(this.answer(), this.draft(), this.added()));
  protected readonly achieved = computed(() => achievedRows(this.answer()));
  /** "Put 7.3 g of tape 512 mm from the butt", when the request added tape and the answer places it. */
  protected readonly tapeSentence = computed(() => {
    const id = this.added()[0];
    if (!id || this.answer().status === 'infeasible') return null;
    const placed = tapePlacement(this.answer().part as PartDocument, id);
    if (!placed) return null;
    return `Put ${formatFigure(figureToDisplay('mass', placed.mass), 3)} g of tape ${formatFigure(figureToDisplay('balancePoint', placed.distance), 4)} mm from the butt, on the grip axis (primitive “${id}”).`;
  });
}
