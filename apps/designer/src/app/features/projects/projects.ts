import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSlideToggle } from '@angular/material/slide-toggle';
import { MatSort, MatSortHeader } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltip } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import { ProjectsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { Project } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { CATEGORY_LABELS } from './category-labels';
import { EditProjectDialog, type EditProjectDialogData } from './edit-project-dialog';
import { NewProjectDialog, type NewProjectDialogData } from './new-project-dialog';
import { projectMatchesFilter, projectSortValue, visibleProjects } from './project-table';

/** The start page: the current workspace's projects in a table to sort and filter; create, rename, archive, restore. */
@Component({
  selector: 'tw-projects',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    RouterLink,
    MatButton,
    MatIconButton,
    MatTooltip,
    MatFormField,
    MatLabel,
    MatInput,
    MatSlideToggle,
    MatTableModule,
    MatSort,
    MatSortHeader,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
  ],
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
  protected readonly columns = computed(() =>
    this.mayCreate() ? ['name', 'category', 'updated', 'actions'] : ['name', 'category', 'updated'],
  );
  protected readonly filterText = signal('');
  protected readonly showArchived = signal(false);
  protected readonly archivedCount = computed(() => (this.projects.value() ?? []).filter((p) => p.archived).length);
  protected readonly dataSource = new MatTableDataSource<Project>([]);
  /** Message of the last failed archive or restore. */
  protected readonly actionError = signal<string | null>(null);
  /** Id of the project whose change is being saved. */
  protected readonly busyId = signal<string | null>(null);

  private readonly sort = viewChild(MatSort);

  constructor() {
    this.dataSource.filterPredicate = projectMatchesFilter;
    this.dataSource.sortingDataAccessor = projectSortValue;
    effect(() => {
      this.dataSource.data = visibleProjects(this.projects.value() ?? [], this.showArchived());
    });
    effect(() => {
      const sort = this.sort();
      if (sort) this.dataSource.sort = sort;
    });
    effect(() => {
      this.dataSource.filter = this.filterText().trim().toLowerCase();
    });
  }

  /** Applies the filter typed in the search box. */
  protected filterProjects(event: Event): void {
    this.filterText.set((event.target as HTMLInputElement).value);
  }

  /** Shows or hides archived projects. */
  protected toggleArchived(show: boolean): void {
    this.showArchived.set(show);
  }

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

  /** Opens the edit dialog (name, category, notes) and puts the saved project in the list. */
  protected renameProject(project: Project): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.dialog
      .open<EditProjectDialog, EditProjectDialogData, Project>(EditProjectDialog, { data: { workspaceId, project }, width: '520px' })
      .afterClosed()
      .subscribe((updated) => {
        if (updated) this.replaceProject(updated);
      });
  }

  /** Archives a project (hidden unless "Show archived" is on) or restores it. */
  protected setArchived(project: Project, archived: boolean): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.busyId.set(project.id);
    this.projectsApi.update(workspaceId, project.id, { archived }).subscribe({
      next: (updated) => {
        this.busyId.set(null);
        this.replaceProject(updated);
      },
      error: (error: unknown) => {
        this.busyId.set(null);
        this.actionError.set(toApiError(error).message);
      },
    });
  }

  /** A project's category as written on screen. */
  protected categoryLabel(project: Project): string {
    return CATEGORY_LABELS[project.category] ?? project.category;
  }

  /** Loads the list again after a failure. */
  protected reloadProjects(): void {
    this.projects.reload();
  }

  private replaceProject(updated: Project): void {
    this.projects.update((list) => list?.map((p) => (p.id === updated.id ? updated : p)));
  }
}
