import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatProgressSpinner } from '@angular/material/progress-spinner';

/** A spinner with a label, announced politely to screen readers. */
@Component({
  selector: 'tw-loading-state',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatProgressSpinner],
  template: `
    <div class="tw-loading" role="status" data-testid="loading">
      <mat-progress-spinner mode="indeterminate" diameter="28" [attr.aria-label]="label()" />
      <span>{{ label() }}</span>
    </div>
  `,
  styles: `
    .tw-loading {
      display: flex;
      align-items: center;
      gap: 12px;
      padding: 24px 8px;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class LoadingState {
  /** What is loading ("Loading members…"). */
  readonly label = input('Loading…');
}
