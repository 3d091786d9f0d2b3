import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Membership, User } from '@tumblewise/shared';
import { AppShell } from './app-shell';

const USER: User = {
  id: '10000000-0000-4000-8000-000000000001',
  email: 'mira.okafor@example.test',
  name: 'Mira Okafor',
  isOperator: false,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const HARBOUR = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active' as const,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const RIDGE = {
  id: '0a9b8c7d-6e5f-4a3b-9c2d-1e0f9a8b7c6d',
  name: 'Ridgeline Throwing Club',
  state: 'active' as const,
  createdAt: '2026-11-20T09:00:00.000Z',
};

@Component({
  imports: [AppShell],
  template: `
    <tw-app-shell
      appName="Designer"
      [user]="user()"
      [memberships]="memberships()"
      [currentWorkspaceId]="current()"
      (workspaceSelected)="current.set($event)"
      (signOutRequested)="signOuts = signOuts + 1"
    >
      <p>content</p>
    </tw-app-shell>
  `,
})
class Host {
  readonly user = signal<User | null>(USER);
  readonly memberships = signal<Membership[]>([{ workspace: HARBOUR, role: 'owner' }]);
  readonly current = signal<string | null>(HARBOUR.id);
  signOuts = 0;
}

describe('AppShell', () => {
  let fixture: ComponentFixture<Host>;
  let host: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [Host], providers: [provideRouter([])] });
    fixture = TestBed.createComponent(Host);
    host = fixture.nativeElement;
    await fixture.whenStable();
  });

  const byTestId = (id: string) => document.querySelector<HTMLElement>(`[data-testid="${id}"]`);

  it('shows the cautions and the main region', () => {
    expect(byTestId('cautions')?.textContent).toContain('do not certify');
    expect(byTestId('cautions')?.textContent).toContain('cleared area');
    expect(host.querySelector('main#main-content')?.textContent).toContain('content');
  });

  it('shows the workspace name without a menu for a single membership', () => {
    expect(byTestId('workspace-switcher')).toBeNull();
    expect(byTestId('workspace-name')?.textContent).toContain('Harbour Street Gear Lab');
  });

  it('offers a switcher with several memberships and reports the choice', async () => {
    fixture.componentInstance.memberships.set([
      { workspace: HARBOUR, role: 'owner' },
      { workspace: RIDGE, role: 'reviewer' },
    ]);
    await fixture.whenStable();
    const switcher = byTestId('workspace-switcher')!;
    expect(switcher.getAttribute('aria-label')).toBe('Workspace: Harbour Street Gear Lab. Switch workspace');
    switcher.click();
    await fixture.whenStable();
    const options = Array.from(document.querySelectorAll<HTMLElement>('[data-testid="workspace-option"]'));
    expect(options.map((o) => o.textContent)).toEqual([
      expect.stringContaining('Harbour Street Gear Lab · Owner'),
      expect.stringContaining('Ridgeline Throwing Club · Reviewer'),
    ]);
    expect(options.map((o) => o.getAttribute('aria-current'))).toEqual(['true', null]);
    options[1].click();
    await fixture.whenStable();
    expect(fixture.componentInstance.current()).toBe(RIDGE.id);
  });

  it('signs out from the user menu', async () => {
    byTestId('user-menu')!.click();
    await fixture.whenStable();
    expect(byTestId('user-name')?.textContent).toBe('Mira Okafor');
    byTestId('sign-out')!.click();
    expect(fixture.componentInstance.signOuts).toBe(1);
  });

  it('hides the account controls when signed out', async () => {
    fixture.componentInstance.user.set(null);
    await fixture.whenStable();
    expect(byTestId('user-menu')).toBeNull();
    expect(byTestId('workspace-name')).toBeNull();
  });
});
