import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';

/** A failure message above the content it concerns, with an optional retry. */
@Component({
  selector: 'tw-error-banner',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton],
  template: `
    @if (message()) {
      <div class="tw-error-banner" role="alert" data-testid="error-banner">
        <span class="material-icons" aria-hidden="true">error_outline</span>
        <p>{{ message() }}</p>
        @if (retryable()) {
          <button mat-button type="button" (click)="retry.emit()">Try again</button>
        }
      </div>
    }
  `,
  styles: `
    .tw-error-banner {
      display: flex;
      align-items: center;
      gap: 12px;
      padding: 8px 12px;
      margin: 0 0 16px;
      border-radius: 8px;
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    p {
      flex: 1;
      margin: 0;
    }
    button {
      --mat-button-text-label-text-color: var(--mat-sys-on-error-container);
    }
  `,
})
export class ErrorBanner {
  /** The message; nothing is shown while it is null or empty. */
  readonly message = input<string | null>(null);
  /** Whether to offer a "Try again" button. */
  readonly retryable = input(false);
  /** Emitted when the user asks to try again. */
  readonly retry = output();
}
