import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { WorkspaceContext } from '@tumblewise/api-client';
import { EmptyState, ROLE_LABELS } from '@tumblewise/ui';

/** Shown instead of an admin page to someone who may not open it: a role too low, or not a platform operator. */
@Component({
  selector: 'tw-no-access',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [EmptyState],
  template: `
    <div class="tw-page">
      <h1 class="tw-visually-hidden">No access to this page</h1>
      <tw-empty-state icon="lock" [heading]="heading()" [message]="message()" data-testid="no-access">
        <a href="/">Back to the designer</a>
      </tw-empty-state>
    </div>
  `,
})
export class NoAccess {
  private readonly workspace = inject(WorkspaceContext);

  /** `workspace`: the page needs a role in the workspace; `operator`: it is for platform operators. */
  readonly kind = input<'workspace' | 'operator'>('workspace');

  protected readonly heading = computed(() =>
    this.kind() === 'operator' ? 'This page is for platform operators' : 'These pages are for owners and admins',
  );

  /** Explains the user's role in the current workspace. */
  protected message(): string {
    if (this.kind() === 'operator') return 'It lists every workspace of the platform. Your account does not have the operator flag.';
    const role = this.workspace.role();
    const name = this.workspace.workspace()?.name;
    if (!role || !name) return 'You are not a member of any workspace yet.';
    return `In ${name} you are ${ROLE_LABELS[role].toLowerCase()}. Ask an owner or admin if you need to manage members.`;
  }
}
