import { ChangeDetectionStrategy, Component, DestroyRef, effect, inject, input, output, signal, untracked } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule } from '@angular/forms';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatError, MatFormField, MatHint, MatLabel, MatSuffix } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { GEAR_CATEGORIES } from '@tumblewise/shared';
import { FieldErrorPipe } from '@tumblewise/ui';
import type { Subscription } from 'rxjs';
import { CATEGORY_LABELS } from '../projects/category-labels';
import { issueAt, type FieldIssues } from './document-issues';
import type { DraftDocument } from './draft-document';
import { formValueToSettings, settingsToFormValue, type PartSettingsValue } from './part-settings-model';

/** A change of the part-wide settings and the control that made it. */
export interface SettingsChange {
  changes: Partial<DraftDocument>;
  field: string;
}

type Control = FormControl<string | number | boolean | null>;

/** Where each control's problems are reported by the schema (JSON path). */
const PATHS: Record<string, string> = {
  category: 'category',
  division: 'division',
  rate: 'spin.rate',
  misalignment: 'spin.misalignmentDeg',
  pivot: 'grip.pivotDistance',
  ...Object.fromEntries(
    [0, 1, 2].flatMap((i) => [
      [`spinAxis_${i}`, `spin.axis[${i}]`],
      [`gripPoint_${i}`, `grip.point[${i}]`],
      [`gripAxis_${i}`, `grip.axis[${i}]`],
      [`faceNormal_${i}`, `grip.faceNormal[${i}]`],
    ]),
  ),
};

/**
 * The part-wide settings: gear category, the intended spin (axis, rate in rev/s, misalignment), the
 * dissipative flag and the grip frame the trade figures are taken from.
 */
@Component({
  selector: 'tw-part-settings-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatSuffix,
    MatInput,
    MatSelect,
    MatOption,
    MatCheckbox,
    FieldErrorPipe,
  ],
  templateUrl: './part-settings-form.html',
  styleUrl: './primitive-form.scss',
})
export class PartSettingsForm {
  /** The working document. */
  readonly document = input.required<DraftDocument>();
  /** Bumped when the document changed other than through this form. */
  readonly revision = input(0);
  /** Problems by JSON path. */
  readonly issues = input<FieldIssues>({});
  /** Shows the values without letting them change. */
  readonly readonly = input(false);
  /** Emitted after each edit. */
  readonly changed = output<SettingsChange>();
  /** Emitted when a field loses focus. */
  readonly editEnded = output();

  protected readonly categories = GEAR_CATEGORIES;
  protected readonly categoryLabels = CATEGORY_LABELS;
  protected readonly components = [0, 1, 2] as const;
  protected readonly axisNames = ['x', 'y', 'z'] as const;
  protected readonly form = signal(new FormGroup<Record<string, Control>>({}));
  protected readonly gripOn = signal(false);
  protected readonly javelin = signal(false);
  private subscription: Subscription[] = [];
  private builtFor = -1;

  constructor() {
    effect(() => {
      const revision = this.revision();
      const doc = this.document();
      const readonly = this.readonly();
      untracked(() => {
        if (revision !== this.builtFor) this.build(doc, readonly);
        this.builtFor = revision;
      });
    });
    effect(() => {
      const issues = this.issues();
      const form = this.form();
      untracked(() => this.applyIssues(form, issues));
    });
    inject(DestroyRef).onDestroy(() => this.subscription.forEach((s) => s.unsubscribe()));
  }

  /** Ends the current undo step. */
  protected endEdit(): void {
    this.editEnded.emit();
  }

  private build(doc: DraftDocument, readonly: boolean): void {
    this.subscription.forEach((s) => s.unsubscribe());
    const value = settingsToFormValue(doc);
    const controls: Record<string, Control> = {};
    for (const [name, v] of Object.entries(value)) controls[name] = new FormControl({ value: v, disabled: readonly });
    const form = new FormGroup(controls);
    this.form.set(form);
    this.gripOn.set(value['gripOn'] === true);
    this.javelin.set(value['category'] === 'javelin');
    this.subscription = Object.entries(controls).map(([name, control]) =>
      control.valueChanges.subscribe(() => {
        const current = form.getRawValue() as PartSettingsValue;
        this.gripOn.set(current['gripOn'] === true);
        this.javelin.set(current['category'] === 'javelin');
        this.changed.emit({ changes: formValueToSettings(current, this.document()), field: name });
      }),
    );
    this.applyIssues(form, this.issues());
  }

  private applyIssues(form: FormGroup<Record<string, Control>>, issues: FieldIssues): void {
    for (const [name, control] of Object.entries(form.controls)) {
      const path = PATHS[name];
      const message = path ? issueAt(issues, path) : null;
      if (message) {
        control.setErrors({ rule: message });
        control.markAsTouched();
      } else if (control.errors?.['rule']) {
        control.setErrors(null);
      }
    }
  }
}
