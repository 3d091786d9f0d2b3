import {
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  ElementRef,
  inject,
  input,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { rxResource, takeUntilDestroyed, toObservable } from '@angular/core/rxjs-interop';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatTooltip } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import {
  AnalysisApi,
  MaterialsApi,
  PartsApi,
  ProjectsApi,
  toApiError,
  VariantsApi,
  WorkspaceContext,
  type ApiError,
} from '@tumblewise/api-client';
import type { SpinReport } from '@tumblewise/engine';
import type { Material, Part, PartDocument, PrimitiveShape, Variant, VariantStatus } from '@tumblewise/shared';
import { EmptyState, ErrorBanner, LoadingState, PageHeader } from '@tumblewise/ui';
import { defer, filter, map, Subject } from 'rxjs';
import { Breadcrumbs, type Crumb } from '../../core/breadcrumbs';
import { SpinReportPanel } from '../spin-report/spin-report-panel';
import { VariantHistory } from '../variant-history/variant-history';
import { autosaveDrafts } from './autosave-drafts';
import { analysisRequest, documentIssues, messageForField, withMaterialDensities, type FieldIssues } from './document-issues';
import { toDraftDocument, withResolvedReferences, type DraftDocument } from './draft-document';
import { IDLE_ANALYSIS, liveAnalysis, type LiveAnalysis } from './live-analysis';
import { PartEditorState } from './part-editor-state';
import { MAX_IMPORT_BYTES, parsePartFile, partFileName, partFileText } from './part-file';
import { PartSettingsForm, type SettingsChange } from './part-settings-form';
import { SHAPE_PALETTE } from './primitive-fields';
import { PrimitiveForm, type PrimitiveChange } from './primitive-form';
import { PrimitiveList, type MoveRequest } from './primitive-list';
import { SaveVariantDialog, type SaveVariantChoice, type SaveVariantDialogData } from './save-variant-dialog';
import { SignOffSlot } from './sign-off-slot';
import { ViewerSlot } from './viewer-slot';

/** Where the draft stands against the server. */
export type DraftStatus = 'loading' | 'saved' | 'pending' | 'saving' | 'conflict' | 'failed' | 'readonly';

const STATUS_TEXT: Record<DraftStatus, string> = {
  loading: 'Loading…',
  saved: 'Draft saved',
  pending: 'Unsaved changes…',
  saving: 'Saving draft…',
  conflict: 'Draft not saved: someone else saved this part',
  failed: 'Draft not saved',
  readonly: 'Read-only: your role reviews and does not edit',
};

/** Paths a form shows; problems elsewhere are listed above the forms. */
const FIELD_PATH = /^(primitives\[\d+\]\.|spin\.|grip\.|category$|division$)/;

/**
 * The part editor: the primitive list with its palette and the form of the selected primitive, the
 * part-wide settings, undo and redo, an autosaved draft (optimistic locking: a 409 keeps the local
 * edits and offers reload), "save as new variant", JSON import and export; beside it the live spin
 * report recomputed as the designer types, the 3-D view slot; below, the variant history.
 */
@Component({
  selector: 'tw-part-editor',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [PartEditorState],
  imports: [
    Breadcrumbs,
    RouterLink,
    MatButton,
    MatIconButton,
    MatTooltip,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    PrimitiveList,
    PrimitiveForm,
    PartSettingsForm,
    SpinReportPanel,
    VariantHistory,
    ViewerSlot,
    SignOffSlot,
  ],
  templateUrl: './part-editor.html',
  styleUrl: './part-editor.scss',
  host: { '(document:keydown)': 'handleShortcut($event)' },
})
export class PartEditor {
  /** Route parameter `:projectId`. */
  readonly projectId = input.required<string>();
  /** Route parameter `:partId`. */
  readonly partId = input.required<string>();
  /** Query parameter `variant`: a variant to open in the report panel at once (the review e-mail's link). */
  readonly variant = input<string | undefined>(undefined);
  /** Query parameter `panel`: `review` also brings that variant's sign-off into view. */
  readonly panel = input<string | undefined>(undefined);

