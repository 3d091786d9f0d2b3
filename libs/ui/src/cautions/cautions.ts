import { ChangeDetectionStrategy, Component, input } from '@angular/core';

/** The product's standing cautions: figures are estimates, conformance is for governing bodies, test safely. */
@Component({
  selector: 'tw-cautions',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <aside class="tw-cautions" [attr.aria-label]="label()" data-testid="cautions">
      <p>
        <strong>Estimates only.</strong> Figures come from idealised geometry and nominal densities. They do not certify that a design
        conforms to any governing body's rules; only that body's own test decides.
      </p>
      <p>
        <strong>Test safely.</strong> Thrown and swung implements can injure. Test prototypes in a cleared area, under your organisation's
        safety rules.
      </p>
    </aside>
  `,
  styles: `
    .tw-cautions {
      border-top: 1px solid var(--mat-sys-outline-variant);
      background: var(--mat-sys-surface-container-low);
      color: var(--mat-sys-on-surface-variant);
      font: var(--mat-sys-body-small);
      padding: 12px 24px;
    }
    p {
      margin: 4px auto;
      max-width: 1120px;
    }
    strong {
      color: var(--mat-sys-on-surface);
    }
  `,
})
export class Cautions {
  /** Name of the landmark; give another one where a screen shows the cautions twice ("Cautions for the tumble preview"). */
  readonly label = input('Cautions');
}
