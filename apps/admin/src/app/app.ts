import { ChangeDetectionStrategy, Component, computed, effect, inject } from '@angular/core';
import { LocationStrategy } from '@angular/common';
import { Router, RouterOutlet } from '@angular/router';
import { AuthApi, AuthState, WorkspaceContext } from '@tumblewise/api-client';
import { can } from '@tumblewise/shared';
import { AppShell, PageNavigation, type ShellLink } from '@tumblewise/ui';
import { NoAccess } from './features/no-access/no-access';

/** Root of the admin app: the shell, and the admin pages for owners and admins. */
@Component({
  selector: 'tw-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterOutlet, AppShell, NoAccess],
  templateUrl: './app.html',
})
export class App {
  protected readonly auth = inject(AuthState);
  protected readonly workspace = inject(WorkspaceContext);
  private readonly authApi = inject(AuthApi);
  private readonly router = inject(Router);
  private readonly location = inject(LocationStrategy);
  private readonly page = inject(PageNavigation);
  private wasSignedIn = false;

  protected readonly links = computed<ShellLink[]>(() => {
    const role = this.workspace.role();
    const links: ShellLink[] = [];
    if (can(role, 'members.manage')) links.push({ label: 'Members', path: '/members', icon: 'group', testId: 'nav-members' });
    if (can(role, 'invitations.manage')) links.push({ label: 'Invitations', path: '/invitations', icon: 'mail', testId: 'nav-invitations' });
    if (can(role, 'audit.read')) links.push({ label: 'Audit trail', path: '/audit', icon: 'history', testId: 'nav-audit' });
    return links;
  });
  protected readonly crossLinks: readonly ShellLink[] = [
    { label: 'Designer', path: '/', icon: 'design_services', testId: 'designer-link', external: true },
  ];
  /** The admin pages need a role that manages the workspace. */
  protected readonly allowed = computed(() => can(this.workspace.role(), 'members.manage'));

  constructor() {
    // A session that ends while the admin app is open sends the browser to sign-in.
    effect(() => {
      const signedIn = this.auth.signedIn();
      if (this.wasSignedIn && !signedIn) this.page.assign(this.signInUrl());
      this.wasSignedIn = signedIn;
    });
  }

  /** Makes another workspace current. */
  protected switchWorkspace(workspaceId: string): void {
    this.workspace.select(workspaceId);
  }

  /** Ends the session and goes to the designer's sign-in page. */
  protected signOut(): void {
    this.wasSignedIn = false;
    this.authApi.signOut().subscribe({
      next: () => this.page.assign('/signin'),
      error: () => this.page.assign('/signin'),
    });
  }

  private signInUrl(): string {
    return `/signin?returnTo=${encodeURIComponent(this.location.prepareExternalUrl(this.router.url))}`;
  }
}
