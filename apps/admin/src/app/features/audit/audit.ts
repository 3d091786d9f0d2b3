import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { AbstractControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatPaginator, PageEvent } from '@angular/material/paginator';
import { MatOption, MatSelect } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { AuditApi, MembersApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { AuditEvent } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, FieldErrorPipe, LoadingState, PageHeader } from '@tumblewise/ui';
import { debounceTime, distinctUntilChanged, map, tap } from 'rxjs';
import { actionLabel, BILLING_ACTION_PREFIX, FILTER_ACTIONS } from './action-labels';
import { rangeIsReversed, toAuditQuery, type AuditFilterValue } from './audit-filter';

function rangeInOrder(group: AbstractControl): ValidationErrors | null {
  const to = group.get('to');
  const reversed = rangeIsReversed(group.value as AuditFilterValue);
  if (reversed) to?.setErrors({ ...(to.errors ?? {}), reversed: 'The end date is before the start date.' });
  else if (to?.errors?.['reversed']) to.setErrors(null);
  return null;
}

/** The workspace's audit trail: who did what and when, paged on the server and filterable. */
@Component({
  selector: 'tw-audit',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    MatFormField,
    MatLabel,
    MatError,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    MatPaginator,
    MatTableModule,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
  ],
  templateUrl: './audit.html',
  styleUrl: './audit.scss',
})
export class Audit {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly auditApi = inject(AuditApi);
  private readonly membersApi = inject(MembersApi);

  protected readonly actions = FILTER_ACTIONS;
  protected readonly billingPrefix = BILLING_ACTION_PREFIX;
  protected readonly actionLabel = actionLabel;
  protected readonly columns = ['at', 'action', 'actor', 'target', 'details'];
  protected readonly pageSizes = [10, 25, 50, 100];

  protected readonly filterForm = inject(NonNullableFormBuilder).group(
    { action: '', actor: '', from: '', to: '' },
    { validators: [rangeInOrder] },
  );
  protected readonly page = signal(1);
  protected readonly pageSize = signal(25);
  /** The filter once typing has settled; a new filter starts again from the first page. */
  private readonly filterValue = toSignal(
    this.filterForm.valueChanges.pipe(
      debounceTime(250),
      map(() => this.filterForm.getRawValue()),
      distinctUntilChanged((a, b) => JSON.stringify(a) === JSON.stringify(b)),
      tap(() => this.page.set(1)),
    ),
    { initialValue: this.filterForm.getRawValue() },
  );

  /** Members of the workspace, for the actor filter. */
  protected readonly members = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.membersApi.list(workspaceId),
  });
  protected readonly events = rxResource({
    params: () => {
      const workspaceId = this.workspace.workspaceId();
      const value = this.filterValue();
      if (!workspaceId || rangeIsReversed(value)) return undefined;
      return { workspaceId, query: toAuditQuery(value, this.page(), this.pageSize()) };
    },
    stream: ({ params }) => this.auditApi.list(params.workspaceId, params.query),
  });
  protected readonly loadError = computed(() => {
    const error = this.events.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly hasFilter = computed(() => Object.values(this.filterValue()).some(Boolean));

  /** Moves to the page the paginator asks for. */
  protected changePage(event: PageEvent): void {
    this.pageSize.set(event.pageSize);
    this.page.set(event.pageIndex + 1);
  }

  /** Whether the quick filter for billing events is on. */
  protected readonly billingOnly = computed(() => this.filterValue().action === BILLING_ACTION_PREFIX);

  /** Shows only billing events (every action under `billing.`), or every action again. */
  protected toggleBillingEvents(): void {
    this.filterForm.controls.action.setValue(this.billingOnly() ? '' : BILLING_ACTION_PREFIX);
  }

  /** Empties every filter field. */
  protected clearFilters(): void {
    this.filterForm.reset({ action: '', actor: '', from: '', to: '' });
  }

  /** Loads the page again after a failure. */
  protected reloadEvents(): void {
    this.events.reload();
  }

  /** A short text of an event's details ("role: designer → admin"). */
  protected detailsText(event: AuditEvent): string {
    return Object.entries(event.details ?? {})
      .filter(([, value]) => value !== null && value !== undefined && typeof value !== 'object')
      .map(([key, value]) => `${key}: ${String(value)}`)
      .join(' · ');
  }
}
