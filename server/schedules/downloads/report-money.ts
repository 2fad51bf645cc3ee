import { minorDigits } from './schedule-table';

/**
 * How the PDF report writes an amount of money: the currency code, grouped digits and the
 * currency's minor unit, dropped for whole amounts ("KES 1,100", "KES 478.50").
 */
export function reportMoney(currency: string): (value: number | null) => string {
  const digits = minorDigits(currency);
  const format = new Intl.NumberFormat('en', {
    style: 'currency',
    currency,
    currencyDisplay: 'code',
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
    trailingZeroDisplay: 'stripIfInteger',
  } as Intl.NumberFormatOptions);
  // Table cells never wrap, so a plain space serves, and text copied from the PDF stays plain.
  return (value) => (value === null ? '' : format.format(value).replace(/\s/g, ' '));
}
