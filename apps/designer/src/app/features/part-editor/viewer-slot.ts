import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { SpinReport } from '@tumblewise/engine';
import type { PartDocument } from '@tumblewise/shared';
import { TwPartViewer } from '@tumblewise/viewer';

/**
 * The slot of the 3-D view and tumble preview (`TwPartViewer` from `@tumblewise/viewer`). The viewer
 * and three.js load in their own chunk when the slot scrolls into view (@defer), and only once there
 * is a report: it draws the document that report was computed from, so picture and figures agree.
 */
@Component({
  selector: 'tw-viewer-slot',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [TwPartViewer],
  template: `
    <section class="tw-viewer-slot" aria-label="3-D view" data-testid="viewer-slot">
      @defer (on viewport) {
        @if (document() && report()) {
          <tw-part-viewer [document]="document()!" [report]="report()!" />
        } @else {
          <div class="tw-placeholder" data-testid="viewer-placeholder">
            <span class="material-icons" aria-hidden="true">view_in_ar</span>
            <p>The 3-D view and tumble preview appear once the part has a spin report.</p>
          </div>
        }
      } @placeholder {
        <div class="tw-placeholder"><p>3-D view</p></div>
      } @loading {
        <div class="tw-placeholder"><p>Loading the 3-D view…</p></div>
      }
    </section>
  `,
  styles: `
    .tw-viewer-slot {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      min-height: 160px;
      background: var(--mat-sys-surface-container-low);
      color: var(--mat-sys-on-surface-variant);
      overflow: hidden;
    }
    .tw-placeholder {
      display: grid;
      place-items: center;
      text-align: center;
      min-height: 160px;
      padding: 16px;
    }
    .material-icons {
      font-size: 36px;
    }
  `,
})
export class ViewerSlot {
  /** The (valid) part document the report was computed from, or null. */
  readonly document = input<PartDocument | null>(null);
  /** Its spin report, or null. */
  readonly report = input<SpinReport | null>(null);
}
