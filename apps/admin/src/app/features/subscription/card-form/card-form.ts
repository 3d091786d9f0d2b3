import { ChangeDetectionStrategy, Component, ElementRef, inject, input, output, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { applyServerError, ErrorBanner, FieldErrorPipe, focusFirstInvalid } from '@tumblewise/ui';
import { cardDigits, cardNumberValidator, cvcValidator, expiryValidator, parseExpiry } from './card-checks';
import { CARD_TOKENIZER } from './card-tokenizer';

/**
 * Card number, expiry and CVC. The form checks them, has the tokenizer turn them into a card
 * token and emits only the token: the number never reaches our server.
 */
@Component({
  selector: 'tw-card-form',
  changeDetection: ChangeDetectionStrategy.OnPush,
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatHint, MatInput, MatButton, ErrorBanner, FieldErrorPipe],
  template: `
    <form
      class="tw-card-form"
      [formGroup]="form"
      (ngSubmit)="submitCard()"
      novalidate
      [attr.aria-label]="formLabel()"
      data-testid="card-form"
    >
      <tw-error-banner [message]="serverError()" />
      <mat-form-field appearance="outline" class="tw-card-number">
        <mat-label>Card number</mat-label>
        <input matInput formControlName="number" inputmode="numeric" autocomplete="cc-number" data-testid="card-number" />
        <mat-hint>Test cards only on this installation, e.g. 4242 4242 4242 4242</mat-hint>
        <mat-error data-testid="card-number-error">{{ form.controls.number | fieldError: 'Card number' }}</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline" class="tw-card-expiry">
        <mat-label>Expiry (MM/YY)</mat-label>
        <input matInput formControlName="expiry" inputmode="numeric" autocomplete="cc-exp" data-testid="card-expiry" />
        <mat-error data-testid="card-expiry-error">{{ form.controls.expiry | fieldError: 'Expiry' }}</mat-error>
      </mat-form-field>
      <mat-form-field appearance="outline" class="tw-card-cvc">
        <mat-label>CVC</mat-label>
        <input matInput formControlName="cvc" inputmode="numeric" autocomplete="cc-csc" data-testid="card-cvc" />
        <mat-error data-testid="card-cvc-error">{{ form.controls.cvc | fieldError: 'CVC' }}</mat-error>
      </mat-form-field>
      <div class="tw-card-actions">
        <ng-content />
        <button mat-flat-button type="submit" [disabled]="busy() || tokenizing()" data-testid="card-submit">
          {{ busy() || tokenizing() ? busyLabel() : submitLabel() }}
        </button>
      </div>
    </form>
  `,
  styles: `
    .tw-card-form {
      display: flex;
      flex-wrap: wrap;
      gap: 4px 12px;
      align-items: flex-start;
    }
    tw-error-banner {
      flex: 1 1 100%;
    }
    .tw-card-number {
      flex: 1 1 300px;
    }
    .tw-card-expiry {
      flex: 0 1 150px;
    }
    .tw-card-cvc {
      flex: 0 1 110px;
    }
    .tw-card-actions {
      flex: 1 1 100%;
      display: flex;
      gap: 8px;
      justify-content: flex-end;
      margin-top: 12px;
    }
  `,
})
export class CardForm {
  private readonly tokenizer = inject(CARD_TOKENIZER);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** Label of the submit button ("Buy 3 seats", "Save card"). */
  readonly submitLabel = input('Save card');
  /** Label while the token or the server's answer is awaited. */
  readonly busyLabel = input('Saving…');
  /** Accessible name of the form. */
  readonly formLabel = input('Card');
  /** True while the parent waits for the server. */
  readonly busy = input(false);
  /** The server's refusal of the last token (a declined card), shown above the fields. */
  readonly serverError = input<string | null>(null);
  /** Emits the card token of checked card details. */
  readonly tokenized = output<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    number: ['', [cardNumberValidator]],
    expiry: ['', [expiryValidator()]],
    cvc: ['', [cvcValidator]],
  });
  protected readonly tokenizing = signal(false);

  /** Checks the fields; when they pass, tokenizes and emits the token. Nothing is emitted for invalid details. */
  protected submitCard(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      focusFirstInvalid(this.host.nativeElement);
      return;
    }
    const { number, expiry, cvc } = this.form.getRawValue();
    const digits = cardDigits(number);
    const parsed = parseExpiry(expiry);
    if (!digits || !parsed) return;
    this.tokenizing.set(true);
    this.tokenizer.tokenize({ digits, expiry: parsed, cvc: cvc.trim() }).subscribe({
      next: (token) => {
        this.tokenizing.set(false);
        this.tokenized.emit(token);
      },
      error: (error: unknown) => {
        this.tokenizing.set(false);
        // The tokenizer's refusal (not a test card) belongs to the card number.
        applyServerError(this.form, { field: 'number', message: error instanceof Error ? error.message : 'The card could not be read.' });
        focusFirstInvalid(this.host.nativeElement);
      },
    });
  }

  /** Empties the fields (after the server took the card). */
  reset(): void {
    this.form.reset();
  }
}
