import { NgTemplateOutlet } from '@angular/common';
import {
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  type ElementRef,
  inject,
  input,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatTooltip } from '@angular/material/tooltip';
import { ActivatedRoute, Router } from '@angular/router';
import { MeasurementsApi, saveBlob, SettingsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import type { ErrorProblem, Measurement, MeasurementsRemoved } from '@tumblewise/shared';
import { Confirmation, type ConfirmRequest, EmptyState, ErrorBanner, LoadingState, PageHeader, StatusChip } from '@tumblewise/ui';
import { filter, type Observable, type Subscription, switchMap } from 'rxjs';
import { Breadcrumbs, partTrail } from '../../core/breadcrumbs';
import { partPage, variantLabel } from '../../core/part-page';
import {
  comparedWith,
  DIFFERENCE_FLAG_PERCENT,
  describeDifference,
  EXAMPLE_CSV,
  fileRefusal,
  formatEntered,
  formatMoment,
  formatRecorded,
  templateCsv,
  templateFileName,
  type InertiaUnit,
} from './measured-figures';

/** The unit moments are shown in when the workspace settings cannot be read (the server's default). */
const FALLBACK_UNIT: InertiaUnit = 'g·cm²';

/**
 * Measured data of a part: the rig readings of a variant's prototype beside the moments the
 * variant predicts, with the difference in per cent flagged beyond our threshold; a CSV import
 * (file picker or drop) that either imports every row or lists the problems by line; a template to
 * fill in. The variant lives in the address (`?variant=`), so the part editor can link to one.
 */
@Component({
  selector: 'tw-measured-data',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    NgTemplateOutlet,
    MatButton,
    MatIconButton,
    MatTooltip,
    MatFormField,
    MatLabel,
    MatInput,
    MatProgressBar,
    PageHeader,
    Breadcrumbs,
    StatusChip,
    EmptyState,
    ErrorBanner,
    LoadingState,
  ],
  templateUrl: './measured-data.html',
  styleUrl: './measured-data.scss',
})
export class MeasuredData {
  /** Route parameter. */
  readonly projectId = input.required<string>();
  /** Route parameter. */
  readonly partId = input.required<string>();
  /** Query parameter: the variant whose prototype was measured; the newest when absent. */
  readonly variant = input<string | undefined>();

  protected readonly workspace = inject(WorkspaceContext);
  private readonly settingsApi = inject(SettingsApi);
  private readonly measurementsApi = inject(MeasurementsApi);
  private readonly router = inject(Router);
  private readonly route = inject(ActivatedRoute);
  private readonly confirmation = inject(Confirmation);

  protected readonly threshold = DIFFERENCE_FLAG_PERCENT;
  protected readonly example = EXAMPLE_CSV;
  protected readonly variantLabel = variantLabel;
  protected readonly comparedWith = comparedWith;
  protected readonly formatEntered = formatEntered;
  protected readonly formatRecorded = formatRecorded;
  /** Designers, admins and owners import; reviewers read. */
  protected readonly mayImport = computed(() => this.workspace.can('projects.edit'));

