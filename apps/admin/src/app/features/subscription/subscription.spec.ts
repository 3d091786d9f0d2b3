import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor, WorkspaceStandings } from '@tumblewise/api-client';
import type { Billing, Role } from '@tumblewise/shared';
import { Subscription } from './subscription';

// Invented workspace, plan and figures.
const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const URL = `/api/v1/workspaces/${WORKSPACE.id}/billing`;
const PLAN = { id: 'crew', name: 'Crew', description: 'Per seat, monthly.', pricePerSeatMonthly: 1900, currency: 'eur', trialDays: 14 };

function billing(overrides: Partial<Billing> = {}): Billing {
  return {
    plans: [PLAN],
    plan: PLAN,
    seats: { bought: 5, members: 3, pendingInvitations: 1, available: 1, evaluationAllowance: false },
    subscription: {
      status: 'trialing',
      cancelAtPeriodEnd: false,
      currentPeriodEnd: '2026-12-16T09:00:00.000Z',
      trialEndsAt: '2026-12-16T09:00:00.000Z',
    },
    paymentMethod: { brand: 'visa', last4: '4242', expMonth: 12, expYear: 2030 },
    workspaceState: 'active',
    pastDueSince: null,
    readOnlyFrom: null,
    ...overrides,
  };
}

const EVALUATION = billing({
  plan: null,
  subscription: null,
  paymentMethod: null,
  seats: { bought: 3, members: 1, pendingInvitations: 0, available: 2, evaluationAllowance: true },
});

