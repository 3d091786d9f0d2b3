import { Component, signal } from '@angular/core';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import isLuhnNumber from 'validator/lib/isLuhnNumber';
import { cardDigits, expiryIsPast, parseExpiry, passesLuhn } from './card-checks';
import { CardForm } from './card-form';
import { ONLY_TEST_CARDS_MESSAGE, TEST_CARD_TOKENS } from './test-card-tokenizer';

describe('passesLuhn', () => {
  // Worked example of the Luhn check (ISO/IEC 7812-1, annex B): 7992739871 with check digit 3.
  it('accepts the worked example and refuses it with any other check digit', () => {
    expect(passesLuhn('79927398713')).toBe(true);
    for (const wrong of '012456789') expect(passesLuhn(`7992739871${wrong}`)).toBe(false);
  });

  // Reference library: validator.js `isLuhnNumber` (npm "validator"), on a spread of numbers.
  it('agrees with validator.js on every test card and on numbers with one digit changed', () => {
    const numbers = Object.keys(TEST_CARD_TOKENS);
    for (const number of [...numbers]) {
      for (let i = 0; i < number.length; i++) {
        const digit = (Number(number[i]) + 1 + i) % 10;
        numbers.push(number.slice(0, i) + digit + number.slice(i + 1));
      }
    }
    for (const number of numbers) expect({ number, ours: passesLuhn(number) }).toEqual({ number, ours: isLuhnNumber(number) });
  });

  it('refuses anything that is not digits', () => {
    expect(passesLuhn('')).toBe(false);
    expect(passesLuhn('4242 4242 4242 4242')).toBe(false);
    expect(cardDigits('4242 4242-4242 4242')).toBe('4242424242424242');
    expect(cardDigits('4242 42x2')).toBeNull();
  });
});

describe('expiry', () => {
  const now = new Date(2026, 10, 20); // 20 Nov 2026, local time

  it('reads MM/YY and MM/YYYY and refuses month 13', () => {
    expect(parseExpiry('04/29')).toEqual({ month: 4, year: 2029 });
    expect(parseExpiry('4 / 2029')).toEqual({ month: 4, year: 2029 });
    expect(parseExpiry('13/29')).toBeNull();
    expect(parseExpiry('0429')).toBeNull();
  });

  it('keeps a card good through the last day of its month', () => {
    expect(expiryIsPast({ month: 11, year: 2026 }, now)).toBe(false);
    expect(expiryIsPast({ month: 10, year: 2026 }, now)).toBe(true);
    expect(expiryIsPast({ month: 1, year: 2027 }, now)).toBe(false);
  });
});

@Component({
  imports: [CardForm],
  template: `<tw-card-form submitLabel="Buy 3 seats" [serverError]="serverError()" (tokenized)="tokens.push($event)" />`,
})
class Host {
  readonly serverError = signal<string | null>(null);
  readonly tokens: string[] = [];
}

describe('CardForm', () => {
  let fixture: ComponentFixture<Host>;
  let host: HTMLElement;

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [Host] });
    fixture = TestBed.createComponent(Host);
    host = fixture.nativeElement;
    await fixture.whenStable();
  });

  const field = (id: string) => host.querySelector<HTMLInputElement>(`[data-testid="${id}"]`)!;
  const text = (id: string) => host.querySelector(`[data-testid="${id}"]`)?.textContent?.trim() ?? '';

  async function fillAndSubmit(number: string, expiry: string, cvc: string): Promise<void> {
    for (const [id, value] of [
      ['card-number', number],
      ['card-expiry', expiry],
      ['card-cvc', cvc],
    ] as const) {
      field(id).value = value;
      field(id).dispatchEvent(new Event('input'));
    }
    field('card-submit').click();
    await fixture.whenStable();
  }

  const nextYear = String((new Date().getFullYear() + 1) % 100).padStart(2, '0');

  it.each([
    ['4242 4242 4242 4242', 'tok_visa'],
    ['4000 0000 0000 0002', 'tok_chargeDeclined'],
    ['4000000000009995', 'tok_chargeDeclinedInsufficientFunds'],
    ['5555-5555-5555-4444', 'tok_mastercard'],
  ])('turns the test card %s into %s and emits only the token', async (number, token) => {
    await fillAndSubmit(number, `12/${nextYear}`, '123');
    expect(fixture.componentInstance.tokens).toEqual([token]);
    expect(JSON.stringify(fixture.componentInstance.tokens)).not.toContain(number.replace(/\D/g, '').slice(-8));
  });

  it('emits nothing for a number failing the Luhn check, and says so', async () => {
    await fillAndSubmit('4242 4242 4242 4241', `12/${nextYear}`, '123');
    expect(fixture.componentInstance.tokens).toEqual([]);
    expect(text('card-number-error')).toBe('Card number is not a valid card number (check the digits).');
  });

  it('emits nothing for an expired card or a short CVC', async () => {
    await fillAndSubmit('4242 4242 4242 4242', '01/20', '12');
    expect(fixture.componentInstance.tokens).toEqual([]);
    expect(text('card-expiry-error')).toBe('Expiry is in the past: this card has expired.');
    expect(text('card-cvc-error')).toBe('CVC must be the 3 or 4 digits on the card.');
  });

  it('refuses a valid number that is not a test card with the test-cards-only message', async () => {
    // 4111 1111 1111 1111 passes the Luhn check (validator.js agrees) but is not in our table.
    expect(isLuhnNumber('4111111111111111')).toBe(true);
    await fillAndSubmit('4111 1111 1111 1111', `12/${nextYear}`, '123');
    expect(fixture.componentInstance.tokens).toEqual([]);
    expect(text('card-number-error')).toBe(ONLY_TEST_CARDS_MESSAGE);
  });

  it('shows the server’s refusal of a declined card above the fields', async () => {
    fixture.componentInstance.serverError.set('Your card was declined. Nothing was charged and nothing changed.');
    await fixture.whenStable();
    expect(host.querySelector('[data-testid="error-banner"] p')?.textContent).toBe(
      'Your card was declined. Nothing was charged and nothing changed.',
    );
  });
});
