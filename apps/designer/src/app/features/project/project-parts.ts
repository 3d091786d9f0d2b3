import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { Breadcrumbs, type Crumb } from '../../core/breadcrumbs';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatTooltip } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import { PartsApi, ProjectsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { Part } from '@tumblewise/shared';
import { Confirmation, EmptyState, ErrorBanner, LoadingState, PageHeader, StatusChip, VerdictChip } from '@tumblewise/ui';
import { filter, switchMap } from 'rxjs';
import { CATEGORY_LABELS } from '../projects/category-labels';
import { NewPartDialog, type NewPartDialogData } from './new-part-dialog';

/** One project: its parts with the latest variant's verdict and status; create and delete parts. */
@Component({
  selector: 'tw-project-parts',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    RouterLink,
    MatButton,
    MatIconButton,
    MatTooltip,
    PageHeader,
    Breadcrumbs,
    EmptyState,
    ErrorBanner,
    LoadingState,
    VerdictChip,
    StatusChip,
  ],
  templateUrl: './project-parts.html',
  styleUrl: './project-parts.scss',
})
export class ProjectParts {
  /** Route parameter `:projectId`. */
  readonly projectId = input.required<string>();

  protected readonly workspace = inject(WorkspaceContext);
  private readonly projectsApi = inject(ProjectsApi);
  private readonly partsApi = inject(PartsApi);
  private readonly dialog = inject(MatDialog);
  private readonly confirmation = inject(Confirmation);
  private readonly router = inject(Router);

  protected readonly categoryLabels = CATEGORY_LABELS;
  private readonly scope = computed(() => {
    const workspaceId = this.workspace.workspaceId();
    return workspaceId ? { workspaceId, projectId: this.projectId() } : undefined;
  });
  protected readonly project = rxResource({
    params: this.scope,
    stream: ({ params }) => this.projectsApi.get(params.workspaceId, params.projectId),
  });
  protected readonly crumbs = computed((): Crumb[] => [
    { label: 'Projects', link: '/', testId: 'crumb-projects' },
    { label: this.project.value()?.name ?? 'Project' },
  ]);
  protected readonly parts = rxResource({
    params: this.scope,
    stream: ({ params }) => this.partsApi.list(params.workspaceId, params.projectId),
  });
  protected readonly loadError = computed(() => {
    const error = this.project.error() ?? this.parts.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly mayEdit = computed(() => this.workspace.can('projects.edit'));
  protected readonly actionError = signal<string | null>(null);
  protected readonly busyId = signal<string | null>(null);

  /** Opens the "New part" dialog, then the new part's editor. */
  protected openNewPart(): void {
    const scope = this.scope();
    const project = this.project.value();
    if (!scope || !project) return;
    this.dialog
      .open<NewPartDialog, NewPartDialogData, Part>(NewPartDialog, { data: { ...scope, category: project.category }, width: '480px' })
      .afterClosed()
      .subscribe((part) => {
        if (!part) return;
        this.parts.update((list) => [...(list ?? []), part]);
        void this.router.navigate(['/projects', scope.projectId, 'parts', part.id]);
      });
  }

  /** Asks for confirmation, then deletes the part and all its variants. */
  protected deletePart(part: Part): void {
    const scope = this.scope();
    if (!scope) return;
    this.actionError.set(null);
    this.confirmation
      .ask({
        title: `Delete ${part.name}?`,
        message:
          part.variantCount > 0
            ? `The part, its draft and its ${part.variantCount} saved variant${part.variantCount === 1 ? '' : 's'} with their spin reports are deleted. This cannot be undone.`
            : 'The part and its draft are deleted. This cannot be undone.',
        confirmLabel: 'Delete part',
        destructive: true,
      })
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.busyId.set(part.id);
          return this.partsApi.remove(scope.workspaceId, part.id);
        }),
      )
      .subscribe({
        next: () => {
          this.busyId.set(null);
          this.parts.update((list) => list?.filter((p) => p.id !== part.id));
        },
        error: (error: unknown) => {
          this.busyId.set(null);
          this.actionError.set(toApiError(error).message);
        },
      });
  }

  /** Loads the project and its parts again after a failure. */
  protected reload(): void {
    this.project.reload();
    this.parts.reload();
  }
}
