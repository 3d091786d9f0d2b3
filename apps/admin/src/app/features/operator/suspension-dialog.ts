import { ChangeDetectionStrategy, Component, ElementRef, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import {
  MAT_DIALOG_DATA,
  MatDialogActions,
  MatDialogClose,
  MatDialogContent,
  MatDialogRef,
  MatDialogTitle,
} from '@angular/material/dialog';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { OperatorApi, toApiError } from '@tumblewise/api-client';
import { suspensionBodySchema, type OperatorWorkspace } from '@tumblewise/shared';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid, zodValidator } from '@tumblewise/ui';

/** What the dialog does: suspend or restore one workspace. */
export interface SuspensionDialogData {
  action: 'suspend' | 'restore';
  workspace: OperatorWorkspace;
}

/** Asks for the reason (required, recorded in the audit trail), then suspends or restores; closes with the updated row. */
@Component({
  selector: 'tw-suspension-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    MatDialogTitle,
    MatDialogContent,
    MatDialogActions,
    MatDialogClose,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatInput,
    MatButton,
    ErrorBanner,
    FieldErrorPipe,
  ],
  template: `
    <h2 mat-dialog-title>{{ suspending ? 'Suspend' : 'Restore' }} {{ data.workspace.name }}?</h2>
    <form [formGroup]="form" (ngSubmit)="confirm()" novalidate aria-label="Reason">
      <mat-dialog-content>
        <p>
          @if (suspending) {
            Its members can still sign in and read, but nothing can be saved until the workspace is restored. They see the reason below.
          } @else {
            Its members can save again at once.
          }
        </p>
        <tw-error-banner [message]="formError()" />
        <mat-form-field appearance="outline" class="tw-reason">
          <mat-label>Reason</mat-label>
          <textarea matInput formControlName="reason" rows="3" data-testid="suspension-reason"></textarea>
          <mat-hint>Recorded in the audit trail{{ suspending ? ' and shown to the members' : '' }}.</mat-hint>
          <mat-error data-testid="suspension-reason-error">{{ form.controls.reason | fieldError: 'Reason' }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" [mat-dialog-close]="undefined" data-testid="suspension-cancel">Cancel</button>
        <button mat-flat-button type="submit" [class.tw-destructive]="suspending" [disabled]="saving()" data-testid="suspension-confirm">
          {{ saving() ? 'Saving…' : suspending ? 'Suspend' : 'Restore' }}
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .tw-reason {
      width: min(440px, 75vw);
    }
    .tw-destructive {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
})
export class SuspensionDialog {
  protected readonly data = inject<SuspensionDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject<MatDialogRef<SuspensionDialog, OperatorWorkspace>>(MatDialogRef);
  private readonly api = inject(OperatorApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  protected readonly suspending = this.data.action === 'suspend';
  protected readonly form = inject(NonNullableFormBuilder).group({
    reason: ['', [zodValidator(suspensionBodySchema.shape.reason)]],
  });
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  /** Sends the change with the reason; nothing is sent without one. */
  protected confirm(): void {
    this.formError.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const reason = this.form.getRawValue().reason.trim();
    const id = this.data.workspace.id;
    this.saving.set(true);
    (this.suspending ? this.api.suspend(id, reason) : this.api.restore(id, reason)).subscribe({
      next: (updated) => {
        this.saving.set(false);
        this.dialogRef.close(updated);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        const fault = toApiError(error);
        if (!applyServerError(this.form, fault)) this.formError.set(fault.message);
      },
    });
  }
}
