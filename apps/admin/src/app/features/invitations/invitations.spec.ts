import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor } from '@tumblewise/api-client';
import type { Invitation } from '@tumblewise/shared';
import { Confirmation } from '@tumblewise/ui';
import { of } from 'rxjs';
import { Invitations } from './invitations';

const WORKSPACE = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const URL = `/api/v1/workspaces/${WORKSPACE.id}/invitations`;

function invitation(overrides: Partial<Invitation>): Invitation {
  return {
    id: '20000000-0000-4000-8000-000000000001',
    email: 'teo.vance@example.test',
    role: 'designer',
    status: 'pending',
    delivery: 'sent',
    deliveryError: null,
    invitedBy: { id: '10000000-0000-4000-8000-000000000001', name: 'Mira Okafor' },
    expiresAt: '2026-12-08T09:00:00.000Z',
    createdAt: '2026-12-01T09:00:00.000Z',
    lastSentAt: '2026-12-01T09:00:00.000Z',
    ...overrides,
  };
}

describe('Invitations', () => {
  let fixture: ComponentFixture<Invitations>;
  let backend: HttpTestingController;
  let host: HTMLElement;

  beforeEach(async () => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [Invitations],
      providers: [
        provideRouter([]),
        provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])),
        provideHttpClientTesting(),
        { provide: Confirmation, useValue: { ask: () => of(true) } },
      ],
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
      memberships: [{ workspace: WORKSPACE, role: 'admin' }],
    });
    backend = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(Invitations);
    host = fixture.nativeElement;
    fixture.detectChanges();
    backend.expectOne(URL).flush([
      invitation({}),
      invitation({
        id: '20000000-0000-4000-8000-000000000002',
        email: 'ana.b@example.test',
        delivery: 'not_sent',
        deliveryError: 'mail server unreachable',
      }),
      invitation({ id: '20000000-0000-4000-8000-000000000003', email: 'old.friend@example.test', status: 'accepted' }),
    ]);
    await fixture.whenStable();
  });

  afterEach(() => backend.verify());

  const byTestId = (id: string) => host.querySelector<HTMLElement>(`[data-testid="${id}"]`);
  const allText = (id: string) => Array.from(host.querySelectorAll(`[data-testid="${id}"]`)).map((e) => e.textContent!.trim());

  function typeEmail(value: string): void {
    const input = byTestId('invite-email') as HTMLInputElement;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }

  async function send(): Promise<void> {
    byTestId('invite-submit')!.click();
    await fixture.whenStable();
  }

  it('shows status and delivery of each invitation', () => {
    expect(allText('invitation-email')).toEqual(['teo.vance@example.test', 'ana.b@example.test', 'old.friend@example.test']);
    expect(allText('invitation-status')).toEqual(['Pending', 'Pending', 'Accepted']);
    expect(allText('invitation-delivery')).toEqual(['sent', 'not sent (mail server unreachable)', 'sent']);
    // Accepted invitations can be neither re-sent nor revoked.
    expect(host.querySelectorAll('[data-testid="invitation-revoke"]')).toHaveLength(2);
  });

  it('offers only the roles an admin may give', async () => {
    const select = byTestId('invite-role')!;
    select.click();
    await fixture.whenStable();
    const options = Array.from(document.querySelectorAll('mat-option')).map((o) => o.textContent!.trim());
    expect(options).toEqual(['Admin', 'Designer', 'Reviewer']);
  });

  it('validates the e-mail beside the field and sends nothing', async () => {
    await send();
    expect(byTestId('invite-email-error')?.textContent?.trim()).toBe('E-mail is required.');
    typeEmail('teo at example');
    await send();
    expect(byTestId('invite-email-error')?.textContent?.trim()).toBe('E-mail must be an e-mail address.');
    backend.expectNone((r) => r.method === 'POST');
  });

  it('puts an "already invited" refusal beside the e-mail', async () => {
    typeEmail('teo.vance@example.test');
    await send();
    backend
      .expectOne((r) => r.method === 'POST' && r.url === URL)
      .flush(
        { error: { code: 'already_invited', message: 'This address already has a pending invitation.' } },
        { status: 409, statusText: 'Conflict' },
      );
    await fixture.whenStable();
    expect(byTestId('invite-email-error')?.textContent?.trim()).toBe('This address already has a pending invitation.');
  });

  it('adds a new invitation and says when its e-mail was not sent', async () => {
    typeEmail('kofi.lund@example.test');
    await send();
    const call = backend.expectOne((r) => r.method === 'POST' && r.url === URL);
    expect(call.request.body).toEqual({ email: 'kofi.lund@example.test', role: 'designer' });
    call.flush(
      invitation({
        id: '20000000-0000-4000-8000-000000000009',
        email: 'kofi.lund@example.test',
        delivery: 'not_sent',
        deliveryError: 'connection refused',
      }),
    );
    await fixture.whenStable();
    expect(allText('invitation-email')[0]).toBe('kofi.lund@example.test');
    expect(byTestId('invite-notice')?.textContent).toContain('not sent (connection refused)');
    expect((byTestId('invite-email') as HTMLInputElement).value).toBe('');
  });

  it('re-sends and shows the new delivery state', async () => {
    (host.querySelectorAll('[data-testid="invitation-resend"]')[1] as HTMLElement).click();
    const call = backend.expectOne(`${URL}/20000000-0000-4000-8000-000000000002/resend`);
    expect(call.request.method).toBe('POST');
    call.flush(invitation({ id: '20000000-0000-4000-8000-000000000002', email: 'ana.b@example.test' }));
    await fixture.whenStable();
    expect(allText('invitation-delivery')[1]).toBe('sent');
  });

  it('revokes after confirmation', async () => {
    (host.querySelectorAll('[data-testid="invitation-revoke"]')[0] as HTMLElement).click();
    const call = backend.expectOne(`${URL}/20000000-0000-4000-8000-000000000001`);
    expect(call.request.method).toBe('DELETE');
    call.flush(invitation({ status: 'revoked' }));
    await fixture.whenStable();
    expect(allText('invitation-status')[0]).toBe('Revoked');
  });
});