  protected readonly state = inject(PartEditorState);
  protected readonly workspace = inject(WorkspaceContext);
  private readonly partsApi = inject(PartsApi);
  private readonly projectsApi = inject(ProjectsApi);
  private readonly materialsApi = inject(MaterialsApi);
  private readonly variantsApi = inject(VariantsApi);
  private readonly analysisApi = inject(AnalysisApi);
  private readonly dialog = inject(MatDialog);
  private readonly destroyRef = inject(DestroyRef);
  private readonly fileInput = viewChild<ElementRef<HTMLInputElement>>('fileInput');

  protected readonly palette = SHAPE_PALETTE;
  protected readonly mayEdit = computed(() => this.workspace.can('projects.edit'));
  protected readonly partPath = computed(() => `/projects/${this.projectId()}/parts/${this.partId()}`);

  private readonly workspaceId = computed(() => this.workspace.workspaceId() ?? undefined);
  private readonly partScope = computed(() => {
    const workspaceId = this.workspaceId();
    return workspaceId ? { workspaceId, partId: this.partId(), projectId: this.projectId() } : undefined;
  });
  protected readonly part = rxResource({
    params: this.partScope,
    stream: ({ params }) => this.partsApi.get(params.workspaceId, params.partId),
  });
  protected readonly project = rxResource({
    params: this.partScope,
    stream: ({ params }) => this.projectsApi.get(params.workspaceId, params.projectId),
  });
  protected readonly crumbs = computed((): Crumb[] => [
    { label: 'Projects', link: '/', testId: 'crumb-projects' },
    { label: this.project.value()?.name ?? 'Project', link: ['/projects', this.projectId()], testId: 'crumb-project' },
    { label: this.part.value()?.name ?? 'Part' },
  ]);
  protected readonly materials = rxResource({
    params: this.workspaceId,
    stream: ({ params }) => this.materialsApi.list(params),
    defaultValue: [] as Material[],
  });
  protected readonly variants = rxResource({
    params: this.partScope,
    stream: ({ params }) => this.variantsApi.list(params.workspaceId, params.partId),
  });
  protected readonly loadError = computed(() => {
    const error = this.part.error();
    return error ? toApiError(error).message : null;
  });
  private readonly materialMap = computed(() => new Map((this.materials.value() ?? []).map((m) => [m.id, m])));

  /** Whether the part's draft is in the editor. */
  protected readonly loaded = signal(false);
  private draftVersion = 0;
  private savedJson = '';
  protected readonly draftStatus = signal<DraftStatus>('loading');
  protected readonly draftFailure = signal<string | null>(null);
  protected readonly statusText = computed(() => {
    const status = this.draftStatus();
    const failure = this.draftFailure();
    return status === 'failed' && failure ? `${STATUS_TEXT.failed}: ${failure}` : STATUS_TEXT[status];
  });
  protected readonly conflict = computed(() => this.draftStatus() === 'conflict');
  protected readonly actionError = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly saving = signal(false);
  /** Problems the server named when saving a variant, until the next edit. */
  private readonly saveIssues = signal<FieldIssues>({});
  /** The variant open read-only in the report panel. */
  protected readonly openedVariant = signal<Variant | null>(null);
  /** Whether the open variant's sign-off loads at once and scrolls into view (`panel=review`). */
  protected readonly revealSignOff = signal(false);
  /** The `variant` of the address already opened (it opens once; the designer may close it after). */
  private linkedVariantOpened: string | null = null;
  private readonly openLinkedVariant = effect(() => {
    const wanted = this.variant();
    const list = this.variants.value();
    if (!wanted || !list || this.linkedVariantOpened === wanted) return;
    const found = list.find((v) => v.id === wanted);
    if (!found) return;
    this.linkedVariantOpened = wanted;
    untracked(() => {
      this.openedVariant.set(found);
      this.revealSignOff.set(this.panel() === 'review');
    });
  });

