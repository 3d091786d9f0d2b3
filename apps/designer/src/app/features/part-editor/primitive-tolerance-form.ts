import { ChangeDetectionStrategy, Component, computed, effect, input, output, untracked } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { Material } from '@tumblewise/shared';
import { issueAt, type FieldIssues } from './document-issues';
import type { DraftPrimitive } from './draft-document';
import type { PrimitiveChange } from './primitive-form';
import { densityDefaultHint, hasSizeTolerance, toleranceToForm, withTolerance } from './tolerance-fields';

/**
 * The manufacturing tolerances of the selected primitive, kept in its part document and used as the
 * scatter study's starting values: ± % density (mass for a point mass) and ± mm on its dimensions.
 * Rebuilt when another primitive is selected or the document changed elsewhere (`revision`).
 */
@Component({
  selector: 'tw-primitive-tolerance-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatError, MatSuffix, MatInput],
  template: `
    <fieldset class="tw-tolerance" data-testid="tolerance-form" (focusout)="editEnded.emit()">
      <legend>Manufacturing tolerance <span class="tw-muted">(one standard deviation, for the scatter study)</span></legend>
      <div class="tw-row">
        <mat-form-field appearance="outline" class="tw-number" subscriptSizing="dynamic">
          <mat-label>{{ isPoint() ? 'Mass' : 'Density' }} ±</mat-label>
          <input matInput type="number" step="any" min="0" [formControl]="density" data-testid="field-tolerance-density" />
          <span matTextSuffix>%</span>
          <mat-hint>{{ densityHint() }}</mat-hint>
          <mat-error data-testid="error-tolerance-density">{{ densityError() }}</mat-error>
        </mat-form-field>
        @if (hasSize()) {
          <mat-form-field appearance="outline" class="tw-number" subscriptSizing="dynamic">
            <mat-label>Dimensions ±</mat-label>
            <input matInput type="number" step="any" min="0" [formControl]="size" data-testid="field-tolerance-size" />
            <span matTextSuffix>mm</span>
            <mat-hint>Empty: 0 mm (exact)</mat-hint>
            <mat-error data-testid="error-tolerance-size">{{ sizeError() }}</mat-error>
          </mat-form-field>
        }
      </div>
    </fieldset>
  `,
  styles: `
    .tw-tolerance {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 8px;
      margin: 12px 0 0;
      padding: 8px 12px 12px;
    }
    legend {
      font: var(--mat-sys-label-large);
      padding: 0 4px;
    }
    .tw-muted {
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
    }
    .tw-row {
      display: flex;
      flex-wrap: wrap;
      gap: 8px;
    }
    .tw-number {
      width: 19rem;
    }
  `,
})
export class PrimitiveToleranceForm {
  /** The primitive shown. */
  readonly primitive = input.required<DraftPrimitive>();
  /** Its index in the document (for the field paths of problems). */
  readonly index = input.required<number>();
  /** Bumped by the editor when the document changed other than through a form. */
  readonly revision = input(0);
  /** Problems by JSON path for the whole document. */
  readonly issues = input<FieldIssues>({});
  /** Materials, for the default the empty density field stands for. */
  readonly materials = input<readonly Material[]>([]);
  /** Shows the values without letting them change (reviewers). */
  readonly readonly = input(false);
  /** Emitted with the primitive after each edit. */
  readonly changed = output<PrimitiveChange>();
  /** Emitted when a field loses focus (ends one undo step). */
  readonly editEnded = output<void>();

  protected readonly isPoint = computed(() => this.primitive().shape === 'point');
  protected readonly hasSize = computed(() => hasSizeTolerance(this.primitive().shape));
  protected readonly densityHint = computed(() => densityDefaultHint(this.primitive(), this.materials()));
  /** The schema's (or server's) problems at the two fields, in words. */
  private readonly densityIssue = computed(() => issueAt(this.issues(), `primitives[${this.index()}].tolerance.density`));
  private readonly sizeIssue = computed(() => issueAt(this.issues(), `primitives[${this.index()}].tolerance.size`));
  protected readonly densityError = computed(() => `${this.isPoint() ? 'Mass' : 'Density'} scatter ${this.densityIssue() ?? ''}`);
  protected readonly sizeError = computed(() => `Dimension scatter ${this.sizeIssue() ?? ''}`);
  protected readonly density = new FormControl<number | null>(null);
  protected readonly size = new FormControl<number | null>(null);
  private builtFor = '';

  constructor() {
    // A named problem makes its control invalid: a validator, so the form directive's own checks keep
    // it (added here, not at construction, because it reads inputs that are set after the constructor).
    this.density.addValidators(() => (this.densityIssue() ? { rule: true } : null));
    this.size.addValidators(() => (this.sizeIssue() ? { rule: true } : null));
    effect(() => {
      const key = `${this.index()}:${this.revision()}:${this.primitive().shape}`;
      const primitive = this.primitive();
      const readonly = this.readonly();
      untracked(() => {
        if (key !== this.builtFor) this.fill(primitive, readonly);
        this.builtFor = key;
      });
    });
    effect(() => {
      this.densityIssue();
      this.sizeIssue();
      untracked(() => {
        for (const c of [this.density, this.size]) {
          c.updateValueAndValidity({ emitEvent: false });
          if (c.invalid) c.markAsTouched();
        }
      });
    });
    this.density.valueChanges.subscribe(() => this.emit('tolerance.density'));
    this.size.valueChanges.subscribe(() => this.emit('tolerance.size'));
  }

  private fill(primitive: DraftPrimitive, readonly: boolean): void {
    const value = toleranceToForm(primitive);
    this.density.setValue(value.densityPercent, { emitEvent: false });
    this.size.setValue(value.sizeMm, { emitEvent: false });
    for (const c of [this.density, this.size]) (readonly ? c.disable({ emitEvent: false }) : c.enable({ emitEvent: false }));
  }

  private emit(field: string): void {
    const primitive = withTolerance(this.primitive(), { densityPercent: this.density.value, sizeMm: this.size.value });
    this.changed.emit({ primitive, field });
  }
}
