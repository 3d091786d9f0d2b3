import { TestBed } from '@angular/core/testing';
import { AuthState } from '../auth/auth-state';
import { HARBOUR_WORKSPACE, RIDGE_WORKSPACE, sessionFixture } from '../testing/session-fixture';
import { WorkspaceContext } from './workspace-context';

describe('WorkspaceContext', () => {
  const both = [
    { workspace: HARBOUR_WORKSPACE, role: 'reviewer' as const },
    { workspace: RIDGE_WORKSPACE, role: 'admin' as const },
  ];

  beforeEach(() => localStorage.clear());

  it('has no workspace while signed out', () => {
    const context = TestBed.inject(WorkspaceContext);
    expect(context.workspaceId()).toBeNull();
    expect(context.role()).toBeNull();
    expect(context.can('workspace.read')).toBe(false);
  });

  it('falls back to the first membership, then follows the choice', () => {
    const context = TestBed.inject(WorkspaceContext);
    TestBed.inject(AuthState).setSession(sessionFixture({}, both));
    expect(context.workspaceId()).toBe(HARBOUR_WORKSPACE.id);
    expect(context.hasSeveral()).toBe(true);
    expect(context.can('members.manage')).toBe(false);

    context.select(RIDGE_WORKSPACE.id);
    expect(context.workspace()?.name).toBe('Ridgeline Throwing Club');
    expect(context.role()).toBe('admin');
    expect(context.can('members.manage')).toBe(true);
    expect(context.can('billing.manage')).toBe(false);
  });

  it('remembers the choice for the next page load', () => {
    TestBed.inject(WorkspaceContext).select(RIDGE_WORKSPACE.id);
    TestBed.resetTestingModule();
    TestBed.inject(AuthState).setSession(sessionFixture({}, both));
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(RIDGE_WORKSPACE.id);
  });

  it('ignores a remembered workspace the user no longer belongs to', () => {
    localStorage.setItem('tumblewise.workspace', '11111111-2222-4333-8444-555555555555');
    TestBed.inject(AuthState).setSession(sessionFixture({}, both));
    expect(TestBed.inject(WorkspaceContext).workspaceId()).toBe(HARBOUR_WORKSPACE.id);
  });
});