  protected readonly analysis = signal<LiveAnalysis>(IDLE_ANALYSIS);
  protected readonly clientIssues = computed(() => documentIssues(this.state.document()));
  /** All problems by JSON path: the schema's, then what the server named. */
  protected readonly issues = computed<FieldIssues>(() => {
    const a = this.analysis();
    const fromAnalysis = a.status === 'invalid' || a.status === 'error' ? a.issues : {};
    const all = { ...fromAnalysis, ...this.clientIssues(), ...this.saveIssues() };
    if (this.state.document().primitives.length === 0) delete all['primitives'];
    return all;
  });
  protected readonly generalIssues = computed(() =>
    Object.entries(this.issues())
      .filter(([path]) => !FIELD_PATH.test(path))
      .map(([path, message]) => (path ? `${path} ${message}` : message)),
  );
  protected readonly issueCount = computed(() => Object.keys(this.issues()).length);
  protected readonly shownReport = computed<SpinReport | null>(
    () => (this.openedVariant()?.report as SpinReport | undefined) ?? this.analysis().report,
  );
  /** The document the shown report belongs to (valid: it was analysed or saved). */
  /** Material references become densities, so the viewer's motion request needs no workspace lookup. */
  protected readonly shownDocument = computed<PartDocument | null>(() => {
    const doc = (this.openedVariant()?.document ?? this.analysis().analysed) as DraftDocument | null;
    // Parameter references become their numbers too: the viewer draws plain values.
    return doc ? (withResolvedReferences(withMaterialDensities(doc, this.materialMap())) as unknown as PartDocument) : null;
  });
  protected readonly shownRate = computed(() => {
    const opened = this.openedVariant();
    const doc = opened ? (opened.document as DraftDocument) : this.analysis().analysed;
    return typeof doc?.spin?.rate === 'number' ? doc.spin.rate : null;
  });
  protected readonly reportHeading = computed(() => {
    const v = this.openedVariant();
    return v ? `Variant ${v.number}${v.label ? ` · ${v.label}` : ''} (read-only)` : 'Live spin report';
  });
  protected readonly reportError = computed(() => {
    if (this.openedVariant()) return null;
    const a = this.analysis();
    if (a.status !== 'error' || !a.error) return null;
    return a.error.field ? `${a.error.message} The field is marked in the form.` : a.error.message;
  });
  protected readonly staleReason = computed(() => {
    if (this.openedVariant() || this.analysis().status !== 'invalid') return null;
    const n = Object.keys(this.analysis().issues).length;
    return `The report waits for a valid part: fix the ${n === 1 ? 'marked field' : `${n} marked fields`}.`;
  });
  protected readonly nextVariantNumber = computed(() => Math.max(0, ...(this.variants.value() ?? []).map((v) => v.number)) + 1);
  protected readonly latestVariantId = computed(() => {
    const list = this.variants.value() ?? [];
    return list.length ? list.reduce((a, b) => (b.number > a.number ? b : a)).id : null;
  });

  private readonly drafts = new Subject<DraftDocument>();

  constructor() {
    // First load of the part: its draft enters the editor with an empty history.
    effect(() => {
      const part = this.part.value();
      if (!part || untracked(this.loaded)) return;
      untracked(() => this.startEditing(part));
    });

    // Live report: debounced, stale answers dropped; the server resolves material references in the workspace.
    const documents = toObservable(computed(() => ({ doc: this.state.document(), materials: this.materialMap(), loaded: this.loaded() })));
    liveAnalysis(
      documents.pipe(
        filter((x) => x.loaded),
        map((x) => x.doc),
      ),
      (doc) => analysisRequest(doc, this.materialMap()),
      (doc) => this.analysisApi.analyze(doc, this.workspaceId()),
    )
      .pipe(takeUntilDestroyed())
      .subscribe((a) => this.analysis.set(a));

    // Autosave of the draft after each pause in editing.
    autosaveDrafts(this.drafts, (doc) => this.saveDraft(doc))
      .pipe(takeUntilDestroyed())
      .subscribe((outcome) => {
        if (outcome.kind === 'saved') {
          this.draftVersion = outcome.part.draftVersion;
          this.savedJson = JSON.stringify(outcome.document);
          this.draftFailure.set(null);
          if (this.draftStatus() !== 'conflict')
            this.draftStatus.set(JSON.stringify(this.state.document()) === this.savedJson ? 'saved' : 'pending');
        } else if (outcome.kind === 'conflict') {
          this.draftStatus.set('conflict');
        } else {
          this.draftFailure.set(outcome.error.message);
          this.draftStatus.set('failed');
        }
      });

    effect(() => {
      const doc = this.state.document();
      untracked(() => {
        this.saveIssues.set({});
        this.queueDraft(doc);
      });
    });

    // Leaving with edits not yet saved: send them at once.
    this.destroyRef.onDestroy(() => {
      const scope = this.partScope();
      const doc = this.state.document();
      if (scope && this.loaded() && this.mayEdit() && !this.conflict() && JSON.stringify(doc) !== this.savedJson) {
        this.partsApi
          .saveDraft(scope.workspaceId, scope.partId, { draft: doc, draftVersion: this.draftVersion })
          .subscribe({ error: () => undefined });
      }
    });
  }

