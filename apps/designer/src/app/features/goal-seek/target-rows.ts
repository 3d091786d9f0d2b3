import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { DesignFigure } from '@tumblewise/shared';
import { FieldErrorPipe } from '@tumblewise/ui';
import { GoalSeekForm } from './goal-seek-form';
import { FIGURE_LABELS, FIGURE_UNITS, FIGURES, needsGrip, showFigure, TARGET_KINDS } from './target-model';

/**
 * The targets: one row per figure (our names), how it must hold (equal to, at least, at most) and
 * the value in the figure's display unit, with the draft's value now beside it. Figures measured
 * in the grip frame are offered only when the draft has one.
 */
@Component({
  selector: 'tw-target-rows',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatButton, MatIconButton, MatFormField, MatLabel, MatHint, MatError, MatSuffix, MatInput, FieldErrorPipe],
  templateUrl: './target-rows.html',
  styleUrl: './target-rows.scss',
})
export class TargetRows {
  protected readonly state = inject(GoalSeekForm);
  protected readonly figures = FIGURES;
  protected readonly labels = FIGURE_LABELS;
  protected readonly units = FIGURE_UNITS;
  protected readonly kinds = TARGET_KINDS;
  protected readonly needsGrip = needsGrip;
  protected readonly full = computed(() => this.state.targetCount() >= this.state.maxTargets);

  /** The draft's value of a figure now, for the row's hint; empty before the analysis arrives. */
  protected now(figure: DesignFigure): string {
    const current = this.state.current();
    return figure in current ? `now ${showFigure(figure, current[figure])}` : '';
  }

  /** Adds a row. */
  protected addTarget(): void {
    this.state.addTarget();
  }

  /** Removes a row. */
  protected removeTarget(index: number): void {
    this.state.removeTarget(index);
  }
}
