import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { WorkspaceContext } from '@tumblewise/api-client';
import { EmptyState, ROLE_LABELS } from '@tumblewise/ui';

/** Shown instead of the admin pages to members whose role in the current workspace does not manage it. */
@Component({
  selector: 'tw-no-access',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [EmptyState],
  template: `
    <div class="tw-page">
      <h1 class="tw-visually-hidden">No access to the admin pages</h1>
      <tw-empty-state
        icon="lock"
        heading="These pages are for owners and admins"
        [message]="message()"
        data-testid="no-access"
      >
        <a href="/">Back to the designer</a>
      </tw-empty-state>
    </div>
  `,
})
export class NoAccess {
  private readonly workspace = inject(WorkspaceContext);

  /** Explains the user's role in the current workspace. */
  protected message(): string {
    const role = this.workspace.role();
    const name = this.workspace.workspace()?.name;
    if (!role || !name) return 'You are not a member of any workspace yet.';
    return `In ${name} you are ${ROLE_LABELS[role].toLowerCase()}. Ask an owner or admin if you need to manage members.`;
  }
}
