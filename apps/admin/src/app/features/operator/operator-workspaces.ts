import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { MatSort, MatSortHeader, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { OperatorApi, toApiError } from '@tumblewise/api-client';
import type { OperatorWorkspace } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { debounceTime, distinctUntilChanged, map } from 'rxjs';
import { WORKSPACE_STATE_LABELS, workspaceStateLabel } from '../../core/workspace-state-labels';
import { SUBSCRIPTION_STATUS_LABELS } from '../subscription/subscription-labels';
import { OperatorTabs } from './operator-tabs';
import { toOperatorQuery, type OperatorFilter, type OperatorSort } from './operator-query';
import { SuspensionDialog, type SuspensionDialogData } from './suspension-dialog';

/** Every workspace of the platform, filtered and sorted on the server; suspend or restore one with a reason. */
@Component({
  selector: 'tw-operator-workspaces',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    MatFormField,
    MatLabel,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    MatSort,
    MatSortHeader,
    MatTableModule,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    OperatorTabs,
  ],
  templateUrl: './operator-workspaces.html',
  styleUrl: './operator-workspaces.scss',
})
export class OperatorWorkspaces {
  private readonly api = inject(OperatorApi);
  private readonly dialog = inject(MatDialog);

  protected readonly states = Object.entries(WORKSPACE_STATE_LABELS) as [OperatorWorkspace['state'], string][];
  protected readonly stateLabel = workspaceStateLabel;
  protected readonly columns = ['name', 'created', 'plan', 'seats', 'members', 'state', 'lastActivity', 'actions'];

  protected readonly filterForm = inject(NonNullableFormBuilder).group({ q: '', state: '' as OperatorFilter['state'] });
  /** The filter once typing has settled. */
  private readonly filterValue = toSignal(
    this.filterForm.valueChanges.pipe(
      debounceTime(250),
      map(() => this.filterForm.getRawValue()),
      distinctUntilChanged((a, b) => a.q.trim() === b.q.trim() && a.state === b.state),
    ),
    { initialValue: this.filterForm.getRawValue() },
  );
  protected readonly sort = signal<OperatorSort>({ active: 'created', direction: 'desc' });

  protected readonly workspaces = rxResource({
    params: () => toOperatorQuery(this.filterValue(), this.sort()),
    stream: ({ params }) => this.api.workspaces(params),
  });
  protected readonly loadError = computed(() => {
    const error = this.workspaces.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly hasFilter = computed(() => !!this.filterValue().q.trim() || !!this.filterValue().state);
  protected readonly notice = signal<string | null>(null);

  /** A subscription status as written on screen. */
  protected subscriptionLabel(status: string): string {
    return (SUBSCRIPTION_STATUS_LABELS as Record<string, string>)[status] ?? status;
  }

  /** The sort header changed: ask the server again. */
  protected sortWorkspaces(sort: Sort): void {
    this.sort.set({ active: sort.active, direction: sort.direction });
  }

  /** Empties the filters. */
  protected clearFilters(): void {
    this.filterForm.reset({ q: '', state: '' });
  }

  /** Opens the reason dialog for a suspension or a restoration and puts the answer in the table. */
  protected changeStanding(workspace: OperatorWorkspace, action: SuspensionDialogData['action']): void {
    this.notice.set(null);
    this.dialog
      .open<SuspensionDialog, SuspensionDialogData, OperatorWorkspace>(SuspensionDialog, {
        data: { action, workspace },
        autoFocus: 'first-tabbable',
      })
      .afterClosed()
      .subscribe((updated) => {
        if (!updated) return;
        this.workspaces.update((list) => list?.map((w) => (w.id === updated.id ? updated : w)));
        this.notice.set(`${updated.name} is now ${workspaceStateLabel(updated.state).toLowerCase()}.`);
      });
  }

  /** Loads the list again after a failure. */
  protected reloadWorkspaces(): void {
    this.workspaces.reload();
  }
}
