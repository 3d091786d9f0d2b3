import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { SpinReport } from '@tumblewise/engine';
import type { DraftDocument } from './draft-document';

/**
 * SLOT FOR THE 3-D VIEWER AND TUMBLE PREVIEW.
 * The viewer is `TwPartViewer` from `@tumblewise/viewer` (libs/viewer/src/public-api.ts), inputs
 * `document` and `report`, kept in its own lazy chunk with three.js. Until that library is in the
 * tree this slot shows a placeholder; when it is, the template becomes:
 *
 *   @defer (on viewport) { <tw-part-viewer [document]="document()" [report]="report()" /> }
 *   @placeholder { …the placeholder below… } @loading { …"Loading the 3-D view…"… }
 */
@Component({
  selector: 'tw-viewer-slot',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <section class="tw-viewer-slot" aria-label="3-D view" data-testid="viewer-slot">
      @defer (on viewport) {
        <div class="tw-placeholder" data-testid="viewer-placeholder">
          <span class="material-icons" aria-hidden="true">view_in_ar</span>
          <p>The 3-D view and tumble preview of {{ document().primitives.length }} primitive{{ document().primitives.length === 1 ? '' : 's' }} appears here.</p>
        </div>
      } @placeholder {
        <div class="tw-placeholder"><p>3-D view</p></div>
      }
    </section>
  `,
  styles: `
    .tw-viewer-slot {
      border: 1px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      min-height: 160px;
      display: grid;
      place-items: center;
      background: var(--mat-sys-surface-container-low);
      color: var(--mat-sys-on-surface-variant);
    }
    .tw-placeholder {
      text-align: center;
      padding: 16px;
    }
    .material-icons {
      font-size: 36px;
    }
  `,
})
export class ViewerSlot {
  /** The working part document (SI). */
  readonly document = input.required<DraftDocument>();
  /** The newest spin report, or null. */
  readonly report = input<SpinReport | null>(null);
}
