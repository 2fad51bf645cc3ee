/** The years a stored date may have: PostgreSQL has no year 0, and four digits keep ISO text. */
export const firstStorableYear = 1;
export const lastStorableYear = 9999;

export function isStorableYear(year: number): boolean {
  return Number.isInteger(year) && year >= firstStorableYear && year <= lastStorableYear;
}

export const storableYearMessage = `The year must be between ${firstStorableYear} and ${lastStorableYear}`;
