import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { AuthState, authInterceptor, errorInterceptor, WorkspaceContext } from '@tumblewise/api-client';
import type { InvitationPreview, Session } from '@tumblewise/shared';
import { AcceptInvitation } from './accept-invitation';

const TOKEN = 'inv_4f9c2d7e1a8b3c6d5e0f9a8b';
const WORKSPACE = {
  id: '0a9b8c7d-6e5f-4a3b-9c2d-1e0f9a8b7c6d',
  name: 'Ridgeline Throwing Club',
  state: 'active' as const,
  createdAt: '2026-11-20T09:00:00.000Z',
};
const USER = {
  id: '9d8c7b6a-5f4e-4d3c-8b2a-190817263544',
  email: 'teo.vance@example.test',
  name: 'Teo Vance',
  isOperator: false,
  createdAt: '2026-12-01T09:00:00.000Z',
};

function preview(overrides: Partial<InvitationPreview> = {}): InvitationPreview {
  return {
    workspaceName: 'Ridgeline Throwing Club',
    email: 'teo.vance@example.test',
    role: 'designer',
    invitedBy: 'Mira Okafor',
    accountExists: false,
    expiresAt: '2026-12-08T09:00:00.000Z',
    ...overrides,
  };
}

function joinedSession(token = 'token-joined'): Session {
  return {
    accessToken: token,
    expiresIn: 900,
    user: USER,
    memberships: [{ workspace: WORKSPACE, role: 'designer' }],
    workspace: WORKSPACE,
  };
}

