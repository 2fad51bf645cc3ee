/**
 * Prices as server messages name them: with the study's currency code, grouped, to at most two
 * decimals ("KES 3,650"), as a researcher reads them anywhere.
 */
export function priceWriter(currency: string): (price: number) => string {
  const format = new Intl.NumberFormat('en', {
    style: 'currency',
    currency,
    currencyDisplay: 'code',
    maximumFractionDigits: 2,
    trailingZeroDisplay: 'stripIfInteger',
  } as Intl.NumberFormatOptions);
  return (price) => format.format(price);
}

/** "1 respondent", "3 respondents": a count with its noun in the right number. */
export function countOf(count: number, one: string, many = `${one}s`): string {
  return `${count} ${count === 1 ? one : many}`;
}
