import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Membership, User, Workspace } from '@tumblewise/shared';
import { AppShell } from '../app-shell/app-shell';
import type { WorkspaceStandingView } from './workspace-notice';
import { workspaceNotice } from './workspace-notice';

// Invented user and workspace.
const USER: User = {
  id: '10000000-0000-4000-8000-000000000001',
  email: 'mira.okafor@example.test',
  name: 'Mira Okafor',
  isOperator: false,
  createdAt: '2026-11-02T09:00:00.000Z',
};
const HARBOUR: Workspace = {
  id: '7f1c2a9e-3b4d-4e5f-8a6b-1c2d3e4f5a6b',
  name: 'Harbour Street Gear Lab',
  state: 'active',
  createdAt: '2026-11-02T09:00:00.000Z',
};

@Component({
  imports: [AppShell],
  template: `
    <tw-app-shell appName="Admin" [user]="user()" [memberships]="memberships()" [currentWorkspaceId]="current" [standing]="standing()">
      <p>content</p>
    </tw-app-shell>
  `,
})
class Host {
  readonly user = signal<User | null>(USER);
  readonly memberships = signal<Membership[]>([{ workspace: HARBOUR, role: 'designer' }]);
  readonly standing = signal<WorkspaceStandingView | null>(null);
  readonly current = HARBOUR.id;
}

describe('the workspace state banner in the app shell', () => {
  let fixture: ComponentFixture<Host>;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [Host], providers: [provideRouter([])] });
    fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
  });

  const banner = () => (fixture.nativeElement as HTMLElement).querySelector<HTMLElement>('[data-testid="workspace-state-banner"]');

  async function withMembershipState(state: Workspace['state']): Promise<void> {
    fixture.componentInstance.memberships.set([{ workspace: { ...HARBOUR, state }, role: 'designer' }]);
    await fixture.whenStable();
  }

  it('shows nothing while the workspace is active', () => {
    expect(banner()).toBeNull();
  });

  it('says payment failed and names the read-only date for a past-due workspace', async () => {
    fixture.componentInstance.standing.set({ state: 'past_due', readOnlyFrom: '2026-12-15T12:00:00.000Z' });
    await fixture.whenStable();
    expect(banner()?.dataset['state']).toBe('past_due');
    expect(banner()?.textContent).toContain('Payment failed');
    expect(banner()?.textContent).toContain('Update the payment method');
    expect(banner()?.textContent).toContain('becomes read-only on Dec 15, 2026');
  });

  it('takes the state from the membership when the app passes no standing (the designer app)', async () => {
    await withMembershipState('past_due');
    expect(banner()?.textContent).toContain('becomes read-only soon');
    await withMembershipState('read_only');
    expect(banner()?.dataset['state']).toBe('read_only');
    expect(banner()?.textContent).toContain('Saves are off; exports still work');
  });

  it('names the reason of a suspension and what members may still do', async () => {
    fixture.componentInstance.standing.set({ state: 'suspended', suspendedReason: 'Chargeback under review' });
    await fixture.whenStable();
    expect(banner()?.textContent).toContain('Suspended by the platform');
    expect(banner()?.textContent).toContain('Chargeback under review. You can sign in and read, not edit.');
    expect(banner()?.getAttribute('role')).toBe('status');
  });

  it('is gone again once the workspace is restored, and never shows signed out', async () => {
    fixture.componentInstance.standing.set({ state: 'suspended' });
    await fixture.whenStable();
    expect(banner()).not.toBeNull();
    fixture.componentInstance.standing.set({ state: 'active' });
    await fixture.whenStable();
    expect(banner()).toBeNull();
    fixture.componentInstance.standing.set({ state: 'read_only' });
    fixture.componentInstance.user.set(null);
    await fixture.whenStable();
    expect(banner()).toBeNull();
  });
});

describe('workspaceNotice', () => {
  const day = (iso: string) => iso.slice(0, 10);

  it('is null for an active or unknown workspace', () => {
    expect(workspaceNotice({ state: 'active' }, day)).toBeNull();
    expect(workspaceNotice(null, day)).toBeNull();
  });

  it('does not double the full stop of a reason', () => {
    expect(workspaceNotice({ state: 'suspended', suspendedReason: 'Terms breach.' }, day)?.text).toBe(
      'Terms breach. You can sign in and read, not edit.',
    );
    expect(workspaceNotice({ state: 'suspended', suspendedReason: '  ' }, day)?.text).toBe('You can sign in and read, not edit.');
  });

  it('formats the read-only date with the given formatter', () => {
    expect(workspaceNotice({ state: 'past_due', readOnlyFrom: '2027-01-04T00:00:00.000Z' }, day)?.text).toBe(
      'Update the payment method; the workspace becomes read-only on 2027-01-04.',
    );
  });
});