  /** Ctrl+Z undoes, Ctrl+Shift+Z or Ctrl+Y redoes (not inside dialogs). */
  protected handleShortcut(event: KeyboardEvent): void {
    if (!(event.ctrlKey || event.metaKey) || !this.mayEdit() || !this.loaded()) return;
    if ((event.target as HTMLElement | null)?.closest?.('.cdk-overlay-container')) return;
    const key = event.key.toLowerCase();
    if (key === 'z' && !event.shiftKey) {
      event.preventDefault();
      this.undo();
    } else if ((key === 'z' && event.shiftKey) || key === 'y') {
      event.preventDefault();
      this.redo();
    }
  }

  /** Undoes the last edit. */
  protected undo(): void {
    this.state.undo();
  }

  /** Redoes the last undone edit. */
  protected redo(): void {
    this.state.redo();
  }

  /** Adds a primitive of `shape` from the palette. */
  protected addPrimitive(shape: PrimitiveShape): void {
    this.state.addPrimitive(shape);
  }

  /** Takes a change from the primitive form. */
  protected updatePrimitive(change: PrimitiveChange): void {
    this.state.updatePrimitive(this.state.selectedIndex(), change.primitive, change.field);
  }

  /** Takes a change from the settings form. */
  protected updateSettings(change: SettingsChange): void {
    this.state.updateSettings(change.changes, change.field);
  }

  /** Ends one undo step (a field lost focus). */
  protected endEdit(): void {
    this.state.endEdit();
  }

  /** Moves a primitive in the list. */
  protected movePrimitive(move: MoveRequest): void {
    this.state.movePrimitive(move.index, move.offset);
  }

  /** Shows a variant read-only in the report panel, or the live report again. */
  protected openVariant(variant: Variant | null): void {
    this.openedVariant.set(variant);
    this.revealSignOff.set(false);
  }

  /** Shows a variant's new sign-off status in the history and the open report. */
  protected updateVariantStatus(variantId: string, status: VariantStatus): void {
    this.variants.update((list) => list?.map((v) => (v.id === variantId ? { ...v, status } : v)));
    this.openedVariant.update((v) => (v && v.id === variantId ? { ...v, status } : v));
  }

  /** Replaces the working document with a variant's (undo brings the previous one back). */
  protected loadVariant(variant: Variant): void {
    this.state.replace(toDraftDocument(variant.document, this.part.value()?.name));
    this.openedVariant.set(null);
    this.notice.set(`Variant ${variant.number} loaded into the editor. Undo (Ctrl+Z) brings back what you had.`);
  }

  /** Asks for a label, then saves the document as the part's next variant. */
  protected saveAsVariant(): void {
    const scope = this.partScope();
    if (!scope || !this.mayEdit()) return;
    this.actionError.set(null);
    this.notice.set(null);
    if (Object.keys(this.clientIssues()).length > 0) {
      this.actionError.set('The part has problems (marked in the form). Fix them before saving a variant.');
      return;
    }
    this.dialog
      .open<SaveVariantDialog, SaveVariantDialogData, SaveVariantChoice>(SaveVariantDialog, {
        data: { nextNumber: this.nextVariantNumber() },
        width: '480px',
      })
      .afterClosed()
      .subscribe((choice) => {
        if (!choice) return;
        this.saving.set(true);
        this.variantsApi
          .create(scope.workspaceId, scope.partId, {
            document: this.state.document(),
            ...(choice.label ? { label: choice.label } : {}),
            ...(choice.notes ? { notes: choice.notes } : {}),
          })
          .subscribe({
            next: (variant) => {
              this.saving.set(false);
              this.variants.update((list) => [...(list ?? []), variant]);
              this.notice.set(`Saved as variant ${variant.number}.`);
            },
            error: (failure: unknown) => {
              this.saving.set(false);
              const error = toApiError(failure);
              const field = error.field?.replace(/^document\./, '');
              if (field) this.saveIssues.set({ [field]: messageForField(error.message, field) });
              this.actionError.set(`The variant was not saved. ${error.message}`);
            },
          });
      });
  }

