/**
 * How many decimal digits a currency's minor unit has (USD 2, JPY 0, KWD 3), as Intl formats it.
 *
 * Fieldcurve stores money as integer minor units of this size, so the browser and the server
 * must agree on it: both take it from their Intl data (CLDR), which for a few currencies
 * (IDR, HUF…) uses fewer digits than ISO 4217 because the smallest coins are no longer used.
 *
 * @throws RangeError naming the code when it is not a currency Intl knows.
 */
export function minorUnitDigits(currency: string): number {
  const formatter = currencyFormatter('en', currency);
  return formatter.resolvedOptions().maximumFractionDigits ?? 2;
}

/** A currency formatter, with a clear message when the code is not a currency. */
export function currencyFormatter(locale: string, currency: string): Intl.NumberFormat {
  if (!/^[A-Z]{3}$/.test(currency)) {
    throw new RangeError(`"${currency}" is not an ISO 4217 currency code (three capital letters)`);
  }
  return new Intl.NumberFormat(locale, { style: 'currency', currency });
}
