import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** A screen's title with an optional line below and room for actions on the right. */
@Component({
  selector: 'tw-page-header',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <div class="tw-page-header">
      <div class="titles">
        <h1>{{ heading() }}</h1>
        @if (subtitle()) {
          <p>{{ subtitle() }}</p>
        }
      </div>
      <div class="actions"><ng-content /></div>
    </div>
  `,
  styles: `
    .tw-page-header {
      display: flex;
      flex-wrap: wrap;
      align-items: flex-end;
      justify-content: space-between;
      gap: 12px;
      margin: 8px 0 20px;
    }
    h1 {
      font: var(--mat-sys-headline-small);
      margin: 0;
    }
    p {
      margin: 4px 0 0;
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-medium);
    }
    .actions {
      display: flex;
      gap: 8px;
      flex-wrap: wrap;
    }
  `,
})
export class PageHeader {
  /** The screen's title (rendered as its h1). */
  readonly heading = input.required<string>();
  /** One explanatory line under the title. */
  readonly subtitle = input<string | null>(null);
}
