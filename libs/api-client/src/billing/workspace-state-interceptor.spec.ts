import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { AuthState } from '../auth/auth-state';
import { errorInterceptor } from '../errors/error-interceptor';
import { HARBOUR_WORKSPACE, sessionFixture } from '../testing/session-fixture';
import { WorkspaceStandings } from './workspace-standing';
import { workspaceStateInterceptor } from './workspace-state-interceptor';

describe('workspaceStateInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;
  let standings: WorkspaceStandings;
  const url = `/api/v1/workspaces/${HARBOUR_WORKSPACE.id}/projects`;

  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([errorInterceptor, workspaceStateInterceptor])), provideHttpClientTesting()],
    });
    TestBed.inject(AuthState).setSession(sessionFixture());
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
    standings = TestBed.inject(WorkspaceStandings);
  });

  afterEach(() => backend.verify());

  function refuse(status: number, code: string): string | undefined {
    let message: string | undefined;
    http.post(url, {}).subscribe({ error: (error: Error) => (message = error.message) });
    backend.expectOne(url).flush({ error: { code, message: `refused: ${code}` } }, { status, statusText: 'Refused' });
    return message;
  }

  it('starts from the membership state', () => {
    expect(standings.current()?.state).toBe('active');
  });

  it('notes a suspension or read-only refusal and still hands the error to the caller', () => {
    expect(refuse(403, 'workspace_suspended')).toBe('refused: workspace_suspended');
    expect(standings.current()?.state).toBe('suspended');
    refuse(403, 'workspace_read_only');
    expect(standings.current()?.state).toBe('read_only');
  });

  it('ignores other refusals', () => {
    refuse(403, 'forbidden');
    refuse(409, 'workspace_suspended');
    expect(standings.current()?.state).toBe('active');
  });
});
