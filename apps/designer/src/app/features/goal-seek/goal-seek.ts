import { DatePipe } from '@angular/common';
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
} from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatAnchor, MatButton } from '@angular/material/button';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { RouterLink } from '@angular/router';
import { AnalysisApi, DesignApi, PartsApi, toApiError, VariantsApi, WorkspaceContext } from '@tumblewise/api-client';
import { solveAnswerSchema, type PartDocument, type SolveAnswer, type SolveRequest, type Variant } from '@tumblewise/shared';
import { Confirmation, EmptyState, ErrorBanner, focusFirstInvalid, LoadingState, PageHeader } from '@tumblewise/ui';
import type { Subscription } from 'rxjs';
import { Breadcrumbs, partTrail } from '../../core/breadcrumbs';
import { partPage, variantLabel } from '../../core/part-page';
import { FreeParameterPicker } from './free-parameter-picker';
import { GoalSeekForm, type GoalSeekMode } from './goal-seek-form';
import { LeadTapeForm } from './lead-tape-form';
import { leadTapeUnavailable } from './lead-tape-model';
import { diffRows, proposalLabel, proposalNotes } from './solve-result-model';
import { SolveResult } from './solve-result';
import { solveDraft } from './solve-draft';
import { TargetRows } from './target-rows';
import { currentFigures } from './target-model';

/** A finished solve and what it was asked. */
interface Solved {
  answer: SolveAnswer;
  request: SolveRequest;
  mode: GoalSeekMode;
  /** The validated draft the request was built from. */
  draft: PartDocument;
  draftVersion: number;
  added: string[];
}

/**
 * Goal seek on the part's draft: free parameters with bounds (or the lead-tape preset), targets,
 * solve on the server (cancellable), the proposal as a diff with the achieved figures, and the
 * proposal saved as a new variant or applied to the draft (after asking; optimistic locking).
 */
@Component({
  selector: 'tw-goal-seek',
  changeDetection: ChangeDetectionStrategy.OnPush,
  providers: [GoalSeekForm],
  imports: [
    Breadcrumbs,
    DatePipe,
    ReactiveFormsModule,
    RouterLink,
    MatAnchor,
    MatButton,
    MatRadioGroup,
    MatRadioButton,
    PageHeader,
    EmptyState,
    ErrorBanner,
    LoadingState,
    FreeParameterPicker,
    LeadTapeForm,
    TargetRows,
    SolveResult,
  ],
  templateUrl: './goal-seek.html',
  styleUrl: './goal-seek.scss',
})
export class GoalSeekPage {
  /** Route parameter. */
  readonly projectId = input.required<string>();
  /** Route parameter. */
  readonly partId = input.required<string>();

  protected readonly workspace = inject(WorkspaceContext);
  protected readonly state = inject(GoalSeekForm);
  private readonly designApi = inject(DesignApi);
  private readonly analysisApi = inject(AnalysisApi);
  private readonly variantsApi = inject(VariantsApi);
  private readonly partsApi = inject(PartsApi);
  private readonly confirmation = inject(Confirmation);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** The part (with its draft), its variants and project. */
  private readonly page = partPage({ projectId: this.projectId, partId: this.partId });
  protected readonly part = this.page.part;
  protected readonly loadError = this.page.loadError;
  protected readonly crumbs = computed(() =>
    partTrail(
      this.projectId(),
      this.page.project.hasValue() ? this.page.project.value().name : undefined,
      this.partId(),
      this.part.hasValue() ? this.part.value().name : undefined,
      'Goal seek',
    ),
  );
  protected readonly partPath = computed(() => ['/projects', this.projectId(), 'parts', this.partId()]);
  protected readonly mayEdit = computed(() => this.workspace.can('projects.edit'));
  protected readonly variantLabel = variantLabel;

  /** The draft as the goal seek sees it. */
  protected readonly draft = computed(() => (this.part.hasValue() ? solveDraft(this.part.value().draft) : null));
  protected readonly ready = computed(() => {
    const d = this.draft();
    return d?.kind === 'ready' ? d : null;
  });
  protected readonly tapeUnavailable = computed(() => {
    const d = this.ready();
    return d ? leadTapeUnavailable(d.doc) : null;
  });

  /** The draft's figures now, for the targets' hints (a failure only hides the hints). */
  private readonly analysis = rxResource({
    params: () => {
      const d = this.ready();
      const workspaceId = this.workspace.workspaceId();
      return d && workspaceId ? { raw: d.raw, workspaceId } : undefined;
    },
    stream: ({ params }) => this.analysisApi.analyze(params.raw, params.workspaceId),
  });

  protected readonly solving = signal(false);
  protected readonly solved = signal<Solved | null>(null);
  /** A failure of the solve that no field of the form took. */
  protected readonly failure = signal<string | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly saving = signal(false);
  protected readonly saved = signal<Variant | null>(null);
  protected readonly applying = signal(false);
  protected readonly applied = signal(false);
  protected readonly actionError = signal<string | null>(null);
  /** The draft changed on the server since this page loaded it (409 on apply). */
  protected readonly conflict = signal(false);
  private solveCall: Subscription | null = null;

