import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { MatSort, MatSortHeader } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltip } from '@angular/material/tooltip';
import { MaterialLibraryApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { can, MATERIAL_FAMILIES, type Material } from '@tumblewise/shared';
import { Confirmation, EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { filter, switchMap } from 'rxjs';
import { relativeToPercent } from '../settings/tolerance-units';
import { MaterialDialog, type MaterialDialogData } from './material-dialog';
import { materialMatchesFilter, materialSortValue, type MaterialFilter } from './material-table';

/** The material library and the workspace's own materials: sort, filter, add, change, delete. */
@Component({
  selector: 'tw-material-library',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    MatTableModule,
    MatSort,
    MatSortHeader,
    MatFormField,
    MatLabel,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    MatIconButton,
    MatTooltip,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
  ],
  templateUrl: './material-library.html',
  styleUrl: './material-library.scss',
})
export class MaterialLibrary {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly api = inject(MaterialLibraryApi);
  private readonly dialog = inject(MatDialog);
  private readonly confirmation = inject(Confirmation);

  protected readonly families = MATERIAL_FAMILIES;
  protected readonly columns = ['name', 'family', 'density', 'tolerance', 'source', 'scope', 'actions'];
  protected readonly materials = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.api.list(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.materials.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly mayManage = computed(() => can(this.workspace.role(), 'materials.manage'));
  protected readonly filterValue = signal<MaterialFilter>({ text: '', family: '', scope: '' });
  protected readonly dataSource = new MatTableDataSource<Material>([]);
  protected readonly actionError = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly busyId = signal<string | null>(null);

  private readonly sort = viewChild(MatSort);

  constructor() {
    this.dataSource.sortingDataAccessor = materialSortValue;
    effect(() => {
      const value = this.filterValue();
      this.dataSource.data = (this.materials.value() ?? []).filter((m) => materialMatchesFilter(m, value));
    });
    effect(() => {
      const sort = this.sort();
      if (sort) this.dataSource.sort = sort;
    });
  }

  /** "±5 %". */
  protected tolerance(material: Material): string {
    return `±${relativeToPercent(material.densityTolerance)} %`;
  }

  /** Applies the text filter. */
  protected filterByText(event: Event): void {
    const text = (event.target as HTMLInputElement).value;
    this.filterValue.update((f) => ({ ...f, text }));
  }

  /** Applies the family filter. */
  protected filterByFamily(family: MaterialFilter['family']): void {
    this.filterValue.update((f) => ({ ...f, family }));
  }

  /** Applies the scope filter. */
  protected filterByScope(scope: MaterialFilter['scope']): void {
    this.filterValue.update((f) => ({ ...f, scope }));
  }

  /** Opens the dialog for a new workspace material. */
  protected addMaterial(): void {
    this.openDialog(undefined);
  }

  /** Opens the dialog for a workspace material. */
  protected editMaterial(material: Material): void {
    this.openDialog(material);
  }

  /** Asks, then deletes a workspace material. Parts that name it keep their own saved density. */
  protected deleteMaterial(material: Material): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.notice.set(null);
    this.confirmation
      .ask({
        title: `Delete ${material.name}?`,
        message: 'It disappears from the material list of this workspace. Saved variants keep the density they were saved with.',
        confirmLabel: 'Delete',
        destructive: true,
      })
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.busyId.set(material.id);
          return this.api.remove(workspaceId, material.id);
        }),
      )
      .subscribe({
        next: () => {
          this.busyId.set(null);
          this.materials.update((list) => list?.filter((m) => m.id !== material.id));
          this.notice.set(`${material.name} deleted.`);
        },
        error: (error: unknown) => {
          this.busyId.set(null);
          this.actionError.set(toApiError(error).message);
        },
      });
  }

  /** Loads the list again after a failure. */
  protected reloadMaterials(): void {
    this.materials.reload();
  }

  private openDialog(material: Material | undefined): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.notice.set(null);
    this.dialog
      .open<MaterialDialog, MaterialDialogData, Material>(MaterialDialog, { data: { workspaceId, material }, autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.materials.update((list) => {
          const others = (list ?? []).filter((m) => m.id !== saved.id);
          return [...others, saved].sort((a, b) => a.name.localeCompare(b.name));
        });
        this.notice.set(material ? `${saved.name} saved.` : `${saved.name} added.`);
      });
  }
}
