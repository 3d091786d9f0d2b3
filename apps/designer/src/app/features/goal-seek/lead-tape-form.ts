import { ChangeDetectionStrategy, Component, inject, input } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { FieldErrorPipe } from '@tumblewise/ui';
import { GoalSeekForm } from './goal-seek-form';
import { LEAD_TAPE_MIN_GRAMS } from './lead-tape-model';
import { showFigure } from './target-model';

/**
 * The lead-tape preset: "add up to N g between A mm and B mm from the butt to reach swingweight S
 * and balance B". The solver places one point mass on the grip axis within the zone, its mass and
 * place free. Unavailable (with the reason) without an axis-aligned grip frame.
 */
@Component({
  selector: 'tw-lead-tape-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatError, MatSuffix, MatInput, FieldErrorPipe],
  templateUrl: './lead-tape-form.html',
  styleUrl: './lead-tape-form.scss',
})
export class LeadTapeForm {
  /** Why the preset cannot be used on this draft; null when it can. */
  readonly unavailable = input<string | null>(null);

  protected readonly state = inject(GoalSeekForm);
  protected readonly tape = this.state.form.controls.leadTape;
  protected readonly minGrams = LEAD_TAPE_MIN_GRAMS;

  /** The draft's value of a trade figure now, for a hint; empty before the analysis arrives or without it. */
  protected now(figure: 'swingweight' | 'balancePoint'): string {
    const value = this.state.current()[figure];
    return value === null || value === undefined ? '' : `now ${showFigure(figure, value)}`;
  }
}
