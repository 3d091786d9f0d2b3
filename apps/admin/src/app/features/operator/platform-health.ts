import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { OperatorApi, toApiError, type PlatformHealth as Health } from '@tumblewise/api-client';
import { ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { OperatorTabs } from './operator-tabs';

/** A service line of the health answer. */
interface ServiceLine {
  name: string;
  value: string;
  up: boolean | null;
}

const SERVICE_NAMES: Record<string, string> = { database: 'Database', mail: 'Mail server', payment: 'Payment provider', jobs: 'Job queue', compute: 'Compute workers' };

/** The services' answers under the overall status: `up`/`down` entries first, other figures after. */
export function healthLines(health: Health): ServiceLine[] {
  return Object.entries(health)
    .filter(([key, value]) => key !== 'status' && key !== 'checkedAt' && key !== 'error' && (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean'))
    .map(([key, value]) => ({ name: SERVICE_NAMES[key] ?? key, value: String(value), up: value === 'up' ? true : value === 'down' ? false : null }))
    .sort((a, b) => Number(a.up === null) - Number(b.up === null));
}

/** Whether the platform's services answer. */
@Component({
  selector: 'tw-platform-health',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButton, PageHeader, ErrorBanner, LoadingState, OperatorTabs],
  template: `
    <div class="tw-page">
      <tw-page-header heading="Platform" subtitle="Whether the services behind this installation answer." />
      <tw-operator-tabs>
        @if (health.isLoading() && !health.value()) {
          <tw-loading-state label="Checking the services…" />
        } @else if (loadError(); as message) {
          <tw-error-banner [message]="message" [retryable]="true" (retry)="recheck()" />
        } @else if (health.value(); as h) {
          <p class="tw-overall" [class.tw-bad]="h.status !== 'ok'" data-testid="health-status" [attr.data-status]="h.status">
            <span class="material-icons" aria-hidden="true">{{ h.status === 'ok' ? 'check_circle' : 'warning' }}</span>
            {{ h.status === 'ok' ? 'All services answer' : h.status === 'degraded' ? 'Degraded: some services do not answer' : 'Unavailable' }}
          </p>
          <ul class="tw-services" aria-label="Services">
            @for (line of lines(); track line.name) {
              <li data-testid="health-service" [attr.data-up]="line.up">
                <span class="material-icons" aria-hidden="true">{{ line.up === true ? 'check' : line.up === false ? 'close' : 'info' }}</span>
                <span class="tw-service-name">{{ line.name }}</span>
                <span>{{ line.value }}</span>
              </li>
            }
          </ul>
          @if (h.checkedAt) {
            <p class="tw-muted">Checked {{ h.checkedAt | date: 'medium' }}</p>
          }
        }
        <button mat-stroked-button type="button" (click)="recheck()" [disabled]="health.isLoading()" data-testid="health-recheck">Check again</button>
      </tw-operator-tabs>
    </div>
  `,
  styles: `
    .tw-overall {
      display: flex;
      align-items: center;
      gap: 8px;
      font: var(--mat-sys-title-medium);
      color: var(--mat-sys-primary);
    }
    .tw-bad {
      color: var(--mat-sys-error);
    }
    .tw-services {
      list-style: none;
      padding: 0;
      max-width: 420px;
      li {
        display: flex;
        align-items: center;
        gap: 8px;
        padding: 6px 0;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
      }
      li[data-up='false'] {
        color: var(--mat-sys-error);
      }
    }
    .tw-service-name {
      flex: 1;
    }
    .tw-muted {
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class PlatformHealth {
  private readonly api = inject(OperatorApi);

  protected readonly health = rxResource({ stream: () => this.api.health() });
  protected readonly loadError = computed(() => {
    const error = this.health.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly lines = computed(() => {
    const value = this.health.value();
    return value ? healthLines(value) : [];
  });

  /** Asks the services again. */
  protected recheck(): void {
    this.health.reload();
  }
}
