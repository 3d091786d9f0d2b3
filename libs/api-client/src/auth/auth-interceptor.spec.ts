import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ApiError } from '../errors/api-error';
import { errorInterceptor } from '../errors/error-interceptor';
import { sessionFixture } from '../testing/session-fixture';
import { authInterceptor } from './auth-interceptor';
import { AuthApi } from './auth-api';
import { AuthState } from './auth-state';

const unauthorized = { error: { code: 'unauthorized', message: 'Sign in again.' } };

describe('authInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let state: AuthState;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([authInterceptor, errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    state = TestBed.inject(AuthState);
  });

  afterEach(() => backend.verify());

  it('attaches the access token to API calls', () => {
    state.setSession(sessionFixture({ accessToken: 'token-one' }));
    http.get('/api/v1/me').subscribe();
    const call = backend.expectOne('/api/v1/me');
    expect(call.request.headers.get('Authorization')).toBe('Bearer token-one');
    call.flush({});
  });

  it('sends no token when signed out', () => {
    http.get('/api/v1/invitations/preview').subscribe();
    const call = backend.expectOne('/api/v1/invitations/preview');
    expect(call.request.headers.has('Authorization')).toBe(false);
    call.flush({});
  });

  it('never sends the token to another origin', () => {
    state.setSession(sessionFixture());
    http.get('https://elsewhere.example/api/v1/me').subscribe();
    const call = backend.expectOne('https://elsewhere.example/api/v1/me');
    expect(call.request.headers.has('Authorization')).toBe(false);
    call.flush({});
  });

  it('refreshes once on 401 and retries the call with the new token', () => {
    state.setSession(sessionFixture({ accessToken: 'token-one' }));
    const answers: unknown[] = [];
    http.get('/api/v1/me').subscribe((body) => answers.push(body));

    backend.expectOne('/api/v1/me').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });
    const refresh = backend.expectOne('/api/v1/auth/refresh');
    expect(refresh.request.method).toBe('POST');
    refresh.flush(sessionFixture({ accessToken: 'token-two' }));

    const retry = backend.expectOne('/api/v1/me');
    expect(retry.request.headers.get('Authorization')).toBe('Bearer token-two');
    retry.flush({ ok: true });

    expect(answers).toEqual([{ ok: true }]);
    expect(state.accessToken()).toBe('token-two');
  });

  it('shares one refresh between calls that fail together', () => {
    state.setSession(sessionFixture({ accessToken: 'token-one' }));
    const answers: string[] = [];
    http.get<string>('/api/v1/workspaces/a/members').subscribe((b) => answers.push(b));
    http.get<string>('/api/v1/workspaces/a/invitations').subscribe((b) => answers.push(b));

    backend.expectOne('/api/v1/workspaces/a/members').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/workspaces/a/invitations').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(sessionFixture({ accessToken: 'token-two' }));

    backend.expectOne('/api/v1/workspaces/a/members').flush('members');
    backend.expectOne('/api/v1/workspaces/a/invitations').flush('invitations');
    expect(answers.sort()).toEqual(['invitations', 'members']);
  });

  it('does not refresh a second time when the retried call is refused again', () => {
    state.setSession(sessionFixture({ accessToken: 'token-one' }));
    let failure: unknown;
    http.get('/api/v1/me').subscribe({ error: (e) => (failure = e) });

    backend.expectOne('/api/v1/me').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(sessionFixture({ accessToken: 'token-two' }));
    backend.expectOne('/api/v1/me').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });

    backend.expectNone('/api/v1/auth/refresh');
    expect(failure).toBeInstanceOf(ApiError);
    expect((failure as ApiError).status).toBe(401);
  });

  it('clears the session and passes the 401 on when the refresh is refused', () => {
    state.setSession(sessionFixture({ accessToken: 'token-one' }));
    let failure: unknown;
    http.get('/api/v1/me').subscribe({ error: (e) => (failure = e) });

    backend.expectOne('/api/v1/me').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });
    backend.expectOne('/api/v1/auth/refresh').flush(unauthorized, { status: 401, statusText: 'Unauthorized' });

    expect(state.signedIn()).toBe(false);
    expect((failure as ApiError).status).toBe(401);
    expect((failure as ApiError).code).toBe('unauthorized');
  });

  it('does not try to refresh when sign-in itself answers 401', () => {
    let failure: unknown;
    TestBed.inject(AuthApi)
      .signIn({ email: 'mira.okafor@example.test', password: 'wrong password' })
      .subscribe({ error: (e) => (failure = e) });
    backend
      .expectOne('/api/v1/auth/signin')
      .flush(
        { error: { code: 'invalid_credentials', message: 'E-mail or password is wrong.' } },
        { status: 401, statusText: 'Unauthorized' },
      );
    backend.expectNone('/api/v1/auth/refresh');
    expect((failure as ApiError).code).toBe('invalid_credentials');
  });

  it('passes other errors through without refreshing', () => {
    state.setSession(sessionFixture());
    let failure: unknown;
    http.delete('/api/v1/workspaces/a/members/b').subscribe({ error: (e) => (failure = e) });
    backend
      .expectOne('/api/v1/workspaces/a/members/b')
      .flush({ error: { code: 'forbidden', message: 'Your role does not allow this.' } }, { status: 403, statusText: 'Forbidden' });
    backend.expectNone('/api/v1/auth/refresh');
    expect((failure as ApiError).status).toBe(403);
  });
});