describe('Subscription', () => {
  let fixture: ComponentFixture<Subscription>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  async function open(role: Role, answer: Billing): Promise<void> {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Subscription],
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    TestBed.inject(AuthState).setSession({
      accessToken: 'token-one',
      expiresIn: 900,
      user: {
        id: '10000000-0000-4000-8000-000000000001',
        email: 'mira.okafor@example.test',
        name: 'Mira Okafor',
        isOperator: false,
        createdAt: WORKSPACE.createdAt,
      },
      memberships: [{ workspace: WORKSPACE, role }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(Subscription);
    host = fixture.nativeElement;
    fixture.detectChanges();
    backend.expectOne(URL).flush(answer);
    await fixture.whenStable();
  }

  afterEach(() => backend.verify());

  const byTestId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  /** The element's text without icon ligatures. */
  function text(id: string): string {
    const element = byTestId(id)?.cloneNode(true) as HTMLElement | undefined;
    element?.querySelectorAll('.material-icons').forEach((icon) => icon.remove());
    return element?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
  }

  async function typeSeats(value: string): Promise<void> {
    const input = byTestId('seats-input') as HTMLInputElement;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    byTestId('seats-submit')!.click();
    await fixture.whenStable();
  }

  it('shows the plan, the seats used and bought, the card and the dates', async () => {
    await open('owner', billing());
    expect(text('subscription-plan')).toBe('Crew');
    expect(text('seats-summary')).toBe('4 of 5 seats in use');
    expect(text('payment-method')).toBe('Visa ending in 4242, expires 12/2030');
    expect(text('trial-ends')).toBe('Dec 16, 2026');
    expect(text('seats-proration-note')).toBe('The change is prorated on the next invoice.');
    expect(text('subscription-status')).toContain('Trial');
  });

  it('refuses fewer seats than members plus pending invitations without asking the server', async () => {
    await open('owner', billing());
    await typeSeats('3');
    expect(text('seats-error')).toBe(
      'Seats must be at least 4: 3 members and 1 pending invitation hold seats. Remove members or revoke invitations first.',
    );
    backend.expectNone(`${URL}/subscription`);
    await typeSeats('2.5');
    expect(text('seats-error')).toBe('Seats must be a whole number.');
    backend.expectNone(`${URL}/subscription`);
  });

  it('sends an allowed change and shows the new count with the proration note', async () => {
    await open('owner', billing());
    await typeSeats('6');
    const call = backend.expectOne({ method: 'PATCH', url: `${URL}/subscription` });
    expect(call.request.body).toEqual({ seats: 6 });
    call.flush(billing({ seats: { bought: 6, members: 3, pendingInvitations: 1, available: 2, evaluationAllowance: false } }));
    await fixture.whenStable();
    expect(text('seats-summary')).toBe('4 of 6 seats in use');
    expect(text('subscription-notice')).toBe('Seats changed to 6. The change is prorated on the next invoice.');
  });

  it('shows the server’s 409 beside the seats when an invitation took the seat meanwhile', async () => {
    await open('owner', billing());
    await typeSeats('4');
    backend.expectOne({ method: 'PATCH', url: `${URL}/subscription` }).flush(
      {
        error: {
          code: 'seats_in_use',
          message: '5 seats are in use (3 members and 2 pending invitations); revoke invitations or remove members first.',
        },
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    expect(text('seats-error')).toBe(
      '5 seats are in use (3 members and 2 pending invitations); revoke invitations or remove members first.',
    );
    expect(text('seats-summary')).toBe('4 of 5 seats in use');
  });

  it('says so during the evaluation allowance and buys seats with the card token only', async () => {
    await open('owner', EVALUATION);
    expect(text('evaluation-allowance')).toBe('Evaluation allowance: 3 seats until you buy a subscription.');
    const seats = byTestId('buy-seats') as HTMLInputElement;
    seats.value = '3';
    seats.dispatchEvent(new Event('input'));
    for (const [id, value] of [
      ['card-number', '4242 4242 4242 4242'],
      ['card-expiry', '12/40'],
      ['card-cvc', '123'],
    ]) {
      const input = byTestId(id) as HTMLInputElement;
      input.value = value;
      input.dispatchEvent(new Event('input'));
    }
    await fixture.whenStable();
    byTestId('card-submit')!.click();
    await fixture.whenStable();
    const call = backend.expectOne({ method: 'POST', url: `${URL}/subscription` });
    expect(call.request.body).toEqual({ planId: 'crew', seats: 3, cardToken: 'tok_visa' });
    call.flush(billing({ seats: { bought: 3, members: 1, pendingInvitations: 0, available: 2, evaluationAllowance: false } }));
    await fixture.whenStable();
    expect(text('subscription-notice')).toBe('Subscribed to Crew with 3 seats.');
  });

  it('shows a declined card’s message and keeps the evaluation as it was', async () => {
    await open('owner', EVALUATION);
    for (const [id, value] of [
      ['card-number', '4000 0000 0000 0002'],
      ['card-expiry', '12/40'],
      ['card-cvc', '123'],
    ]) {
      const input = byTestId(id) as HTMLInputElement;
      input.value = value;
      input.dispatchEvent(new Event('input'));
    }
    byTestId('card-submit')!.click();
    await fixture.whenStable();
    const call = backend.expectOne({ method: 'POST', url: `${URL}/subscription` });
    expect(call.request.body.cardToken).toBe('tok_chargeDeclined');
    call.flush(
      { error: { code: 'card_declined', message: 'The card was declined. Nothing was charged and nothing changed.' } },
      { status: 402, statusText: 'Payment Required' },
    );
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="buy-panel"] [data-testid="error-banner"] p')?.textContent).toBe(
      'The card was declined. Nothing was charged and nothing changed.',
    );
    expect(text('evaluation-allowance')).toContain('3 seats');
    expect(text('payment-method')).toBe('No card on file.');
  });

  it('is read-only for admins: no forms, a note saying why', async () => {
    await open('admin', billing());
    expect(text('billing-read-only-note')).toContain('Only owners can change');
    expect(byTestId('seats-input')).toBeNull();
    expect(byTestId('cancel-subscription')).toBeNull();
    expect(byTestId('payment-method-change')).toBeNull();
    expect(text('seats-summary')).toBe('4 of 5 seats in use');
  });

  it('passes the billing state on to the shell’s banner', async () => {
    await open(
      'admin',
      billing({ workspaceState: 'past_due', pastDueSince: '2026-11-28T09:00:00.000Z', readOnlyFrom: '2026-12-12T09:00:00.000Z' }),
    );
    expect(TestBed.inject(WorkspaceStandings).current()).toEqual({
      state: 'past_due',
      readOnlyFrom: '2026-12-12T09:00:00.000Z',
      suspendedReason: null,
    });
    expect(text('workspace-state')).toBe('Past due since Nov 28, 2026; read-only from Dec 12, 2026');
  });
});
