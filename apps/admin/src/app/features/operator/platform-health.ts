import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { OperatorApi, toApiError, type PlatformHealth as Health } from '@tumblewise/api-client';
import { ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { OperatorTabs } from './operator-tabs';

/** One line of the health page: a name, its value, and whether it is a service that is up. */
export interface HealthLine {
  name: string;
  value: string;
  up: boolean | null;
}

/** The health page's content: overall status, the services, and groups of figures. */
export interface HealthView {
  status: 'ok' | 'degraded' | 'unavailable';
  checkedAt: string | null;
  services: HealthLine[];
  groups: { title: string; lines: HealthLine[] }[];
}

const NAMES: Record<string, string> = {
  database: 'Database',
  mail: 'Mail server',
  payment: 'Payment provider',
  workspacesByState: 'Workspaces by state',
  studies: 'Scatter studies in the queue',
  process: 'Server process',
  uptimeSeconds: 'Uptime (s)',
  rssMegabytes: 'Memory (MB)',
  active: 'Active',
  past_due: 'Past due',
  read_only: 'Read-only',
  suspended: 'Suspended',
  queued: 'Queued',
  running: 'Running',
};
const nameOf = (key: string) => NAMES[key] ?? key;
const isPlain = (value: unknown) => typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean';
const line = (key: string, value: unknown): HealthLine => ({
  name: nameOf(key),
  value: String(value),
  up: value === 'up' ? true : value === 'down' ? false : null,
});

/**
 * Reads either health answer: the operator's (`services` plus groups of figures) or the public
 * one (flat `up`/`down` entries and a `status`). Without a status, it follows from the services:
 * the database down is unavailable, any other service down is degraded.
 */
export function healthView(health: Health): HealthView {
  const services = health['services'] && typeof health['services'] === 'object' ? (health['services'] as Record<string, unknown>) : health;
  const serviceLines = Object.entries(services)
    .filter(([key, value]) => (value === 'up' || value === 'down') && key !== 'status')
    .map(([key, value]) => line(key, value));
  const groups = Object.entries(health)
    .filter(([key, value]) => key !== 'services' && value && typeof value === 'object' && !Array.isArray(value) && key !== 'error')
    .map(([key, value]) => ({
      title: nameOf(key),
      lines: Object.entries(value as Record<string, unknown>)
        .filter(([, v]) => isPlain(v))
        .map(([k, v]) => line(k, v)),
    }));
  const given = health.status;
  const derived = serviceLines.some((l) => l.name === nameOf('database') && l.up === false)
    ? 'unavailable'
    : serviceLines.some((l) => l.up === false)
      ? 'degraded'
      : 'ok';
  const status = given === 'ok' || given === 'degraded' || given === 'unavailable' ? given : derived;
  return { status, checkedAt: typeof health.checkedAt === 'string' ? health.checkedAt : null, services: serviceLines, groups };
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
        } @else if (view(); as h) {
          <p class="tw-overall" [class.tw-bad]="h.status !== 'ok'" data-testid="health-status" [attr.data-status]="h.status">
            <span class="material-icons" aria-hidden="true">{{ h.status === 'ok' ? 'check_circle' : 'warning' }}</span>
            {{
              h.status === 'ok' ? 'All services answer' : h.status === 'degraded' ? 'Degraded: some services do not answer' : 'Unavailable'
            }}
          </p>
          <h2>Services</h2>
          <ul class="tw-services" aria-label="Services">
            @for (line of h.services; track line.name) {
              <li data-testid="health-service" [attr.data-up]="line.up">
                <span class="material-icons" aria-hidden="true">{{
                  line.up === true ? 'check' : line.up === false ? 'close' : 'info'
                }}</span>
                <span class="tw-service-name">{{ line.name }}</span>
                <span>{{ line.value }}</span>
              </li>
            }
          </ul>
          @for (group of h.groups; track group.title) {
            <h2>{{ group.title }}</h2>
            @if (group.lines.length) {
              <ul class="tw-services" [attr.aria-label]="group.title">
                @for (line of group.lines; track line.name) {
                  <li data-testid="health-figure">
                    <span class="tw-service-name">{{ line.name }}</span>
                    <span>{{ line.value }}</span>
                  </li>
                }
              </ul>
            } @else {
              <p class="tw-muted">None.</p>
            }
          }
          @if (h.checkedAt) {
            <p class="tw-muted">Checked {{ h.checkedAt | date: 'medium' }}</p>
          }
        }
        <button mat-stroked-button type="button" (click)="recheck()" [disabled]="health.isLoading()" data-testid="health-recheck">
          Check again
        </button>
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
    h2 {
      font: var(--mat-sys-title-small);
      margin: 16px 0 4px;
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
  protected readonly view = computed(() => {
    const value = this.health.value();
    return value ? healthView(value) : null;
  });

  /** Asks the services again. */
  protected recheck(): void {
    this.health.reload();
  }
}