describe('AcceptInvitation', () => {
  let fixture: ComponentFixture<AcceptInvitation>;
  let backend: HttpTestingController;
  let host: HTMLElement;
  let navigate: jest.SpyInstance;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      imports: [AcceptInvitation],
      providers: [provideRouter([]), provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    backend = TestBed.inject(HttpTestingController);
    navigate = jest.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
  });

  afterEach(() => backend.verify());

  async function open(answer: InvitationPreview | { status: number; body: object }): Promise<void> {
    fixture = TestBed.createComponent(AcceptInvitation);
    host = fixture.nativeElement;
    fixture.componentRef.setInput('token', TOKEN);
    // The pending preview request keeps the fixture unstable, so render without waiting for it.
    fixture.detectChanges();
    const call = backend.expectOne((r) => r.url === '/api/v1/invitations/preview');
    expect(call.request.params.get('token')).toBe(TOKEN);
    if ('status' in answer) call.flush(answer.body, { status: answer.status, statusText: 'Gone' });
    else call.flush(answer);
    await fixture.whenStable();
  }

  function byTestId<T extends HTMLElement = HTMLElement>(id: string): T | null {
    return host.querySelector<T>(`[data-testid="${id}"]`);
  }

  function type(id: string, value: string): void {
    const input = byTestId<HTMLInputElement>(id)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    input.dispatchEvent(new Event('blur'));
  }

  async function click(id: string): Promise<void> {
    byTestId<HTMLButtonElement>(id)!.click();
    await fixture.whenStable();
  }

  it('asks for the link when there is no token', async () => {
    fixture = TestBed.createComponent(AcceptInvitation);
    host = fixture.nativeElement;
    await fixture.whenStable();
    expect(byTestId('error-banner')?.textContent).toContain('invitation e-mail');
    backend.expectNone(() => true);
  });

  it('shows what the invitation offers', async () => {
    await open(preview());
    const summary = byTestId('invitation-summary')!.textContent!.replace(/\s+/g, ' ');
    expect(summary).toContain('Mira Okafor invites you to join Ridgeline Throwing Club as Designer.');
    expect(byTestId('invitation-email')?.textContent).toBe('teo.vance@example.test');
  });

  it('explains an expired or used link (410)', async () => {
    await open({ status: 410, body: { error: { code: 'token_invalid', message: 'This link has expired.' } } });
    expect(byTestId('error-banner')?.textContent).toContain('expired, was revoked or was already used');
    expect(byTestId('accept-submit')).toBeNull();
  });

  it('validates the new-account form beside each field', async () => {
    await open(preview());
    await click('accept-submit');
    expect(byTestId('accept-name-error')?.textContent?.trim()).toBe('Your name is required.');
    expect(byTestId('accept-password-error')?.textContent?.trim()).toBe('Password is required.');
    type('accept-name', 'Teo Vance');
    type('accept-password', 'too short');
    await click('accept-submit');
    expect(byTestId('accept-password-error')?.textContent?.trim()).toBe('Password must be at least 10 characters.');
    backend.expectNone('/api/v1/invitations/accept');
  });

  it('creates the account, joins and opens the joined workspace', async () => {
    await open(preview());
    type('accept-name', ' Teo Vance ');
    type('accept-password', 'a long enough secret');
    await click('accept-submit');
    const call = backend.expectOne('/api/v1/invitations/accept');
    expect(call.request.body).toEqual({ token: TOKEN, name: 'Teo Vance', password: 'a long enough secret' });
    expect(call.request.headers.has('Authorization')).toBe(false);
    call.flush(joinedSession());
    await fixture.whenStable();
    expect(TestBed.inject(AuthState).accessToken()).toBe('token-joined');
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(WORKSPACE.id);
    expect(navigate).toHaveBeenCalledWith('/');
  });

  it('maps a field error of the server onto the form', async () => {
    await open(preview());
    type('accept-name', 'Teo Vance');
    type('accept-password', 'a long enough secret');
    await click('accept-submit');
    backend
      .expectOne('/api/v1/invitations/accept')
      .flush(
        { error: { code: 'bad_input', message: 'Your name must not contain control characters.', field: 'name' } },
        { status: 400, statusText: 'Bad Request' },
      );
    await fixture.whenStable();
    expect(byTestId('accept-name-error')?.textContent?.trim()).toBe('Your name must not contain control characters.');
  });

  it('switches to sign-in when the server finds an account for the address', async () => {
    await open(preview());
    type('accept-name', 'Teo Vance');
    type('accept-password', 'a long enough secret');
    await click('accept-submit');
    backend
      .expectOne('/api/v1/invitations/accept')
      .flush({ error: { code: 'account_exists', message: 'This address has an account.' } }, { status: 409, statusText: 'Conflict' });
    await fixture.whenStable();
    expect(byTestId('accept-submit')).toBeNull();
    expect(byTestId('accept-signin-password')).not.toBeNull();
  });

  it('signs in to the existing account, then accepts with its token', async () => {
    await open(preview({ accountExists: true }));
    expect(byTestId<HTMLInputElement>('accept-signin-email')?.value).toBe('teo.vance@example.test');
    type('accept-signin-password', 'my existing secret');
    await click('accept-signin-submit');

    const signIn = backend.expectOne('/api/v1/auth/signin');
    expect(signIn.request.body).toEqual({ email: 'teo.vance@example.test', password: 'my existing secret' });
    signIn.flush({ ...joinedSession('token-signed-in'), memberships: [], workspace: undefined });
    await fixture.whenStable();

    const accept = backend.expectOne('/api/v1/invitations/accept');
    expect(accept.request.body).toEqual({ token: TOKEN });
    expect(accept.request.headers.get('Authorization')).toBe('Bearer token-signed-in');
    accept.flush(joinedSession());
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith('/');
  });

  it('shows a wrong password beside the password field', async () => {
    await open(preview({ accountExists: true }));
    type('accept-signin-password', 'not my secret');
    await click('accept-signin-submit');
    backend
      .expectOne('/api/v1/auth/signin')
      .flush(
        { error: { code: 'invalid_credentials', message: 'E-mail or password is wrong.' } },
        { status: 401, statusText: 'Unauthorized' },
      );
    await fixture.whenStable();
    expect(host.querySelector('mat-error')?.textContent?.trim()).toBe('E-mail or password is wrong.');
    backend.expectNone('/api/v1/invitations/accept');
  });

  it('offers one button when already signed in with the invited address', async () => {
    TestBed.inject(AuthState).setSession({ ...joinedSession('token-mine'), memberships: [], workspace: undefined });
    await open(preview({ accountExists: true }));
    expect(byTestId('accept-signin-password')).toBeNull();
    await click('accept-join');
    const accept = backend.expectOne('/api/v1/invitations/accept');
    expect(accept.request.headers.get('Authorization')).toBe('Bearer token-mine');
    accept.flush(joinedSession());
    await fixture.whenStable();
    expect(navigate).toHaveBeenCalledWith('/');
  });

  it('warns instead of joining when signed in with another address', async () => {
    TestBed.inject(AuthState).setSession({ ...joinedSession(), user: { ...USER, email: 'someone.else@example.test' }, memberships: [] });
    await open(preview());
    expect(byTestId('accept-join')).toBeNull();
    expect(host.textContent).toContain('someone.else@example.test');
    expect(byTestId('accept-sign-out')).not.toBeNull();
  });
});
