import { formatMoney } from './format-money';

/** Writes an amount held in minor units the way a person reads it ("Ksh 1,200.00"). */
export type AmountWords = (minor: number) => string;

/** Amounts written in the study's currency and locale, as the rest of the screen shows them. */
export function amountWordsFor(currency: string, locale: string): AmountWords {
  return (minor) => formatMoney(minor, currency, locale);
}
