import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import { MatToolbar } from '@angular/material/toolbar';
import type { Membership, User } from '@tumblewise/shared';
import { Cautions } from '../cautions/cautions';
import { WorkspaceSwitcher } from '../workspace-switcher/workspace-switcher';
import type { WorkspaceStandingView } from '../workspace-state-banner/workspace-notice';
import { WorkspaceStateBanner } from '../workspace-state-banner/workspace-state-banner';
import type { ShellLink } from './shell-link';

/** The frame of both apps: top bar (brand, navigation, workspace, account), main content, cautions. */
@Component({
  selector: 'tw-app-shell',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [
    RouterLink,
    RouterLinkActive,
    MatToolbar,
    MatButton,
    MatIconButton,
    MatMenu,
    MatMenuItem,
    MatMenuTrigger,
    WorkspaceSwitcher,
    WorkspaceStateBanner,
    Cautions,
  ],
  templateUrl: './app-shell.html',
  styleUrl: './app-shell.scss',
})
export class AppShell {
  /** Name of this app shown beside the brand ("Designer", "Admin"). */
  readonly appName = input.required<string>();
  /** The signed-in user, or null. */
  readonly user = input<User | null>(null);
  /** The user's memberships, for the workspace switcher. */
  readonly memberships = input<readonly Membership[]>([]);
  /** Id of the current workspace. */
  readonly currentWorkspaceId = input<string | null>(null);
  /** Navigation entries of this app (shown when signed in). */
  readonly links = input<readonly ShellLink[]>([]);
  /** Links to the other app (shown when signed in). */
  readonly crossLinks = input<readonly ShellLink[]>([]);
  /** The current workspace's standing when the app knows more than the membership says (billing answers). */
  readonly standing = input<WorkspaceStandingView | null>(null);
  /** Emits the id of the workspace picked in the switcher. */
  readonly workspaceSelected = output<string>();
  /** Emits when the user chooses "Sign out". */
  readonly signOutRequested = output();

  /** The standing the state banner shows: the one given, else the current membership's workspace state. */
  protected readonly shownStanding = computed<WorkspaceStandingView | null>(
    () => this.standing() ?? this.memberships().find((m) => m.workspace.id === this.currentWorkspaceId())?.workspace ?? null,
  );

  /** Moves focus to the main region (skip link). */
  protected focusMain(event: Event): void {
    event.preventDefault();
    document.getElementById('main-content')?.focus();
  }
}
