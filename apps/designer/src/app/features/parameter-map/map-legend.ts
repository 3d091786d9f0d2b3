import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { CELL_LOOKS, HATCH_COLOUR, sharePercent, summaryText, type ClassShare } from './map-cells';

/**
 * The map's own legend: each class's swatch (the hatched one striped), icon and word, with how many
 * grid points fall in it and their share; then the same as one sentence for screen readers and for
 * reading aloud.
 */
@Component({
  selector: 'tw-map-legend',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <section class="tw-legend" aria-labelledby="tw-legend-heading" data-testid="map-legend">
      <h3 id="tw-legend-heading">Legend</h3>
      <ul>
        @for (s of shares(); track s.cls) {
          <li [attr.data-testid]="'legend-' + s.cls" [attr.data-count]="s.count" [class.tw-empty]="s.count === 0">
            <span
              class="tw-swatch"
              aria-hidden="true"
              [style.background]="looks[s.cls].hatched ? hatch(looks[s.cls].colour) : looks[s.cls].colour"
            ></span>
            <span class="material-icons" aria-hidden="true">{{ looks[s.cls].icon }}</span>
            <span class="tw-word" [attr.title]="looks[s.cls].hint">{{ looks[s.cls].word }}</span>
            <span class="tw-count">{{ s.count }} · {{ percent(s.share) }}</span>
          </li>
        }
      </ul>
      <p class="tw-summary" data-testid="map-summary">{{ summary() }}</p>
    </section>
  `,
  styles: `
    .tw-legend {
      min-width: 0;
    }
    h3 {
      font: var(--mat-sys-title-small);
      margin: 0 0 6px;
    }
    ul {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 6px;
    }
    li {
      display: grid;
      grid-template-columns: 20px 20px 1fr auto;
      align-items: center;
      gap: 6px;
    }
    .tw-empty {
      color: var(--mat-sys-on-surface-variant);
    }
    .tw-swatch {
      width: 18px;
      height: 18px;
      border-radius: 3px;
      border: 1px solid var(--mat-sys-outline);
    }
    .material-icons {
      font-size: 18px;
    }
    .tw-count {
      font-variant-numeric: tabular-nums;
      font: var(--mat-sys-body-small);
    }
    .tw-summary {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
      margin: 10px 0 0;
    }
  `,
})
export class MapLegend {
  /** Count and share of each class, in legend order. */
  readonly shares = input.required<readonly ClassShare[]>();

  protected readonly looks = CELL_LOOKS;
  protected readonly percent = sharePercent;
  protected readonly summary = computed(() => summaryText(this.shares()));

  /** A striped swatch: dark stripes over the class's colour. */
  protected hatch(colour: string): string {
    return `repeating-linear-gradient(135deg, ${HATCH_COLOUR} 0 2px, ${colour} 2px 6px)`;
  }
}
