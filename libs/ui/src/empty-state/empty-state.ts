import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** Shown in place of a list with nothing in it: what is missing and the next step (projected action). */
@Component({
  selector: 'tw-empty-state',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <section class="tw-empty-state" [attr.aria-label]="heading()">
      <span class="material-icons" aria-hidden="true">{{ icon() }}</span>
      <h2>{{ heading() }}</h2>
      @if (message()) {
        <p>{{ message() }}</p>
      }
      <div class="action"><ng-content /></div>
    </section>
  `,
  styles: `
    .tw-empty-state {
      text-align: center;
      padding: 40px 16px;
      border: 1px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      background: var(--mat-sys-surface-container-lowest);
    }
    .material-icons {
      font-size: 40px;
      color: var(--mat-sys-primary);
    }
    h2 {
      font: var(--mat-sys-title-large);
      margin: 8px 0;
    }
    p {
      max-width: 52ch;
      margin: 0 auto 16px;
      color: var(--mat-sys-on-surface-variant);
    }
  `,
})
export class EmptyState {
  /** Material icon ligature shown above the heading. */
  readonly icon = input('inbox');
  /** What is empty ("No projects yet"). */
  readonly heading = input.required<string>();
  /** The next step, in a sentence. */
  readonly message = input<string | null>(null);
}
