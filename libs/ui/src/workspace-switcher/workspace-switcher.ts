import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatMenu, MatMenuItem, MatMenuTrigger } from '@angular/material/menu';
import type { Membership } from '@tumblewise/shared';
import { ROLE_LABELS } from '../labels/role-labels';

/** The current workspace's name; a menu to change it when the user belongs to several. */
@Component({
  selector: 'tw-workspace-switcher',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, MatMenu, MatMenuItem, MatMenuTrigger],
  template: `
    @if (memberships().length > 1) {
      <button
        mat-button
        type="button"
        class="tw-switcher"
        [matMenuTriggerFor]="menu"
        [attr.aria-label]="'Workspace: ' + (currentName() || 'none') + '. Switch workspace'"
        data-testid="workspace-switcher"
      >
        <span class="material-icons" aria-hidden="true">workspaces</span>
        <span class="name">{{ currentName() }}</span>
        <span class="material-icons" aria-hidden="true">arrow_drop_down</span>
      </button>
      <mat-menu #menu="matMenu" aria-label="Your workspaces">
        @for (membership of memberships(); track membership.workspace.id) {
          <button
            mat-menu-item
            type="button"
            [attr.aria-current]="membership.workspace.id === currentId() ? 'true' : null"
            [attr.data-testid]="'workspace-option'"
            (click)="workspaceSelected.emit(membership.workspace.id)"
          >
            <span class="material-icons" aria-hidden="true">{{ membership.workspace.id === currentId() ? 'check' : '' }}</span>
            <span>{{ membership.workspace.name }} · {{ roleLabels[membership.role] }}</span>
          </button>
        }
      </mat-menu>
    } @else if (currentName()) {
      <span class="tw-switcher-single" data-testid="workspace-name">
        <span class="material-icons" aria-hidden="true">workspaces</span>
        {{ currentName() }}
      </span>
    }
  `,
  styles: `
    :host {
      display: inline-flex;
      align-items: center;
    }
    .tw-switcher {
      --mat-button-text-label-text-color: var(--mat-sys-on-primary);
    }
    .tw-switcher .name,
    .tw-switcher-single {
      max-width: 24ch;
      overflow: hidden;
      text-overflow: ellipsis;
      white-space: nowrap;
    }
    .tw-switcher-single {
      display: inline-flex;
      align-items: center;
      gap: 6px;
      font: var(--mat-sys-label-large);
    }
    .tw-switcher .material-icons {
      vertical-align: middle;
    }
    .mat-mdc-menu-item .material-icons {
      width: 24px;
      margin-right: 8px;
    }
  `,
})
export class WorkspaceSwitcher {
  /** The user's memberships. */
  readonly memberships = input.required<readonly Membership[]>();
  /** Id of the current workspace. */
  readonly currentId = input<string | null>(null);
  /** Emits the id of the workspace the user picked. */
  readonly workspaceSelected = output<string>();

  protected readonly roleLabels = ROLE_LABELS;
  protected readonly current = computed(
    () => this.memberships().find((m) => m.workspace.id === this.currentId()) ?? this.memberships()[0] ?? null,
  );
  protected readonly currentName = computed(() => this.current()?.workspace?.name ?? '');
}