  /** Conflict: takes the version someone else saved; the local edits stay one undo away. */
  protected reloadTheirs(): void {
    const scope = this.partScope();
    if (!scope) return;
    this.partsApi.get(scope.workspaceId, scope.partId).subscribe({
      next: (part) => {
        const doc = toDraftDocument(part.draft, part.name);
        this.draftVersion = part.draftVersion;
        this.savedJson = JSON.stringify(doc);
        this.draftStatus.set('saved');
        this.state.replace(doc);
        this.notice.set('Loaded the version saved by someone else. Undo (Ctrl+Z) brings back your edits.');
      },
      error: (failure: unknown) => this.actionError.set(toApiError(failure).message),
    });
  }

  /** Conflict: saves the local document over the newer one. */
  protected keepMine(): void {
    const scope = this.partScope();
    if (!scope) return;
    this.partsApi.get(scope.workspaceId, scope.partId).subscribe({
      next: (part) => {
        this.draftVersion = part.draftVersion;
        this.draftStatus.set('pending');
        this.drafts.next(this.state.document());
      },
      error: (failure: unknown) => this.actionError.set(toApiError(failure).message),
    });
  }

  /** Sends the draft again after a failed save. */
  protected retrySave(): void {
    this.draftStatus.set('pending');
    this.drafts.next(this.state.document());
  }

  /** Opens the file picker for a JSON part document. */
  protected chooseImport(): void {
    this.fileInput()?.nativeElement.click();
  }

  /** Reads the chosen file and makes it the working document (undoable). */
  protected async importFile(event: Event): Promise<void> {
    const inputElement = event.target as HTMLInputElement;
    const file = inputElement.files?.[0];
    inputElement.value = '';
    if (!file) return;
    this.actionError.set(null);
    this.notice.set(null);
    if (file.size > MAX_IMPORT_BYTES) {
      this.actionError.set(`${file.name} is larger than ${MAX_IMPORT_BYTES / 1024 / 1024} MB; nothing was imported.`);
      return;
    }
    const result = parsePartFile(await file.text());
    if (!result.ok) {
      this.actionError.set(`${file.name}: ${result.message} Nothing was imported.`);
      return;
    }
    this.state.replace(result.document);
    this.notice.set(`Imported ${file.name}. Undo (Ctrl+Z) brings back the previous document.`);
  }

  /** Downloads the working document as a JSON file. */
  protected exportFile(): void {
    const doc = this.state.document();
    const url = URL.createObjectURL(new Blob([partFileText(doc)], { type: 'application/json' }));
    const link = document.createElement('a');
    link.href = url;
    link.download = partFileName(doc);
    link.click();
    setTimeout(() => URL.revokeObjectURL(url), 0);
  }

  /** Loads the part again after a failure. */
  protected reload(): void {
    this.part.reload();
  }

  private startEditing(part: Part): void {
    const doc = toDraftDocument(part.draft, part.name);
    if (!doc.category && this.project.value()) doc.category = this.project.value()!.category;
    this.draftVersion = part.draftVersion;
    this.savedJson = JSON.stringify(doc);
    this.state.load(doc);
    this.draftStatus.set(this.mayEdit() ? 'saved' : 'readonly');
    this.loaded.set(true);
  }

  private queueDraft(doc: DraftDocument): void {
    if (!this.loaded() || !this.mayEdit() || this.conflict()) return;
    if (JSON.stringify(doc) === this.savedJson) {
      if (this.draftStatus() === 'pending') this.draftStatus.set('saved');
      return;
    }
    this.draftStatus.set('pending');
    this.drafts.next(doc);
  }

  private saveDraft(doc: DraftDocument) {
    return defer(() => {
      const scope = this.partScope()!;
      if (this.draftStatus() !== 'conflict') this.draftStatus.set('saving');
      return this.partsApi.saveDraft(scope.workspaceId, scope.partId, { draft: doc, draftVersion: this.draftVersion });
    });
  }

  /** The error a failed call reports, as text. */
  protected messageOf(error: ApiError | null): string | null {
    return error?.message ?? null;
  }
}
