/**
 * An amount in the currency's minor unit (cents) written for the reader: `formatMoney(2900, 'eur')`
 * → "€29.00". The number of minor digits comes from the currency itself (Intl), so a currency
 * without minor units is not divided by 100.
 */
export function formatMoney(minorUnits: number, currency: string, locale = 'en-US'): string {
  const code = currency.toUpperCase();
  let format: Intl.NumberFormat;
  try {
    format = new Intl.NumberFormat(locale, { style: 'currency', currency: code });
  } catch {
    return `${(minorUnits / 100).toFixed(2)} ${code}`;
  }
  const digits = format.resolvedOptions().maximumFractionDigits ?? 2;
  return format.format(minorUnits / 10 ** digits);
}
