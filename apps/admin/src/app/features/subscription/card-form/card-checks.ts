import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';

/** The digits of a card number as typed (spaces and dashes allowed between groups); null for anything else. */
export function cardDigits(typed: string): string | null {
  const compact = typed.replace(/[\s-]/g, '');
  return /^\d+$/.test(compact) ? compact : null;
}

/**
 * The Luhn (mod 10) check digit test of ISO/IEC 7812-1: from the right, every second digit is
 * doubled (less 9 when over 9) and the sum of all digits must be a multiple of 10.
 */
export function passesLuhn(digits: string): boolean {
  if (!/^\d+$/.test(digits)) return false;
  let sum = 0;
  for (let i = 0; i < digits.length; i++) {
    let digit = digits.charCodeAt(digits.length - 1 - i) - 48;
    if (i % 2 === 1) {
      digit *= 2;
      if (digit > 9) digit -= 9;
    }
    sum += digit;
  }
  return sum % 10 === 0;
}

/** A card's expiry month and four-digit year. */
export interface CardExpiry {
  month: number;
  year: number;
}

/** Reads "MM/YY" or "MM/YYYY" (also with a space or dash); null when it is not a date of that form. */
export function parseExpiry(typed: string): CardExpiry | null {
  const match = /^\s*(\d{1,2})\s*[/\-\s]\s*(\d{2}|\d{4})\s*$/.exec(typed);
  if (!match) return null;
  const month = Number(match[1]);
  const year = match[2].length === 2 ? 2000 + Number(match[2]) : Number(match[2]);
  if (month < 1 || month > 12) return null;
  return { month, year };
}

/** A card is good through the last day of its expiry month. */
export function expiryIsPast(expiry: CardExpiry, now: Date): boolean {
  const thisMonth = now.getFullYear() * 12 + now.getMonth();
  return expiry.year * 12 + (expiry.month - 1) < thisMonth;
}

/** Card number rule: 12 to 19 digits that pass the Luhn check. */
export const cardNumberValidator: ValidatorFn = (control: AbstractControl): ValidationErrors | null => {
  const typed = String(control.value ?? '');
  if (!typed.trim()) return { required: true };
  const digits = cardDigits(typed);
  if (!digits) return { rule: 'must contain digits only' };
  if (digits.length < 12 || digits.length > 19) return { rule: 'must have 12 to 19 digits' };
  if (!passesLuhn(digits)) return { rule: 'is not a valid card number (check the digits)' };
  return null;
};

/** Expiry rule: MM/YY, this month or later. `now` is asked on every check so a long-open page stays right. */
export function expiryValidator(now: () => Date = () => new Date()): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    const typed = String(control.value ?? '');
    if (!typed.trim()) return { required: true };
    const expiry = parseExpiry(typed);
    if (!expiry) return { rule: 'must be a month and year, MM/YY' };
    if (expiryIsPast(expiry, now())) return { rule: 'is in the past: this card has expired' };
    return null;
  };
}

/** CVC rule: the 3 or 4 digits on the card. */
export const cvcValidator: ValidatorFn = (control: AbstractControl): ValidationErrors | null => {
  const typed = String(control.value ?? '').trim();
  if (!typed) return { required: true };
  return /^\d{3,4}$/.test(typed) ? null : { rule: 'must be the 3 or 4 digits on the card' };
};
