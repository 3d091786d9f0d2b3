import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { ProjectsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { Project } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { CATEGORY_LABELS } from './category-labels';
import { NewProjectDialog, type NewProjectDialogData } from './new-project-dialog';

/** The start page: the current workspace's projects, and the way to create the first one. */
@Component({
  selector: 'tw-projects',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [DatePipe, MatButton, PageHeader, EmptyState, ErrorBanner, LoadingState],
  templateUrl: './projects.html',
  styleUrl: './projects.scss',
})
export class Projects {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly projectsApi = inject(ProjectsApi);
  private readonly dialog = inject(MatDialog);

  protected readonly categoryLabels = CATEGORY_LABELS;
  protected readonly projects = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.projectsApi.list(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.projects.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly mayCreate = computed(() => this.workspace.can('projects.edit'));

  /** Opens the "New project" dialog and adds the created project to the list. */
  protected openNewProject(): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.dialog
      .open<NewProjectDialog, NewProjectDialogData, Project>(NewProjectDialog, { data: { workspaceId }, width: '520px' })
      .afterClosed()
      .subscribe((project) => {
        if (project) this.projects.update((list) => [project, ...(list ?? [])]);
      });
  }

  /** Loads the list again after a failure. */
  protected reloadProjects(): void {
    this.projects.reload();
  }
}
