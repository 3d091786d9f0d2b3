import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

/** The three verdicts of a spin report. */
export type VerdictName = 'steady' | 'watch' | 'flip-prone';

/** How each verdict is written and marked on screen (an icon as well as a colour, never colour alone). */
export const VERDICT_LABELS: Record<VerdictName, { label: string; icon: string; hint: string }> = {
  steady: { label: 'Steady', icon: 'check_circle', hint: 'Spins true about the intended axis' },
  watch: { label: 'Watch', icon: 'visibility', hint: 'Steady, but close to a limit' },
  'flip-prone': { label: 'Flip-prone', icon: 'sync_problem', hint: 'Will turn over in flight' },
};

/** A small chip naming a spin verdict. */
@Component({
  selector: 'tw-verdict-chip',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @if (entry(); as e) {
      <span
        class="tw-chip"
        [class.steady]="verdict() === 'steady'"
        [class.watch]="verdict() === 'watch'"
        [class.flip]="verdict() === 'flip-prone'"
        [attr.title]="e.hint"
        data-testid="verdict-chip"
        [attr.data-verdict]="verdict()"
      >
        <span class="material-icons" aria-hidden="true">{{ e.icon }}</span>{{ e.label }}
      </span>
    } @else {
      <span class="tw-chip none" data-testid="verdict-chip" data-verdict="none">No verdict yet</span>
    }
  `,
  styles: `
    .tw-chip {
      display: inline-flex;
      align-items: center;
      gap: 4px;
      padding: 2px 10px 2px 6px;
      border-radius: 12px;
      font: var(--mat-sys-label-medium);
      white-space: nowrap;
    }
    .material-icons {
      font-size: 16px;
    }
    .steady {
      background: var(--mat-sys-primary-container);
      color: var(--mat-sys-on-primary-container);
    }
    .watch {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    .flip {
      background: var(--mat-sys-error-container);
      color: var(--mat-sys-on-error-container);
    }
    .none {
      padding-left: 10px;
      background: var(--mat-sys-surface-container-high);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class VerdictChip {
  /** The verdict; null shows "No verdict yet". */
  readonly verdict = input<VerdictName | null | undefined>(null);
  protected readonly entry = computed(() => {
    const v = this.verdict();
    return v ? VERDICT_LABELS[v] : null;
  });
}
