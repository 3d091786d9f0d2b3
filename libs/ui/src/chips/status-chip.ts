import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { VariantStatus } from '@tumblewise/shared';

/** How each sign-off status is written on screen. */
export const STATUS_LABELS: Record<VariantStatus, { label: string; icon: string }> = {
  draft: { label: 'Draft', icon: 'edit_note' },
  in_review: { label: 'In review', icon: 'rate_review' },
  approved: { label: 'Approved', icon: 'verified' },
  changes_requested: { label: 'Changes requested', icon: 'assignment_return' },
};

/** A small chip naming a variant's sign-off status. */
@Component({
  selector: 'tw-status-chip',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <span
      class="tw-chip"
      [class.approved]="status() === 'approved'"
      [class.changes]="status() === 'changes_requested'"
      data-testid="status-chip"
      [attr.data-status]="status()"
    >
      <span class="material-icons" aria-hidden="true">{{ entry().icon }}</span>{{ entry().label }}
    </span>
  `,
  styles: `
    .tw-chip {
      display: inline-flex;
      align-items: center;
      gap: 4px;
      padding: 1px 10px 1px 6px;
      border-radius: 12px;
      border: 1px solid var(--mat-sys-outline-variant);
      font: var(--mat-sys-label-medium);
      color: var(--mat-sys-on-surface-variant);
      white-space: nowrap;
    }
    .material-icons {
      font-size: 16px;
    }
    .approved {
      border-color: var(--mat-sys-primary);
      color: var(--mat-sys-primary);
    }
    .changes {
      border-color: var(--mat-sys-error);
      color: var(--mat-sys-error);
    }
  `,
})
export class StatusChip {
  /** The variant's sign-off status. */
  readonly status = input.required<VariantStatus>();
  protected readonly entry = computed(() => STATUS_LABELS[this.status()] ?? { label: this.status(), icon: 'help' });
}
