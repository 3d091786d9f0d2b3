import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatProgressBar } from '@angular/material/progress-bar';
import { MatOption, MatSelect } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { BillingApi, toApiError, WorkspaceContext } from '@tumblewise/api-client';
import { can, type Billing, type Plan } from '@tumblewise/shared';
import { applyServerError, Confirmation, ErrorBanner, FieldErrorPipe, LoadingState, PageHeader } from '@tumblewise/ui';
import { filter, switchMap } from 'rxjs';
import { formatMoney } from '../../core/money';
import { workspaceStateLabel } from '../../core/workspace-state-labels';
import { CardForm } from './card-form/card-form';
import { seatCountValidator, seatHoldersClause, seatsInUse } from './seat-rules';
import { cardBrandLabel, SUBSCRIPTION_STATUS_LABELS } from './subscription-labels';

type Busy = 'buy' | 'seats' | 'card' | 'cancel' | 'resume' | null;

/** Plan, seats, payment method and the subscription's life: owners change them, admins read them. */
@Component({
  selector: 'tw-subscription',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    DatePipe,
    ReactiveFormsModule,
    RouterLink,
    MatFormField,
    MatLabel,
    MatError,
    MatHint,
    MatInput,
    MatSelect,
    MatOption,
    MatButton,
    MatProgressBar,
    PageHeader,
    ErrorBanner,
    LoadingState,
    FieldErrorPipe,
    CardForm,
  ],
  templateUrl: './subscription.html',
  styleUrl: './subscription.scss',
})
export class Subscription {
  protected readonly workspace = inject(WorkspaceContext);
  private readonly billingApi = inject(BillingApi);
  private readonly confirmation = inject(Confirmation);

  protected readonly statusLabels = SUBSCRIPTION_STATUS_LABELS;
  protected readonly stateLabel = workspaceStateLabel;
  protected readonly brandLabel = cardBrandLabel;
  protected readonly holdersClause = seatHoldersClause;

  protected readonly billing = rxResource({
    params: () => this.workspace.workspaceId() ?? undefined,
    stream: ({ params: workspaceId }) => this.billingApi.get(workspaceId),
  });
  protected readonly loadError = computed(() => {
    const error = this.billing.error();
    return error ? toApiError(error).message : null;
  });
  /** Only owners change billing; admins see the page read-only. */
  protected readonly mayManage = computed(() => can(this.workspace.role(), 'billing.manage'));
  protected readonly inUse = computed(() => {
    const seats = this.billing.value()?.seats;
    return seats ? { count: seatsInUse(seats), clause: seatHoldersClause(seats) } : null;
  });
  /** The plan shown: the subscribed one, else the first of the catalogue (what a purchase would buy). */
  protected readonly shownPlan = computed<Plan | null>(() => {
    const billing = this.billing.value();
    return billing?.plan ?? billing?.plans[0] ?? null;
  });
  /** Share of the bought seats in use, for the bar (0–100). */
  protected readonly usePercent = computed(() => {
    const billing = this.billing.value();
    const used = this.inUse()?.count ?? 0;
    return billing && billing.seats.bought > 0 ? Math.min(100, Math.round((used / billing.seats.bought) * 100)) : 0;
  });

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly buyForm = this.fb.group({
    planId: [''],
    seats: [1 as number, [seatCountValidator(() => this.inUse())]],
  });
  protected readonly seatsForm = this.fb.group({
    seats: [1 as number, [seatCountValidator(() => this.inUse())]],
  });

  protected readonly busy = signal<Busy>(null);
  /** The server's refusal of a purchase (a declined card) or of a card change. */
  protected readonly buyError = signal<string | null>(null);
  protected readonly cardError = signal<string | null>(null);
  protected readonly actionError = signal<string | null>(null);
  /** What the last change did, for the status line. */
  protected readonly notice = signal<string | null>(null);
  /** Whether the card form for a new payment method is open. */
  protected readonly replacingCard = signal(false);

  private readonly replaceCardForm = viewChild<CardForm>('replaceCardForm');

  constructor() {
    // Each answer from the server sets the seat fields to what it says, unless the user is typing.
    effect(() => {
      const billing = this.billing.value();
      if (!billing) return;
      const used = seatsInUse(billing.seats);
      if (!this.seatsForm.dirty) this.seatsForm.reset({ seats: billing.seats.bought });
      if (!this.buyForm.dirty) this.buyForm.reset({ planId: billing.plan?.id ?? billing.plans[0]?.id ?? '', seats: Math.max(1, used) });
    });
  }

  /** A price per seat and month, formatted. */
  protected price(plan: Plan): string {
    return `${formatMoney(plan.pricePerSeatMonthly, plan.currency)} per seat and month`;
  }

  /** Total of a month for `seats` seats of `plan`. */
  protected monthlyTotal(plan: Plan, seats: number): string {
    return formatMoney(plan.pricePerSeatMonthly * (Number.isFinite(seats) ? seats : 0), plan.currency);
  }

