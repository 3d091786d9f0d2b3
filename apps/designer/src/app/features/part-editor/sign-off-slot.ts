import { afterNextRender, ChangeDetectionStrategy, Component, ElementRef, inject, input, output } from '@angular/core';
import type { VariantStatus } from '@tumblewise/shared';
import { SignOffPanel } from '../sign-off/sign-off-panel';

/**
 * The sign-off of the variant open in the report panel (`SignOffPanel` of features/sign-off),
 * loaded when it scrolls into view, or at once and scrolled to when `reveal` is set (the review link).
 */
@Component({
  selector: 'tw-sign-off-slot',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [SignOffPanel],
  template: `
    <section
      class="tw-sign-off-slot"
      [attr.aria-label]="'Sign-off of variant ' + (variantNumber() ?? '')"
      data-testid="sign-off-slot"
      [attr.data-variant-id]="variantId()"
    >
      @defer (on viewport; when reveal()) {
        <tw-sign-off-panel [variantId]="variantId()" (statusChanged)="statusChanged.emit($event)" />
      } @placeholder {
        <p>Sign-off of variant {{ variantNumber() }}</p>
      } @loading {
        <p>Loading the sign-off…</p>
      }
    </section>
  `,
  styles: `
    .tw-sign-off-slot {
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
      padding: 4px 16px 12px;
    }
  `,
})
export class SignOffSlot {
  /** The variant whose sign-off is shown. */
  readonly variantId = input.required<string>();
  /** Its number, for the label. */
  readonly variantNumber = input<number | null>(null);
  /** Emitted with the variant's new status after a request or a decision. */
  readonly statusChanged = output<VariantStatus>();
  /** Load the panel at once and scroll it into view. */
  readonly reveal = input(false);

  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  constructor() {
    afterNextRender(() => {
      if (this.reveal()) this.host.nativeElement.scrollIntoView({ block: 'start' });
    });
  }
}