  /** The project (for the breadcrumbs), the part, its variants and the shown one (of `?variant=`, else the newest). */
  private readonly page = partPage({ projectId: this.projectId, partId: this.partId, variant: this.variant });
  protected readonly project = this.page.project;
  protected readonly part = this.page.part;
  protected readonly crumbs = computed(() =>
    partTrail(this.projectId(), this.project.value()?.name, this.partId(), this.part.value()?.name, 'Measured data'),
  );
  protected readonly variants = this.page.variants;
  protected readonly list = this.page.list;
  protected readonly chosen = this.page.chosen;
  private readonly settings = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params }) => this.settingsApi.get(params),
  });

  /** The workspace's inertia display unit; the default when the settings could not be read. */
  protected readonly unit = computed<InertiaUnit>(() =>
    this.settings.hasValue() ? this.settings.value().displayUnits.inertia : FALLBACK_UNIT,
  );
  protected readonly unitFallback = computed(() => !!this.settings.error());

  protected readonly measurements = rxResource({
    params: () => {
      const workspaceId = this.workspace.workspaceId();
      const variant = this.chosen();
      return workspaceId && variant ? { workspaceId, variantId: variant.id } : undefined;
    },
    stream: ({ params }) => this.measurementsApi.list(params.workspaceId, params.variantId),
  });

  protected readonly loadError = this.page.loadError;
  protected readonly rowsError = computed(() => {
    const error = this.measurements.error();
    return error ? toApiError(error).message : null;
  });
  protected readonly rows = computed(() => {
    const unit = this.unit();
    const fresh = this.freshIds();
    const list: Measurement[] = this.measurements.hasValue() ? this.measurements.value() : [];
    return list.map((m) => ({
      ...m,
      shownValue: formatMoment(m.value, unit),
      shownPredicted: formatMoment(m.predicted, unit),
      difference: describeDifference(m.differencePercent),
      fresh: fresh.has(m.id),
    }));
  });
  protected readonly farCount = computed(() => this.rows().filter((r) => r.difference.state === 'far').length);

  // Import state.
  protected readonly importing = signal(false);
  /** Share of the file sent (0…1), null while unknown. */
  protected readonly progress = signal<number | null>(null);
  protected readonly problems = signal<readonly ErrorProblem[]>([]);
  protected readonly importFailure = signal<string | null>(null);
  /** The last import: how many rows, from which file, and its id (to undo it). */
  protected readonly imported = signal<{ count: number; file: string; importId: string | null } | null>(null);
  protected readonly dragging = signal(false);
  /** Ids of the rows the last import added (marked in the table). */
  private readonly freshIds = signal<ReadonlySet<string>>(new Set());
  private upload: Subscription | null = null;

  // Removal state.
  /** What is being removed: a row id, or `import` while an import is undone. */
  protected readonly removing = signal<string | null>(null);
  /** What the last removal did, for the status line. */
  protected readonly removedNote = signal<string | null>(null);
  protected readonly removeFailure = signal<string | null>(null);
  private removal: Subscription | null = null;
  private readonly readingsHeading = viewChild<ElementRef<HTMLElement>>('readingsHeading');

  constructor() {
    // Without ?variant= the newest is shown; write it into the address so the link can be shared.
    effect(() => {
      const chosen = this.chosen();
      if (chosen && !this.variant()) untracked(() => this.writeAddress(chosen.id));
    });
    inject(DestroyRef).onDestroy(() => {
      this.upload?.unsubscribe();
      this.removal?.unsubscribe();
    });
  }

  /** The picker changed: show that variant's readings. */
  protected chooseVariant(id: string): void {
    if (!id || id === this.chosen()?.id) return;
    this.clearImportMessages();
    this.freshIds.set(new Set());
    this.writeAddress(id);
  }

  /** A file came from the picker. */
  protected filePicked(event: Event): void {
    const field = event.target as HTMLInputElement;
    const file = field.files?.[0];
    // Let the same file be picked again after fixing it.
    field.value = '';
    if (file) this.importFile(file);
  }

  protected dragOver(event: DragEvent): void {
    if (!this.mayImport() || this.importing()) return;
    event.preventDefault();
    if (event.dataTransfer) event.dataTransfer.dropEffect = 'copy';
    this.dragging.set(true);
  }

  protected dragLeave(): void {
    this.dragging.set(false);
  }

  protected dropped(event: DragEvent): void {
    event.preventDefault();
    this.dragging.set(false);
    if (!this.mayImport() || this.importing()) return;
    const files = event.dataTransfer?.files;
    if (!files?.length) return;
    if (files.length > 1) {
      this.clearImportMessages();
      this.importFailure.set('Drop one CSV file at a time.');
      return;
    }
    this.importFile(files[0]);
  }

  /** Sends one CSV; every row is imported, or none and the problems are listed by line. */
  protected importFile(file: File): void {
    const workspaceId = this.workspace.workspaceId();
    const variant = this.chosen();
    if (!workspaceId || !variant || this.importing() || !this.mayImport()) return;
    this.clearImportMessages();
    const refusal = fileRefusal(file);
    if (refusal) {
      this.importFailure.set(refusal);
      return;
    }
    this.importing.set(true);
    this.progress.set(0);
    this.upload = this.measurementsApi.upload(workspaceId, variant.id, file, file.name).subscribe({
      next: (step) => {
        if (step.kind === 'progress') {
          this.progress.set(step.fraction);
          return;
        }
        this.importing.set(false);
        this.imported.set({ count: step.rows.length, file: file.name, importId: step.rows[0]?.importId ?? null });
        this.freshIds.set(new Set(step.rows.map((r) => r.id)));
        this.measurements.reload();
      },
      error: (error: unknown) => {
        this.importing.set(false);
        const fault = toApiError(error);
        if (fault.problems.length) this.problems.set(fault.problems);
        else this.importFailure.set(`“${file.name}” was not imported: ${fault.message}`);
      },
    });
  }

  /** Saves a CSV to fill in, in the workspace's unit, made here in the browser. */
  protected downloadTemplate(): void {
    const variant = this.chosen();
    const name = templateFileName(this.part.hasValue() ? this.part.value().name : 'part', variant?.number ?? 1);
    saveBlob(new Blob([templateCsv(this.unit())], { type: 'text/csv;charset=utf-8' }), name);
  }

  /** Loads everything again after a failure. */
  protected reload(): void {
    this.page.reload();
    this.settings.reload();
  }

  /** Removes one reading, after the user confirms. */
  protected removeReading(row: Measurement): void {
    const what = `${row.axis}, ${formatEntered(row.enteredValue, row.enteredUnit)}`;
    this.removeAfterConfirming(
      {
        title: 'Remove this reading?',
        message: `The reading “${what}” (${row.method}, recorded ${formatRecorded(row.createdAt)}) is removed from this variant. This cannot be undone here; the audit log keeps its values.`,
        confirmLabel: 'Remove reading',
        destructive: true,
      },
      row.id,
      (workspaceId, variantId) => this.measurementsApi.remove(workspaceId, variantId, row.id),
      () => `Removed the reading “${what}”.`,
    );
  }

  /** Removes every row the last import brought in (those not removed already), after the user confirms. */
  protected undoImport(): void {
    const done = this.imported();
    if (!done?.importId) return;
    const importId = done.importId;
    const left = this.rows().filter((r) => r.importId === importId).length;
    this.removeAfterConfirming(
      {
        title: `Undo the import of ${done.file}?`,
        message: `The ${left === 1 ? 'reading' : `${left} readings`} it brought in ${left === 1 ? 'is' : 'are'} removed from this variant; other readings stay. This cannot be undone here; the audit log keeps their values.`,
        confirmLabel: left === 1 ? 'Remove 1 reading' : `Remove ${left} readings`,
        destructive: true,
      },
      'import',
      (workspaceId, variantId) => this.measurementsApi.removeImport(workspaceId, variantId, importId),
      (removed) => `Undid the import of ${done.file}: removed ${removed === 1 ? '1 reading' : `${removed} readings`}.`,
      () => this.imported.set(null),
    );
  }

  /** Confirm → remove → reload the table and say what went; a failure shows in a banner above the table. */
  private removeAfterConfirming(
    request: ConfirmRequest,
    busy: string,
    remove: (workspaceId: string, variantId: string) => Observable<MeasurementsRemoved>,
    note: (removed: number) => string,
    afterwards?: () => void,
  ): void {
    const workspaceId = this.workspace.workspaceId();
    const variant = this.chosen();
    if (!workspaceId || !variant || this.removing() || !this.mayImport()) return;
    this.removeFailure.set(null);
    this.removedNote.set(null);
    this.removal = this.confirmation
      .ask(request)
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.removing.set(busy);
          return remove(workspaceId, variant.id);
        }),
      )
      .subscribe({
        next: ({ removed }) => {
          this.removing.set(null);
          this.removedNote.set(note(removed));
          afterwards?.();
          this.measurements.reload();
          // The button pressed is gone with its row: keep the keyboard in the table's section.
          this.readingsHeading()?.nativeElement.focus();
        },
        error: (error: unknown) => {
          this.removing.set(null);
          const fault = toApiError(error);
          this.removeFailure.set(
            fault.status === 404
              ? 'Those readings were already removed; the table shows what is left.'
              : `Nothing was removed: ${fault.message}`,
          );
          if (fault.status === 404) this.measurements.reload();
        },
      });
  }

  private clearImportMessages(): void {
    this.problems.set([]);
    this.importFailure.set(null);
    this.imported.set(null);
    this.removedNote.set(null);
    this.removeFailure.set(null);
  }

  private writeAddress(variantId: string): void {
    void this.router.navigate([], {
      relativeTo: this.route,
      queryParams: { variant: variantId },
      queryParamsHandling: 'merge',
      replaceUrl: true,
    });
  }
}
