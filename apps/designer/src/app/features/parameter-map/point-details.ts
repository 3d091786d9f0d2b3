import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { VerdictChip } from '@tumblewise/ui';
import type { PointDetail } from './point-detail';

/**
 * The chosen grid point: the value of each swept field, its verdict (or why the values make no
 * valid part) and its figures, and the button that loads it into the draft.
 */
@Component({
  selector: 'tw-point-details',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [MatButton, VerdictChip],
  template: `
    @let d = detail();
    <section class="tw-point" aria-labelledby="tw-point-heading" data-testid="point-details" [attr.data-class]="d.cls">
      <h3 id="tw-point-heading">Chosen point</h3>
      <dl class="tw-values">
        @for (v of d.shownValues; track v.name; let k = $index) {
          <div>
            <dt>{{ v.name }}</dt>
            <dd [attr.data-testid]="'point-value-' + k">{{ v.shown }}</dd>
          </div>
        }
        <div>
          <dt>Verdict</dt>
          <dd data-testid="point-verdict">
            @if (d.verdict) {
              <tw-verdict-chip [verdict]="d.verdict" />
              @if (d.nearestAxis) {
                <span class="tw-axis">nearest the {{ d.nearestAxis }} axis</span>
              }
            } @else {
              <span class="tw-invalid">{{ d.word }}</span>
            }
          </dd>
        </div>
      </dl>
      @if (d.error) {
        <p class="tw-reason" data-testid="point-error">{{ d.error }}</p>
      } @else {
        <table class="tw-figures" data-testid="point-figures">
          <caption class="tw-visually-hidden">
            Figures at the chosen point
          </caption>
          <tbody>
            @for (f of d.figures; track f.name) {
              <tr>
                <th scope="row">{{ f.name }}</th>
                <td>{{ f.shown }}</td>
              </tr>
            }
          </tbody>
        </table>
      }
      @if (mayEdit()) {
        <button
          mat-flat-button
          type="button"
          [disabled]="saving() || !!d.error"
          (click)="loadRequested.emit()"
          data-testid="point-load"
          [attr.aria-describedby]="d.error ? 'tw-point-load-why' : null"
        >
          <span class="material-icons" aria-hidden="true">input</span> {{ saving() ? 'Loading into the draft…' : 'Load into draft' }}
        </button>
        @if (d.error) {
          <p id="tw-point-load-why" class="tw-note">Only a point with a valid part can be loaded into the draft.</p>
        }
      } @else {
        <p class="tw-note" data-testid="point-read-only">
          Your role reads the map; a designer, admin or owner loads points into the draft.
        </p>
      }
    </section>
  `,
  styles: `
    .tw-point {
      min-width: 0;
    }
    h3 {
      font: var(--mat-sys-title-small);
      margin: 0 0 6px;
    }
    .tw-values {
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(180px, 1fr));
      gap: 8px 16px;
      margin: 0 0 12px;
      dt {
        font: var(--mat-sys-label-medium);
        color: var(--mat-sys-on-surface-variant);
      }
      dd {
        margin: 2px 0 0;
        font: var(--mat-sys-title-medium);
        font-variant-numeric: tabular-nums;
        overflow-wrap: anywhere;
      }
    }
    .tw-axis,
    .tw-note,
    .tw-reason {
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
    .tw-axis {
      display: block;
      margin-top: 2px;
    }
    .tw-invalid {
      font: var(--mat-sys-label-large);
    }
    .tw-figures {
      border-collapse: collapse;
      margin: 0 0 12px;
      th,
      td {
        text-align: left;
        padding: 3px 12px 3px 0;
        border-bottom: 1px solid var(--mat-sys-outline-variant);
        font: var(--mat-sys-body-medium);
        font-variant-numeric: tabular-nums;
      }
      th {
        font-weight: 500;
      }
    }
    .material-icons {
      font-size: 20px;
      vertical-align: middle;
    }
  `,
})
export class PointDetails {
  /** The chosen grid point. */
  readonly detail = input.required<PointDetail>();
  /** Whether the user may change the draft. */
  readonly mayEdit = input(false);
  /** A draft save is under way. */
  readonly saving = input(false);
  /** The user asks to load the point into the draft. */
  readonly loadRequested = output();
}
