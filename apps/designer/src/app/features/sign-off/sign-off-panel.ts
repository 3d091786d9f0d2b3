import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, output, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatOption, MatSelect } from '@angular/material/select';
import { AuthState, MembersApi, ReviewsApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import {
  can,
  reviewCommentBodySchema,
  reviewDecisionBodySchema,
  requestReviewBodySchema,
  type ReviewEntry,
  type ReviewThread,
  type VariantStatus,
} from '@tumblewise/shared';
import {
  applyServerError,
  ErrorBanner,
  FieldErrorPipe,
  focusFirstInvalid,
  LoadingState,
  ROLE_LABELS,
  StatusChip,
  zodValidator,
} from '@tumblewise/ui';
import type { Observable } from 'rxjs';

/** How each kind of thread entry is written. */
const ENTRY_WORDS: Record<ReviewEntry['kind'], { icon: string; verb: string }> = {
  requested: { icon: 'rate_review', verb: 'asked for a review' },
  comment: { icon: 'chat_bubble_outline', verb: 'commented' },
  approved: { icon: 'verified', verb: 'approved this variant' },
  changes_requested: { icon: 'assignment_return', verb: 'sent it back with changes requested' },
};

/**
 * The sign-off of one variant: its status, the thread (requests, comments, decisions), asking a
 * member who may decide for a review, commenting, and — for those who may decide — approving or
 * sending it back. Each action shows only to the roles that may take it.
 */
@Component({
  selector: 'tw-sign-off-panel',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    ReactiveFormsModule,
    DatePipe,
    MatButton,
    MatFormField,
    MatLabel,
    MatHint,
    MatError,
    MatInput,
    MatSelect,
    MatOption,
    StatusChip,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
  ],
  templateUrl: './sign-off-panel.html',
  styleUrl: './sign-off-panel.scss',
})
export class SignOffPanel {
  /** The variant whose sign-off is shown. */
  readonly variantId = input.required<string>();
  /** Emitted with the new status after a request or a decision. */
  readonly statusChanged = output<VariantStatus>();

  protected readonly workspace = inject(WorkspaceContext);
  private readonly auth = inject(AuthState);
  private readonly reviewsApi = inject(ReviewsApi);
  private readonly membersApi = inject(MembersApi);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly words = ENTRY_WORDS;
  protected readonly roleLabels = ROLE_LABELS;
  protected readonly mayRequest = computed(() => can(this.workspace.role(), 'projects.edit'));
  protected readonly mayComment = computed(() => can(this.workspace.role(), 'review.comment'));
  protected readonly mayDecide = computed(() => can(this.workspace.role(), 'review.decide'));

  protected readonly thread = rxResource({
    params: () => {
      const workspaceId = this.workspace.workspaceId();
      return workspaceId ? { workspaceId, variantId: this.variantId() } : undefined;
    },
    stream: ({ params }) => this.reviewsApi.thread(params.workspaceId, params.variantId),
  });
  protected readonly status = computed<VariantStatus | null>(() => (this.thread.hasValue() ? this.thread.value().status : null));
  protected readonly loadError = computed(() => {
    const error = this.thread.error();
    return error ? toApiError(error).message : null;
  });

  /** Members who may approve, other than the signed-in user (only loaded for those who may ask). */
  private readonly members = rxResource({
    params: () => {
      const workspaceId = this.workspace.workspaceId();
      return workspaceId && this.mayRequest() ? workspaceId : undefined;
    },
    stream: ({ params: workspaceId }) => this.membersApi.list(workspaceId),
  });
  protected readonly deciders = computed(() => {
    const me = this.auth.user()?.id;
    return (this.members.hasValue() ? this.members.value() : []).filter((m) => can(m.role, 'review.decide') && m.userId !== me);
  });
  protected readonly canAskNow = computed(() => this.mayRequest() && (this.status() === 'draft' || this.status() === 'changes_requested'));
  protected readonly canDecideNow = computed(() => this.mayDecide() && this.status() === 'in_review');
  /** Who was asked last, for "waiting for …". */
  protected readonly waitingFor = computed(() => {
    if (this.status() !== 'in_review' || !this.thread.hasValue()) return null;
    const requests = this.thread.value().entries.filter((e) => e.kind === 'requested');
    return requests[requests.length - 1]?.reviewer?.name ?? null;
  });

  protected readonly requestForm = this.fb.group({
    reviewerId: ['', [Validators.required]],
    message: ['', [zodValidator(requestReviewBodySchema.shape.message)]],
  });
  protected readonly commentForm = this.fb.group({ body: ['', [Validators.required, zodValidator(reviewCommentBodySchema.shape.body)]] });
  protected readonly decisionForm = this.fb.group({ body: ['', [zodValidator(reviewDecisionBodySchema.shape.body)]] });

  protected readonly busy = signal<'request' | 'comment' | 'approved' | 'changes_requested' | null>(null);
  protected readonly failure = signal<string | null>(null);

  /** Asks the chosen member to review the variant. */
  protected requestReview(): void {
    if (!this.validate(this.requestForm)) return;
    const { reviewerId, message } = this.requestForm.getRawValue();
    this.send(
      'request',
      (ws) => this.reviewsApi.request(ws, this.variantId(), { reviewerId, ...(message.trim() ? { message: message.trim() } : {}) }),
      this.requestForm,
      () => this.requestForm.reset({ reviewerId: '', message: '' }),
    );
  }

  /** Adds the typed comment to the thread. */
  protected postComment(): void {
    if (!this.validate(this.commentForm)) return;
    const body = this.commentForm.getRawValue().body.trim();
    this.send(
      'comment',
      (ws) => this.reviewsApi.comment(ws, this.variantId(), { body }),
      this.commentForm,
      () => this.commentForm.reset({ body: '' }),
    );
  }

  /** Approves the variant, or sends it back (a note saying what to change is then required). */
  protected decide(decision: 'approved' | 'changes_requested'): void {
    const control = this.decisionForm.controls.body;
    if (decision === 'changes_requested' && !control.value.trim()) {
      control.setErrors({ rule: 'is required when sending a variant back: say what should change' });
      control.markAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    if (!this.validate(this.decisionForm)) return;
    const body = control.value.trim();
    this.send(
      decision,
      (ws) => this.reviewsApi.decide(ws, this.variantId(), { decision, ...(body ? { body } : {}) }),
      this.decisionForm,
      () => this.decisionForm.reset({ body: '' }),
    );
  }

  /** Loads the thread again after a failure. */
  protected reloadThread(): void {
    this.thread.reload();
  }

  private validate(form: { invalid: boolean; markAllAsTouched(): void }): boolean {
    this.failure.set(null);
    if (!form.invalid) return true;
    form.markAllAsTouched();
    focusFirstInvalid(this.host.nativeElement);
    return false;
  }

  private send(
    kind: NonNullable<ReturnType<typeof this.busy>>,
    call: (workspaceId: string) => Observable<ReviewThread>,
    form: Parameters<typeof applyServerError>[0],
    done: () => void,
  ): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId || this.busy()) return;
    const before = this.status();
    this.busy.set(kind);
    call(workspaceId).subscribe({
      next: (thread) => {
        this.busy.set(null);
        this.thread.set(thread);
        done();
        if (thread.status !== before) this.statusChanged.emit(thread.status);
      },
      error: (error: unknown) => {
        this.busy.set(null);
        const fault = toApiError(error);
        // A 409 means the status moved on elsewhere: show the message and the current thread.
        if (fault.status === 409) this.thread.reload();
        if (!applyServerError(form, fault)) this.failure.set(fault.message);
      },
    });
  }
}
