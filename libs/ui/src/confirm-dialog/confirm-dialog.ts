import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogTitle } from '@angular/material/dialog';

/** What the confirm dialog asks. */
export interface ConfirmRequest {
  /** Dialog title, a question ("Remove Ada from the workspace?"). */
  title: string;
  /** What will happen, in a sentence. */
  message: string;
  /** Label of the confirming button ("Remove"). */
  confirmLabel: string;
  /** Shows the confirming button in the error colour. */
  destructive?: boolean;
}

/** A yes/no dialog; closes with `true` when confirmed. */
@Component({
  selector: 'tw-confirm-dialog',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton],
  template: `
    <h2 mat-dialog-title>{{ request.title }}</h2>
    <mat-dialog-content>
      <p>{{ request.message }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" data-testid="confirm-cancel">Cancel</button>
      <button
        mat-flat-button
        type="button"
        [class.tw-destructive]="request.destructive"
        [mat-dialog-close]="true"
        data-testid="confirm-accept"
      >
        {{ request.confirmLabel }}
      </button>
    </mat-dialog-actions>
  `,
  styles: `
    .tw-destructive {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
})
export class ConfirmDialog {
  /** The question being asked. */
  protected readonly request = inject<ConfirmRequest>(MAT_DIALOG_DATA);
}
