import { formatDate } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID } from '@angular/core';
import { workspaceNotice, type WorkspaceStandingView } from './workspace-notice';

/** A strip under the top bar while the current workspace is past due, read-only or suspended. */
@Component({
  selector: 'tw-workspace-state-banner',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @if (notice(); as shown) {
      <div
        class="tw-state-banner"
        [class]="'tw-state-' + shown.state"
        role="status"
        data-testid="workspace-state-banner"
        [attr.data-state]="shown.state"
      >
        <span class="material-icons" aria-hidden="true">{{ shown.icon }}</span>
        <p>
          <strong>{{ shown.title }}.</strong> {{ shown.text }}
        </p>
      </div>
    }
  `,
  styles: `
    .tw-state-banner {
      display: flex;
      align-items: center;
      gap: 12px;
      padding: 8px 24px;
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .tw-state-suspended,
    .tw-state-read_only {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    p {
      margin: 0;
    }
  `,
})
export class WorkspaceStateBanner {
  private readonly locale = inject(LOCALE_ID);

  /** The current workspace's standing; nothing is shown while it is active or unknown. */
  readonly standing = input<WorkspaceStandingView | null>(null);

  protected readonly notice = computed(() => workspaceNotice(this.standing(), (iso) => formatDate(iso, 'mediumDate', this.locale)));
}
