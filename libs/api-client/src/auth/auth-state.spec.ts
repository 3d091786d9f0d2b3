import { provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { errorInterceptor } from '../errors/error-interceptor';
import { HARBOUR_WORKSPACE, RIDGE_WORKSPACE, sessionFixture } from '../testing/session-fixture';
import { WorkspaceContext } from '../workspace/workspace-context';
import { authInterceptor } from './auth-interceptor';
import { AuthApi } from './auth-api';
import { AuthState } from './auth-state';

describe('AuthState', () => {
  let state: AuthState;

  beforeEach(() => {
    localStorage.clear();
    state = TestBed.inject(AuthState);
  });

  it('starts signed out', () => {
    expect(state.signedIn()).toBe(false);
    expect(state.accessToken()).toBeNull();
    expect(state.user()).toBeNull();
    expect(state.memberships()).toEqual([]);
    expect(state.restored()).toBe(false);
  });

  it('exposes the parts of a stored session and forgets them on clear', () => {
    const session = sessionFixture({ accessToken: 'token-one' });
    state.setSession(session);
    expect(state.signedIn()).toBe(true);
    expect(state.accessToken()).toBe('token-one');
    expect(state.user()?.email).toBe('mira.okafor@example.test');
    expect(state.memberships()).toHaveLength(1);

    state.clear();
    expect(state.signedIn()).toBe(false);
    expect(state.accessToken()).toBeNull();
  });

  it('replaces memberships only while signed in', () => {
    state.updateMemberships([{ workspace: RIDGE_WORKSPACE, role: 'designer' }]);
    expect(state.memberships()).toEqual([]);
    state.setSession(sessionFixture());
    state.updateMemberships([{ workspace: RIDGE_WORKSPACE, role: 'designer' }]);
    expect(state.memberships().map((m) => m.workspace.name)).toEqual(['Ridgeline Throwing Club']);
  });

  it('keeps the token out of web storage', () => {
    state.setSession(sessionFixture({ accessToken: 'secret-token-value' }));
    const stored =
      Object.keys(localStorage)
        .map((k) => localStorage.getItem(k))
        .join(' ') + Object.keys(sessionStorage).join(' ');
    expect(stored).not.toContain('secret-token-value');
  });
});

describe('AuthApi', () => {
  let api: AuthApi;
  let state: AuthState;
  let backend: HttpTestingController;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    api = TestBed.inject(AuthApi);
    state = TestBed.inject(AuthState);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('stores the session of a sign-up and opens the new workspace', () => {
    api
      .signUp({
        workspaceName: 'Ridgeline Throwing Club',
        name: 'Mira Okafor',
        email: 'mira.okafor@example.test',
        password: 'long enough secret',
      })
      .subscribe();
    const call = backend.expectOne('/api/v1/auth/signup');
    expect(call.request.method).toBe('POST');
    expect(call.request.body).toMatchObject({ workspaceName: 'Ridgeline Throwing Club', email: 'mira.okafor@example.test' });
    call.flush(
      sessionFixture({ workspace: RIDGE_WORKSPACE }, [
        { workspace: HARBOUR_WORKSPACE, role: 'designer' },
        { workspace: RIDGE_WORKSPACE, role: 'owner' },
      ]),
    );
    expect(state.signedIn()).toBe(true);
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(RIDGE_WORKSPACE.id);
    expect(TestBed.inject(WorkspaceContext).role()).toBe('owner');
  });

  it('restores a session at start-up from the refresh cookie', async () => {
    const done = api.restoreSession();
    backend.expectOne('/api/v1/auth/refresh').flush(sessionFixture({ accessToken: 'restored' }));
    await done;
    expect(state.restored()).toBe(true);
    expect(state.accessToken()).toBe('restored');
  });

  it('treats a refused start-up refresh as signed out', async () => {
    const done = api.restoreSession();
    backend
      .expectOne('/api/v1/auth/refresh')
      .flush({ error: { code: 'unauthorized', message: 'No session.' } }, { status: 401, statusText: 'Unauthorized' });
    await done;
    expect(state.restored()).toBe(true);
    expect(state.signedIn()).toBe(false);
  });

  it('forgets the session on sign-out even when the server call fails', () => {
    state.setSession(sessionFixture());
    api.signOut().subscribe({ error: () => undefined });
    backend.expectOne('/api/v1/auth/signout').flush('down', { status: 503, statusText: 'Service Unavailable' });
    expect(state.signedIn()).toBe(false);
  });
});