  constructor() {
    effect(() => {
      const d = this.ready();
      if (d) untracked(() => this.state.setDraft(d.primitives, !!d.doc.grip));
    });
    effect(() => {
      const report = this.analysis.hasValue() ? this.analysis.value() : null;
      if (!report) return;
      untracked(() => {
        this.state.current.set(currentFigures(report));
        this.state.suggestLeadTape(report.trade.length);
      });
    });
    inject(DestroyRef).onDestroy(() => this.solveCall?.unsubscribe());
  }

  /** Builds the request from the form and sends it; the answer replaces the previous one. */
  protected solve(): void {
    const d = this.ready();
    const part = this.part.hasValue() ? this.part.value() : null;
    const workspaceId = this.workspace.workspaceId();
    this.failure.set(null);
    this.notice.set(null);
    if (!d || !part || !workspaceId || this.solving()) return;
    const missing = this.state.mode() === 'custom' ? this.state.customProblem() : null;
    if (missing) {
      this.failure.set(missing);
      return;
    }
    if (!this.state.checkValid()) {
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const built = this.state.buildRequest(d.raw, d.doc);
    if (typeof built === 'string') {
      this.failure.set(built);
      return;
    }
    this.solving.set(true);
    this.solveCall = this.designApi.solve(built.request, workspaceId).subscribe({
      next: (body) => {
        this.solving.set(false);
        const parsed = solveAnswerSchema.safeParse(body);
        if (!parsed.success) {
          this.failure.set('The server’s answer could not be read. Try again.');
          return;
        }
        this.resetActions();
        this.solved.set({ ...built, answer: parsed.data, draft: d.doc, draftVersion: part.draftVersion });
      },
      error: (error: unknown) => {
        this.solving.set(false);
        const fault = toApiError(error);
        if (fault.status === 400 && this.state.showServerError(fault)) {
          this.failure.set('The solver refused a field: see the message beside it.');
          focusFirstInvalid(this.host.nativeElement);
        } else if (fault.status === 400 && fault.field?.startsWith('part.')) {
          this.failure.set(`The draft has a problem at ${fault.field.slice(5)}: ${fault.message} Fix it in the part editor.`);
        } else this.failure.set(fault.field ? `${fault.message} (${fault.field})` : fault.message);
      },
    });
  }

  /** Stops the solve under way (the server stops its work when the request goes). */
  protected cancelSolve(): void {
    this.solveCall?.unsubscribe();
    this.solveCall = null;
    this.solving.set(false);
    this.notice.set('Solve cancelled. Nothing changed.');
  }

  /** Saves the proposed document as the part's next variant, labelled by its targets. */
  protected saveAsVariant(): void {
    const s = this.solved();
    const workspaceId = this.workspace.workspaceId();
    if (!s || !workspaceId || this.saving() || !this.mayEdit()) return;
    this.actionError.set(null);
    this.saving.set(true);
    const rows = diffRows(s.answer, s.draft, s.added);
    this.variantsApi
      .create(workspaceId, this.partId(), {
        document: s.answer.part,
        label: proposalLabel(s.request.targets, s.mode === 'leadTape'),
        notes: proposalNotes(s.draftVersion, s.answer.status, rows, s.answer.reason),
      })
      .subscribe({
        next: (variant) => {
          this.saving.set(false);
          this.saved.set(variant);
          this.page.variants.update((list) => [...(list ?? []), variant]);
        },
        error: (error: unknown) => {
          this.saving.set(false);
          const fault = toApiError(error);
          this.actionError.set(`The variant was not saved. ${fault.message}${fault.field ? ` (${fault.field})` : ''}`);
        },
      });
  }

  /** Asks, then replaces the part's draft with the proposal (with the draft version it was solved from). */
  protected applyToDraft(): void {
    const s = this.solved();
    const workspaceId = this.workspace.workspaceId();
    if (!s || !workspaceId || this.applying() || !this.mayEdit()) return;
    this.actionError.set(null);
    this.confirmation
      .ask({
        title: 'Replace the draft with this proposal?',
        message: `The part’s draft (version ${s.draftVersion}) becomes the proposed document. Anything in the draft that is not saved as a variant is replaced; save a variant first to keep it.`,
        confirmLabel: 'Replace the draft',
      })
      .subscribe((yes) => {
        if (!yes) return;
        this.applying.set(true);
        this.partsApi.saveDraft(workspaceId, this.partId(), { draft: s.answer.part, draftVersion: s.draftVersion }).subscribe({
          next: (part) => {
            this.applying.set(false);
            this.applied.set(true);
            this.part.set(part);
          },
          error: (error: unknown) => {
            this.applying.set(false);
            const fault = toApiError(error);
            if (fault.status === 409) {
              this.conflict.set(true);
              this.actionError.set(
                `The draft was saved again after this page loaded version ${s.draftVersion} (perhaps by the editor’s autosave, or someone else). Nothing was replaced. Load the draft again and solve on it.`,
              );
            } else this.actionError.set(`The draft was not replaced. ${fault.message}`);
          },
        });
      });
  }

  /** Loads the part and its draft again (after a failure or a conflict). */
  protected reload(): void {
    this.conflict.set(false);
    this.actionError.set(null);
    this.page.reload();
  }

  private resetActions(): void {
    this.saved.set(null);
    this.applied.set(false);
    this.actionError.set(null);
    this.conflict.set(false);
  }
}
