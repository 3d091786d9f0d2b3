import { Observable, of, throwError } from 'rxjs';
import type { CardDetails, CardTokenizer } from './card-tokenizer';

/**
 * The payment provider's published test card numbers and the test tokens the local payment fake
 * accepts for them. Only these cards work on an installation without the provider's card element.
 */
export const TEST_CARD_TOKENS: Readonly<Record<string, string>> = {
  '4242424242424242': 'tok_visa',
  '4000000000000002': 'tok_chargeDeclined',
  '4000000000009995': 'tok_chargeDeclinedInsufficientFunds',
  '5555555555554444': 'tok_mastercard',
};

/** Shown for a valid card number that is not one of the test cards. */
export const ONLY_TEST_CARDS_MESSAGE =
  'Only the payment provider’s test cards work on this installation, e.g. 4242 4242 4242 4242 (accepted) or 4000 0000 0000 0002 (declined).';

/** Tokenizes by looking the number up among the test cards; nothing leaves the browser. */
export class TestCardTokenizer implements CardTokenizer {
  /** Emits the test token of a test card, or fails with {@link ONLY_TEST_CARDS_MESSAGE}. */
  tokenize(card: CardDetails): Observable<string> {
    const token = TEST_CARD_TOKENS[card.digits];
    return token ? of(token) : throwError(() => new Error(ONLY_TEST_CARDS_MESSAGE));
  }
}
