import {
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  forwardRef,
  inject,
  input,
  signal,
  untracked,
} from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { type ControlValueAccessor, FormControl, NG_VALUE_ACCESSOR, ReactiveFormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatOption, MatSelect } from '@angular/material/select';
import { MeshesApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { meshInUseMessage, type Mesh } from '@tumblewise/shared';
import { Confirmation } from '@tumblewise/ui';
import { EMPTY, filter, finalize, map, of, switchMap, type Subscription } from 'rxjs';
import {
  fileProblem,
  meshOptionLabel,
  uploadFailureMessage,
  uploadName,
  uploadProgressView,
  type UploadProgressView,
} from './mesh-picker-model';

let nextId = 0;

/**
 * Chooses the uploaded mesh of a mesh primitive (the form control of its `meshId`): a list of the
 * workspace's meshes by name, triangle count and size, and "Upload STL…", which sends a file to be
 * checked and, once the server accepts it, selects it. A refused file's reason shows at the field;
 * nothing is stored then. Disabled (reviewers), it shows the chosen mesh's name only.
 *
 * Designers, admins and owners may also delete an upload from the workspace. The server keeps a mesh
 * that a part's draft or a saved variant uses (409), so the picker asks first where it is used and
 * says so instead of offering the deletion; a mesh nothing uses is deleted after a confirmation.
 */
@Component({
  selector: 'tw-mesh-picker',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatError, MatSelect, MatOption, MatButton, MatIconButton, MatProgressBar],
  providers: [{ provide: NG_VALUE_ACCESSOR, useExisting: forwardRef(() => MeshPicker), multi: true }],
  templateUrl: './mesh-picker.html',
  styleUrl: './mesh-picker.scss',
})
export class MeshPicker implements ControlValueAccessor {
  /** A problem the document check or the server found with the mesh reference, shown at the field. */
  readonly problem = input<string | null>(null);

  private readonly api = inject(MeshesApi);
  private readonly workspace = inject(WorkspaceContext);
  private readonly confirmation = inject(Confirmation);
  protected readonly hintId = `tw-mesh-units-${nextId++}`;

  protected readonly value = signal('');
  protected readonly disabled = signal(false);
  protected readonly progress = signal<UploadProgressView | null>(null);
  protected readonly uploadError = signal<string | null>(null);
  /** Meshes uploaded here, shown before the list has been fetched again. */
  private readonly added = signal<Mesh[]>([]);

