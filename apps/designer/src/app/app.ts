import { ChangeDetectionStrategy, Component, computed, effect, inject } from '@angular/core';
import { Router, RouterOutlet } from '@angular/router';
import { AuthApi, AuthState, WorkspaceContext } from '@tumblewise/api-client';
import { AppShell, type ShellLink } from '@tumblewise/ui';

const ACCOUNT_PAGES = ['/signin', '/signup', '/forgot-password', '/reset-password', '/invitations/accept'];

function isAccountPage(url: string): boolean {
  const path = url.split(/[?#]/)[0];
  return ACCOUNT_PAGES.includes(path);
}

/** Root of the designer app: the shell around the routed screen. */
@Component({
  selector: 'tw-root',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [RouterOutlet, AppShell],
  templateUrl: './app.html',
})
export class App {
  protected readonly auth = inject(AuthState);
  protected readonly workspace = inject(WorkspaceContext);
  private readonly authApi = inject(AuthApi);
  private readonly router = inject(Router);
  private wasSignedIn = false;

  protected readonly links: readonly ShellLink[] = [{ label: 'Projects', path: '/', icon: 'folder_open', testId: 'nav-projects' }];
  protected readonly crossLinks = computed<ShellLink[]>(() =>
    this.workspace.can('members.manage')
      ? [{ label: 'Admin', path: '/admin/', icon: 'admin_panel_settings', testId: 'admin-link', external: true }]
      : [],
  );

  constructor() {
    // When the session ends without the user asking (refresh refused) on a page that needs one,
    // go to sign-in and come back afterwards. The account pages work signed out and stay.
    effect(() => {
      const signedIn = this.auth.signedIn();
      const url = this.router.url;
      if (this.wasSignedIn && !signedIn && !isAccountPage(url)) {
        void this.router.navigate(['/signin'], { queryParams: url && url !== '/' ? { returnTo: url } : {} });
      }
      this.wasSignedIn = signedIn;
    });
  }

  /** Makes another workspace current. */
  protected switchWorkspace(workspaceId: string): void {
    this.workspace.select(workspaceId);
  }

  /** Ends the session and shows the sign-in page. */
  protected signOut(): void {
    this.wasSignedIn = false;
    this.authApi.signOut().subscribe({
      next: () => void this.router.navigateByUrl('/signin'),
      error: () => void this.router.navigateByUrl('/signin'),
    });
  }
}
