import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { createVariantBodySchema } from '@tumblewise/shared';
import { FieldErrorPipe, zodValidator } from '@tumblewise/ui';

/** What the dialog shows. */
export interface SaveVariantDialogData {
  /** Number the new variant will get. */
  nextNumber: number;
}

/** What the designer gave the new variant. */
export interface SaveVariantChoice {
  label: string;
  notes: string;
}

const rules = createVariantBodySchema.shape;

/** Asks for a label and notes before the document is frozen as a new variant. */
@Component({
  selector: 'tw-save-variant-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatInput,
    MatButton,
    FieldErrorPipe,
  ],
  template: `
    <h2 mat-dialog-title>Save as variant {{ data.nextNumber }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content>
        <p>The current document is frozen with its spin report. You can keep editing the draft afterwards.</p>
        <div class="tw-form">
          <mat-form-field appearance="outline">
            <mat-label>Label (optional)</mat-label>
            <input matInput formControlName="label" data-testid="variant-label" />
            <mat-hint>What is different, e.g. "longer throat"</mat-hint>
            <mat-error>{{ form.controls.label | fieldError: 'Label' }}</mat-error>
          </mat-form-field>
          <mat-form-field appearance="outline">
            <mat-label>Notes (optional)</mat-label>
            <textarea matInput formControlName="notes" rows="3" data-testid="variant-notes"></textarea>
            <mat-error>{{ form.controls.notes | fieldError: 'Notes' }}</mat-error>
          </mat-form-field>
        </div>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" (click)="cancel()">Cancel</button>
        <button mat-flat-button type="submit" data-testid="variant-save-confirm">Save variant</button>
      </mat-dialog-actions>
    </form>
  `,
})
export class SaveVariantDialog {
  protected readonly data = inject<SaveVariantDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<SaveVariantDialog, SaveVariantChoice>>(MatDialogRef);
  protected readonly form = inject(NonNullableFormBuilder).group({
    label: ['', [zodValidator(rules.label)]],
    notes: ['', [zodValidator(rules.notes)]],
  });

  /** Closes with the label and notes. */
  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { label, notes } = this.form.getRawValue();
    this.dialogRef.close({ label: label.trim(), notes: notes.trim() });
  }

  /** Closes without saving. */
  protected cancel(): void {
    this.dialogRef.close();
  }
}
