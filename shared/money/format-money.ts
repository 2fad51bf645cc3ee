import { currencyFormatter, minorUnitDigits } from './minor-unit-digits';

/**
 * Formats an amount held in integer minor units for a person reading `locale`:
 * `formatMoney(123456, 'EUR', 'de-DE')` → `1.234,56 €`.
 *
 * The amount goes to Intl as an exact decimal string, never through a division in binary
 * floating point, so large amounts are shown to the last minor unit.
 *
 * @throws RangeError when `minor` is not a safe integer or the currency is unknown.
 */
export function formatMoney(minor: number, currency: string, locale: string): string {
  if (!Number.isSafeInteger(minor)) {
    throw new RangeError(`An amount in minor units must be a whole number, not ${minor}`);
  }
  const formatter = currencyFormatter(locale, currency);
  const exact = minorToDecimalString(minor, minorUnitDigits(currency));
  // Intl formats decimal strings exactly (ES2023); TypeScript's lib only declares numbers.
  return formatter.format(exact as unknown as number);
}

/** `12345` with 2 digits → `"123.45"`; `-5` → `"-0.05"`; with 0 digits → `"12345"`. */
export function minorToDecimalString(minor: number, digits: number): string {
  const sign = minor < 0 ? '-' : '';
  const magnitude = String(Math.abs(minor));
  if (digits === 0) return sign + magnitude;
  const padded = magnitude.padStart(digits + 1, '0');
  return `${sign}${padded.slice(0, -digits)}.${padded.slice(-digits)}`;
}
