import { formatMoney } from './money';

// Reference: the minor-unit exponents of ISO 4217 (EUR and USD 2, JPY 0, KWD 3), as Intl reports them.
describe('formatMoney', () => {
  it('divides by the minor unit of the currency', () => {
    expect(formatMoney(2900, 'usd')).toBe('$29.00');
    expect(formatMoney(123456, 'eur')).toBe('€1,234.56');
    expect(formatMoney(500, 'jpy')).toBe('¥500');
    expect(formatMoney(1234, 'kwd').replace(/\s/g, ' ')).toBe('KWD 1.234');
  });

  it('falls back to a plain figure for a code Intl does not know', () => {
    expect(formatMoney(1999, 'x1')).toBe('19.99 X1');
  });
});