  private readonly list = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params }) => (params ? this.api.list(params) : of([] as Mesh[])),
  });
  protected readonly loading = this.list.isLoading;
  protected readonly listError = computed(() => {
    const e = this.list.error();
    return e ? `The uploaded meshes could not be listed: ${toApiError(e).message}` : null;
  });
  protected readonly meshes = computed<Mesh[]>(() => {
    const fetched = this.list.hasValue() ? this.list.value() : [];
    const extra = this.added().filter((m) => !fetched.some((f) => f.id === m.id));
    return [...extra, ...fetched];
  });
  protected readonly selected = computed(() => this.meshes().find((m) => m.id === this.value()) ?? null);
  /** The chosen id is not among the workspace's meshes (deleted, or another workspace's). */
  protected readonly unknownId = computed(() => !!this.value() && this.list.hasValue() && !this.selected());
  protected readonly fieldProblem = computed(() => this.uploadError() ?? this.problem());
  /** The list's own control: invalid while there is a problem, so the field shows it as an error. */
  protected readonly selectControl = new FormControl('', {
    nonNullable: true,
    validators: () => (this.fieldProblem() ? { problem: true } : null),
  });
  protected readonly label = meshOptionLabel;

  /** Designers, admins and owners may delete uploads (as the server allows). */
  protected readonly mayDelete = computed(() => this.workspace.can('projects.edit'));
  /** The mesh whose deletion is being checked, confirmed or sent. */
  protected readonly deleting = signal<string | null>(null);
  /** What the last deletion did: deleted, refused (in use) or failed. */
  protected readonly deleteNote = signal<{ kind: 'deleted' | 'refused' | 'failed'; text: string } | null>(null);

  private onChange: (value: string) => void = () => undefined;
  private onTouched: () => void = () => undefined;
  private upload$: Subscription | null = null;
  private delete$: Subscription | null = null;

  constructor() {
    effect(() => {
      const problem = this.fieldProblem();
      untracked(() => {
        this.selectControl.updateValueAndValidity({ emitEvent: false });
        if (problem) this.selectControl.markAsTouched();
      });
    });
    inject(DestroyRef).onDestroy(() => {
      this.upload$?.unsubscribe();
      this.delete$?.unsubscribe();
    });
  }

  writeValue(value: unknown): void {
    const id = typeof value === 'string' ? value : '';
    this.value.set(id);
    this.selectControl.setValue(id, { emitEvent: false });
  }

  registerOnChange(fn: (value: string) => void): void {
    this.onChange = fn;
  }

  registerOnTouched(fn: () => void): void {
    this.onTouched = fn;
  }

  setDisabledState(disabled: boolean): void {
    this.disabled.set(disabled);
  }

  /** Takes the mesh chosen in the list. */
  protected choose(id: string): void {
    this.uploadError.set(null);
    this.set(id);
  }

  protected touched(): void {
    this.onTouched();
  }

  /** Uploads the file picked in the file input; on success the new mesh is selected. */
  protected uploadFrom(inputEl: HTMLInputElement): void {
    const file = inputEl.files?.[0];
    // The same file may be picked again after a fix: clear the input.
    inputEl.value = '';
    const workspaceId = this.workspace.workspaceId();
    if (!file || !workspaceId || this.disabled()) return;
    const problem = fileProblem(file);
    this.uploadError.set(problem);
    if (problem) return;
    this.upload$?.unsubscribe();
    this.progress.set(uploadProgressView({ kind: 'uploading', fraction: null }, file.name));
    this.upload$ = this.api.upload(workspaceId, file, file.name, uploadName(file.name)).subscribe({
      next: (event) => {
        if (event.kind !== 'done') {
          this.progress.set(uploadProgressView(event, file.name));
          return;
        }
        this.added.update((list) => [event.mesh, ...list]);
        this.progress.set(null);
        this.set(event.mesh.id);
        this.list.reload();
      },
      error: (err: unknown) => {
        this.progress.set(null);
        this.uploadError.set(uploadFailureMessage(toApiError(err)));
      },
    });
  }

  /**
   * Deletes an upload from the workspace: asks the server where it is used first; in use, says
   * where and deletes nothing; else asks to confirm, deletes, and lists the uploads again.
   */
  protected deleteMesh(mesh: Mesh): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId || this.disabled() || !this.mayDelete() || this.deleting()) return;
    this.deleteNote.set(null);
    // The draft holding this choice may not be saved yet, so the server would not know of it.
    if (mesh.id === this.value()) {
      this.deleteNote.set({
        kind: 'refused',
        text: `“${mesh.name}” is the mesh of this primitive, so it cannot be deleted. Choose another mesh here first.`,
      });
      return;
    }
    this.deleting.set(mesh.id);
    this.delete$ = this.api
      .usage(workspaceId, mesh.id)
      .pipe(
        switchMap((usage) => {
          if (usage.parts.length) {
            this.deleteNote.set({ kind: 'refused', text: meshInUseMessage(mesh.name, usage) });
            return EMPTY;
          }
          return this.confirmation
            .ask({
              title: `Delete the mesh “${mesh.name}”?`,
              message: `No part’s draft or saved variant uses it. It is removed from this workspace’s uploads and the audit log records the deletion. This cannot be undone here: to use the shape again, upload the file again.`,
              confirmLabel: 'Delete mesh',
              destructive: true,
            })
            .pipe(
              filter(Boolean),
              switchMap(() => this.api.delete(workspaceId, mesh.id)),
              map(() => true),
            );
        }),
        finalize(() => this.deleting.set(null)),
      )
      .subscribe({
        next: () => {
          this.added.update((list) => list.filter((m) => m.id !== mesh.id));
          this.deleteNote.set({ kind: 'deleted', text: `Deleted the mesh “${mesh.name}”.` });
          this.list.reload();
        },
        error: (err: unknown) => {
          const fault = toApiError(err);
          if (fault.status === 404) {
            this.deleteNote.set({ kind: 'failed', text: `“${mesh.name}” was already deleted; the list shows what is left.` });
            this.added.update((list) => list.filter((m) => m.id !== mesh.id));
            this.list.reload();
          } else if (fault.status === 409) {
            this.deleteNote.set({ kind: 'refused', text: fault.message });
          } else {
            this.deleteNote.set({ kind: 'failed', text: `“${mesh.name}” was not deleted: ${fault.message}` });
          }
        },
      });
  }

  private set(id: string): void {
    this.value.set(id);
    this.selectControl.setValue(id, { emitEvent: false });
    this.onChange(id);
    this.onTouched();
  }
}
