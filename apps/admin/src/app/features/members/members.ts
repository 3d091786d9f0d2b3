import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatIconButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect, MatSelectChange } from '@angular/material/select';
import { MatSort, MatSortHeader } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltip } from '@angular/material/tooltip';
import { AuthApi, AuthState, MembersApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { can, canAssignRole, ROLES, type Member, type Role } from '@tumblewise/shared';
import { Confirmation, EmptyState, ErrorBanner, LoadingState, PageHeader, ROLE_LABELS } from '@tumblewise/ui';
import { filter, switchMap } from 'rxjs';
import { memberMatchesFilter, memberSortValue } from './member-table';

/** The workspace's members: filter, sort, change a role, remove someone. */
@Component({
  selector: 'tw-members',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    MatTableModule,
    MatSort,
    MatSortHeader,
    MatFormField,
    MatLabel,
    MatInput,
    MatSelect,
    MatOption,
    MatIconButton,
    MatTooltip,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
  ],
  templateUrl: './members.html',
  styleUrl: './members.scss',
})
export class Members {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly auth = inject(AuthState);
  private readonly authApi = inject(AuthApi);
  private readonly membersApi = inject(MembersApi);
  private readonly confirmation = inject(Confirmation);

  protected readonly roleLabels = ROLE_LABELS;
  protected readonly columns = ['name', 'email', 'role', 'joined', 'actions'];
  protected readonly members = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.membersApi.list(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.members.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly dataSource = new MatTableDataSource<Member>([]);
  protected readonly filterText = signal('');
  /** Message of the last failed change (e.g. the server's last-owner refusal). */
  protected readonly actionError = signal<string | null>(null);
  /** Id of the member whose change is being saved. */
  protected readonly busyId = signal<string | null>(null);
  protected readonly mayManage = computed(() => can(this.workspace.role(), 'members.manage'));
  protected readonly myUserId = computed(() => this.auth.user()?.id ?? null);

  private readonly sort = viewChild(MatSort);

  constructor() {
    this.dataSource.filterPredicate = memberMatchesFilter;
    this.dataSource.sortingDataAccessor = memberSortValue;
    effect(() => {
      this.dataSource.data = this.members.value() ?? [];
    });
    effect(() => {
      const sort = this.sort();
      if (sort) this.dataSource.sort = sort;
    });
    effect(() => {
      this.dataSource.filter = this.filterText().trim().toLowerCase();
    });
  }

  /** Roles the current user may give `member` (always including the member's current role). */
  protected assignableRoles(member: Member): Role[] {
    const actor = this.workspace.role();
    if (!actor) return [member.role];
    return ROLES.filter((role) => role === member.role || canAssignRole(actor, role));
  }

  /** Whether the current user may edit `member`'s role at all (admins do not touch owners). */
  protected mayChangeRole(member: Member): boolean {
    const actor = this.workspace.role();
    return !!actor && this.mayManage() && canAssignRole(actor, member.role);
  }

  /** Applies the filter typed in the search box. */
  protected filterMembers(event: Event): void {
    this.filterText.set((event.target as HTMLInputElement).value);
  }

  /** Saves a new role; on refusal shows the server's reason and puts the old role back. */
  protected changeRole(member: Member, change: MatSelectChange): void {
    const workspaceId = this.workspace.workspaceId();
    const role = change.value as Role;
    if (!workspaceId || role === member.role) return;
    this.actionError.set(null);
    this.busyId.set(member.id);
    this.membersApi.changeRole(workspaceId, member.id, role).subscribe({
      next: (updated) => {
        this.busyId.set(null);
        this.members.update((list) => list?.map((m) => (m.id === updated.id ? updated : m)));
        this.reloadOwnMembershipsIfMine(updated);
      },
      error: (error: unknown) => {
        this.busyId.set(null);
        this.actionError.set(toApiError(error).message);
        change.source.writeValue(member.role);
        this.members.update((list) => list?.map((m) => (m.id === member.id ? { ...m } : m)));
      },
    });
  }

  /** Asks for confirmation, then removes the member; the server refuses for the last owner. */
  protected removeMember(member: Member): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.confirmation
      .ask({
        title: `Remove ${member.name}?`,
        message:
          member.userId === this.myUserId()
            ? `You lose access to ${this.workspace.workspace()?.name ?? 'this workspace'} at once. Only an owner or admin can invite you back.`
            : `${member.name} (${member.email}) loses access to ${this.workspace.workspace()?.name ?? 'this workspace'} at once. You can invite them again later.`,
        confirmLabel: 'Remove',
        destructive: true,
      })
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.busyId.set(member.id);
          return this.membersApi.remove(workspaceId, member.id);
        }),
      )
      .subscribe({
        next: () => {
          this.busyId.set(null);
          this.members.update((list) => list?.filter((m) => m.id !== member.id));
          this.reloadOwnMembershipsIfMine(member);
        },
        error: (error: unknown) => {
          this.busyId.set(null);
          this.actionError.set(toApiError(error).message);
        },
      });
  }

  /** After changing one's own membership, the role held here changes too: reload it. */
  private reloadOwnMembershipsIfMine(member: Member): void {
    if (member.userId === this.myUserId()) this.authApi.loadMe().subscribe({ error: () => undefined });
  }

  /** A role as written on screen. */
  protected roleLabel(role: Role): string {
    return ROLE_LABELS[role] ?? role;
  }

  /** Loads the list again after a failure. */
  protected reloadMembers(): void {
    this.members.reload();
  }
}
