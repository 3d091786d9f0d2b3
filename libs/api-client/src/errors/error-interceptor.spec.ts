import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ApiError } from './api-error';
import { errorInterceptor } from './error-interceptor';

describe('errorInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([errorInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  function failureOf(url: string, flush: (call: ReturnType<HttpTestingController['expectOne']>) => void): ApiError {
    let failure: unknown;
    http.get(url).subscribe({ error: (e) => (failure = e) });
    flush(backend.expectOne(url));
    expect(failure).toBeInstanceOf(ApiError);
    return failure as ApiError;
  }

  it('reads code, message and field from the error body', () => {
    const error = failureOf('/api/v1/auth/signup', (call) =>
      call.flush(
        { error: { code: 'email_taken', message: 'An account with this e-mail already exists.', field: 'email' } },
        { status: 409, statusText: 'Conflict' },
      ),
    );
    expect(error).toMatchObject({
      status: 409,
      code: 'email_taken',
      field: 'email',
      message: 'An account with this e-mail already exists.',
    });
  });

  it('carries the problems of a refused file, each with its line', () => {
    const problems = [
      { line: 3, message: 'value "-3" must be a positive number' },
      { line: null, message: 'the file has 2 more problems' },
    ];
    const error = failureOf('/api/v1/workspaces/w/variants/v/measurements', (call) =>
      call.flush(
        {
          error: {
            code: 'invalid_input',
            message: 'The CSV was not imported: line 3: value "-3" must be a positive number.',
            field: 'file',
            problems,
          },
        },
        { status: 400, statusText: 'Bad Request' },
      ),
    );
    expect(error).toMatchObject({ status: 400, code: 'invalid_input', field: 'file', problems });
  });

  it('has no problems for an error that lists none, or whose list is malformed', () => {
    const plain = failureOf('/api/v1/auth/signup', (call) =>
      call.flush({ error: { code: 'email_taken', message: 'Taken.', field: 'email' } }, { status: 409, statusText: 'Conflict' }),
    );
    expect(plain.problems).toEqual([]);
    const malformed = failureOf('/api/v1/me', (call) =>
      call.flush({ error: { code: 'invalid_input', message: 'Bad.', problems: 'line 2: x' } }, { status: 400, statusText: 'Bad Request' }),
    );
    expect(malformed).toMatchObject({ code: 'bad_request', problems: [] });
  });

  it('keeps the last-owner refusal readable', () => {
    const error = failureOf('/api/v1/workspaces/w/members/m', (call) =>
      call.flush(
        { error: { code: 'last_owner', message: 'A workspace needs at least one owner.' } },
        { status: 409, statusText: 'Conflict' },
      ),
    );
    expect(error.code).toBe('last_owner');
    expect(error.field).toBeUndefined();
    expect(error.message).toBe('A workspace needs at least one owner.');
  });

  it('reads Retry-After on 429 and says when to try again', () => {
    const error = failureOf('/api/v1/auth/signin', (call) =>
      call.flush(
        { error: { code: 'too_many_attempts', message: 'Too many sign-in attempts.' } },
        { status: 429, statusText: 'Too Many Requests', headers: { 'Retry-After': '30' } },
      ),
    );
    expect(error.retryAfterSeconds).toBe(30);
    expect(error.message).toBe('Too many sign-in attempts. Try again in 30 s.');
  });

  it('falls back to a status-based code when the body is not the API shape', () => {
    const error = failureOf('/api/v1/me', (call) => call.flush('<html>Bad gateway</html>', { status: 502, statusText: 'Bad Gateway' }));
    expect(error.code).toBe('server_error');
    expect(error.status).toBe(502);
    expect(error.message).toMatch(/server/i);
  });

  it('reports an unreachable server as a network error', () => {
    const error = failureOf('/api/v1/me', (call) => call.error(new ProgressEvent('error'), { status: 0, statusText: '' }));
    expect(error.status).toBe(0);
    expect(error.code).toBe('network');
  });

  it('leaves calls outside the API untouched', () => {
    let failure: unknown;
    http.get('/assets/missing.json').subscribe({ error: (e) => (failure = e) });
    backend.expectOne('/assets/missing.json').flush('nope', { status: 404, statusText: 'Not Found' });
    expect(failure).not.toBeInstanceOf(ApiError);
  });
});
