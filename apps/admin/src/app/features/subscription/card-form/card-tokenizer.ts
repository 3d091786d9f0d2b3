import { InjectionToken } from '@angular/core';
import type { Observable } from 'rxjs';
import type { CardExpiry } from './card-checks';
import { TestCardTokenizer } from './test-card-tokenizer';

/** What the card form hands the tokenizer: checked digits, expiry and CVC. They never go to our server. */
export interface CardDetails {
  digits: string;
  expiry: CardExpiry;
  cvc: string;
}

/** Turns card details into a one-time card token that our server may receive. */
export interface CardTokenizer {
  /** Emits the token once, or fails with an Error whose message is shown beside the card number. */
  tokenize(card: CardDetails): Observable<string>;
}

/**
 * The tokenizer the card form uses. This installation has no network and no provider script, so
 * the default maps the provider's published test cards to test tokens; a production build
 * provides a tokenizer backed by the provider's own card element instead.
 */
export const CARD_TOKENIZER = new InjectionToken<CardTokenizer>('CARD_TOKENIZER', {
  providedIn: 'root',
  factory: () => new TestCardTokenizer(),
});
