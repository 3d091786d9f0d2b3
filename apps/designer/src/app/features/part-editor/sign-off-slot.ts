import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/**
 * SLOT FOR THE SIGN-OFF PANEL of a variant (features/sign-off, input `variantId`). Until that
 * component is in the tree this shows a placeholder naming the variant; when it is, the template
 * becomes `@defer (on viewport) { <tw-sign-off [variantId]="variantId()" /> }` with this
 * placeholder as its @placeholder.
 */
@Component({
  selector: 'tw-sign-off-slot',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <section class="tw-sign-off-slot" aria-label="Sign-off" data-testid="sign-off-slot" [attr.data-variant-id]="variantId()">
      @defer (on viewport) {
        <p><span class="material-icons" aria-hidden="true">rate_review</span> Sign-off of variant {{ variantNumber() }}: request a review, comments and the decision appear here.</p>
      } @placeholder {
        <p>Sign-off</p>
      }
    </section>
  `,
  styles: `
    .tw-sign-off-slot {
      border: 1px dashed var(--mat-sys-outline-variant);
      border-radius: 12px;
      padding: 4px 16px;
      color: var(--mat-sys-on-surface-variant);
    }
    p {
      display: flex;
      gap: 8px;
      align-items: center;
    }
  `,
})
export class SignOffSlot {
  /** The variant whose sign-off is shown. */
  readonly variantId = input.required<string>();
  /** Its number, for the placeholder. */
  readonly variantNumber = input<number | null>(null);
}
