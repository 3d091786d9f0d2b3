import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogContent, MatDialogRef, MatDialogTitle } from '@angular/material/dialog';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { PartsApi, toApiError } from '@tumblewise/api-client';
import { createPartBodySchema, type GearCategory, type Part } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';
import { starterDraft } from './starter-draft';

/** What the dialog needs to know. */
export interface NewPartDialogData {
  workspaceId: string;
  projectId: string;
  category: GearCategory;
}

/** Creates a part with an empty starter draft; closes with the new part. */
@Component({
  selector: 'tw-new-part-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatFormField,
    MatLabel,
    MatError,
    MatInput,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
  ],
  template: `
    <h2 mat-dialog-title>New part</h2>
    <form [formGroup]="form" (ngSubmit)="createPart()" novalidate>
      <mat-dialog-content>
        <p>A part is one solid of the gear, sketched from primitives. Each saved variant keeps its spin report.</p>
        <tw-error-banner [message]="failure()" />
        <mat-form-field appearance="outline" class="tw-wide">
          <mat-label>Part name</mat-label>
          <input matInput formControlName="name" data-testid="part-name" />
          <mat-error>{{ form.controls.name | fieldError: 'Part name' }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" (click)="cancel()">Cancel</button>
        <button mat-flat-button type="submit" [disabled]="submitting()" data-testid="part-create">
          {{ submitting() ? 'Creating…' : 'Create part' }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .tw-wide {
      width: 100%;
    }
  `,
})
export class NewPartDialog {
  private readonly data = inject<NewPartDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<NewPartDialog, Part>>(MatDialogRef);
  private readonly partsApi = inject(PartsApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, zodValidator(createPartBodySchema.shape.name)]],
  });
  protected readonly submitting = signal(false);
  protected readonly failure = signal<string | null>(null);

  /** Creates the part and closes the dialog with it. */
  protected createPart(): void {
    this.failure.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const name = this.form.getRawValue().name.trim();
    this.submitting.set(true);
    this.partsApi.create(this.data.workspaceId, this.data.projectId, { name, draft: starterDraft(name, this.data.category) }).subscribe({
      next: (part) => {
        this.submitting.set(false);
        this.dialogRef.close(part);
      },
      error: (error: unknown) => {
        const fault = toApiError(error);
        this.submitting.set(false);
        if (!applyServerError(this.form, fault)) this.failure.set(fault.message);
      },
    });
  }

  /** Closes without creating. */
  protected cancel(): void {
    this.dialogRef.close();
  }
}