  /** Buys the seats with the token from the card form; a decline shows the server's message and changes nothing. */
  protected buySeats(cardToken: string): void {
    const workspaceId = this.workspace.workspaceId();
    this.buyError.set(null);
    this.notice.set(null);
    if (!workspaceId) return;
    if (this.buyForm.invalid) {
      this.buyForm.markAllAsTouched();
      return;
    }
    const { planId, seats } = this.buyForm.getRawValue();
    this.busy.set('buy');
    this.billingApi.start(workspaceId, { ...(planId ? { planId } : {}), seats: Number(seats), cardToken }).subscribe({
      next: (billing) => {
        this.busy.set(null);
        this.buyForm.markAsPristine();
        this.seatsForm.markAsPristine();
        this.billing.set(billing);
        this.notice.set(`Subscribed to ${billing.plan?.name ?? 'the plan'} with ${billing.seats.bought} seats.`);
      },
      error: (error: unknown) => {
        this.busy.set(null);
        const fault = toApiError(error);
        if (!applyServerError(this.buyForm, fault)) this.buyError.set(fault.message);
      },
    });
  }

  /** Saves a new seat count; the server refuses with 409 below the seats in use, shown beside the field. */
  protected changeSeats(): void {
    const workspaceId = this.workspace.workspaceId();
    const current = this.billing.value();
    this.actionError.set(null);
    this.notice.set(null);
    if (!workspaceId || !current) return;
    if (this.seatsForm.invalid) {
      this.seatsForm.markAllAsTouched();
      return;
    }
    const seats = Number(this.seatsForm.getRawValue().seats);
    if (seats === current.seats.bought) {
      this.notice.set(`You already have ${seats} seats.`);
      return;
    }
    this.busy.set('seats');
    this.billingApi.changeSeats(workspaceId, seats).subscribe({
      next: (billing) => {
        this.busy.set(null);
        this.seatsForm.markAsPristine();
        this.billing.set(billing);
        this.notice.set(`Seats changed to ${billing.seats.bought}. The change is prorated on the next invoice.`);
      },
      error: (error: unknown) => {
        this.busy.set(null);
        const fault = toApiError(error);
        const onField = fault.code === 'seats_in_use' || fault.field === 'seats';
        if (onField) applyServerError(this.seatsForm, { field: 'seats', message: fault.message });
        else this.actionError.set(fault.message);
      },
    });
  }

  /** Opens or closes the card form for a new payment method. */
  protected toggleCardForm(): void {
    this.cardError.set(null);
    this.replacingCard.update((open) => !open);
  }

  /** Replaces the card; on a decline the old card stays and the server's message is shown. */
  protected replaceCard(cardToken: string): void {
    const workspaceId = this.workspace.workspaceId();
    this.cardError.set(null);
    this.notice.set(null);
    if (!workspaceId) return;
    this.busy.set('card');
    this.billingApi.updatePaymentMethod(workspaceId, cardToken).subscribe({
      next: (billing) => {
        this.busy.set(null);
        this.billing.set(billing);
        this.replaceCardForm()?.reset();
        this.replacingCard.set(false);
        const card = billing.paymentMethod;
        this.notice.set(
          card ? `Payment method changed to ${cardBrandLabel(card.brand)} ending in ${card.last4}.` : 'Payment method changed.',
        );
      },
      error: (error: unknown) => {
        this.busy.set(null);
        this.cardError.set(toApiError(error).message);
      },
    });
  }

  /** Asks, then ends the subscription at the end of the period (it can be resumed until then). */
  protected cancelAtPeriodEnd(): void {
    const workspaceId = this.workspace.workspaceId();
    const billing = this.billing.value();
    if (!workspaceId || !billing) return;
    this.actionError.set(null);
    this.notice.set(null);
    const end = billing.subscription?.currentPeriodEnd;
    this.confirmation
      .ask({
        title: 'Cancel the subscription at the end of the period?',
        message: `The workspace keeps its seats until ${end ? new Date(end).toLocaleDateString() : 'the end of the period'}; after that it has no paid seats. You can resume until then.`,
        confirmLabel: 'Cancel at period end',
        destructive: true,
      })
      .pipe(
        filter(Boolean),
        switchMap(() => {
          this.busy.set('cancel');
          return this.billingApi.cancel(workspaceId);
        }),
      )
      .subscribe({
        next: (updated) => this.settle(updated, 'The subscription ends at the end of the period. Resume it any time before then.'),
        error: (error: unknown) => this.fail(error),
      });
  }

  /** Takes back a cancellation. */
  protected resume(): void {
    const workspaceId = this.workspace.workspaceId();
    if (!workspaceId) return;
    this.actionError.set(null);
    this.notice.set(null);
    this.busy.set('resume');
    this.billingApi.resume(workspaceId).subscribe({
      next: (updated) => this.settle(updated, 'The subscription continues; it renews at the end of the period.'),
      error: (error: unknown) => this.fail(error),
    });
  }

  /** Loads billing again after a failure. */
  protected reloadBilling(): void {
    this.billing.reload();
  }

  /** True before the first subscription: the workspace runs on the evaluation allowance. */
  protected isEvaluation(billing: Billing): boolean {
    return billing.seats.evaluationAllowance || !billing.subscription;
  }

  private settle(billing: Billing, message: string): void {
    this.busy.set(null);
    this.billing.set(billing);
    this.notice.set(message);
  }

  private fail(error: unknown): void {
    this.busy.set(null);
    this.actionError.set(toApiError(error).message);
  }
}
