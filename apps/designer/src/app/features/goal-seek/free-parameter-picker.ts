import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { ReactiveFormsModule } from '@angular/forms';
import { MatError, MatFormField, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { FieldErrorPipe } from '@tumblewise/ui';
import type { ParameterField } from './free-parameter-model';
import { GoalSeekForm } from './goal-seek-form';

/**
 * The draft's primitives with their numeric fields (the editor's labels, values in its units). A
 * click on a field marks it free, with default bounds the designer edits; another click fixes it.
 */
@Component({
  selector: 'tw-free-parameter-picker',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatSuffix, MatInput, FieldErrorPipe],
  templateUrl: './free-parameter-picker.html',
  styleUrl: './free-parameter-picker.scss',
})
export class FreeParameterPicker {
  protected readonly state = inject(GoalSeekForm);
  protected readonly count = computed(() => this.state.freeKeys().length);
  protected readonly full = computed(() => this.count() >= this.state.maxFree);

  /** Marks a field free, or fixed again. */
  protected toggle(field: ParameterField): void {
    this.state.toggleFree(field);
  }

  /** A test id for a field's controls (`rod-position.2`). */
  protected idOf(field: ParameterField): string {
    return `${field.primitive}-${field.parameter}`;
  }
}
