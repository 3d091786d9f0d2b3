import { ChangeDetectionStrategy, Component, computed, effect, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { LocationStrategy } from '@angular/common';
import { NavigationEnd, Router, RouterOutlet } from '@angular/router';
import { AuthApi, AuthState, WorkspaceContext, WorkspaceStandings } from '@tumblewise/api-client';
import { can } from '@tumblewise/shared';
import { AppShell, PageNavigation, type ShellLink } from '@tumblewise/ui';
import { filter, map } from 'rxjs';
import { mayOpenPage, pageAccessOf } from './core/page-access';
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
  /** The current workspace's standing, kept up to date by billing answers, for the shell's banner. */
  protected readonly standings = inject(WorkspaceStandings);
  private readonly authApi = inject(AuthApi);
  private readonly router = inject(Router);
  private readonly location = inject(LocationStrategy);
  private readonly page = inject(PageNavigation);
  private wasSignedIn = false;

  protected readonly links = computed<ShellLink[]>(() => {
    const role = this.workspace.role();
    const links: ShellLink[] = [];
    if (can(role, 'members.manage')) links.push({ label: 'Members', path: '/members', icon: 'group', testId: 'nav-members' });
    if (can(role, 'invitations.manage'))
      links.push({ label: 'Invitations', path: '/invitations', icon: 'mail', testId: 'nav-invitations' });
    if (can(role, 'billing.read'))
      links.push({ label: 'Subscription', path: '/subscription', icon: 'payments', testId: 'nav-subscription' });
    if (can(role, 'billing.read')) links.push({ label: 'Invoices', path: '/invoices', icon: 'receipt_long', testId: 'nav-invoices' });
    if (can(role, 'materials.manage')) links.push({ label: 'Materials', path: '/materials', icon: 'category', testId: 'nav-materials' });
    if (can(role, 'settings.manage')) links.push({ label: 'Settings', path: '/settings', icon: 'tune', testId: 'nav-settings' });
    if (can(role, 'audit.read')) links.push({ label: 'Audit trail', path: '/audit', icon: 'history', testId: 'nav-audit' });
    // Only operators ever see the platform pages in the navigation.
    if (this.auth.user()?.isOperator) links.push({ label: 'Platform', path: '/operator', icon: 'dns', testId: 'nav-operator' });
    return links;
  });
  protected readonly crossLinks: readonly ShellLink[] = [
    { label: 'Designer', path: '/', icon: 'design_services', testId: 'designer-link', external: true },
  ];
  /** The access rule of the page on screen (its route's `data.access`). */
  private readonly pageAccess = toSignal(
    this.router.events.pipe(
      filter((event) => event instanceof NavigationEnd),
      map(() => pageAccessOf(this.router.routerState.snapshot.root)),
    ),
  );
  /** Whether the page may be shown: its role rule, or the operator flag for the platform pages. */
  protected readonly allowed = computed(() => mayOpenPage(this.pageAccess(), this.workspace.role(), !!this.auth.user()?.isOperator));
  /** Which not-allowed text to show. */
  protected readonly deniedKind = computed(() => (this.pageAccess() && 'operator' in this.pageAccess()! ? 'operator' : 'workspace'));

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
