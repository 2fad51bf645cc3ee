import { z } from 'zod';
import { isStorableYear, storableYearMessage } from './storable-year';

/** True when a `YYYY-MM-DD` day has a year PostgreSQL's `date` stores as written. */
export function isStorableDay(text: string): boolean {
  return isStorableYear(Number(text.slice(0, 4)));
}

/** A real calendar day written `YYYY-MM-DD` that the database can store. */
export function storableDay(error: string) {
  return z.iso.date({ error, abort: true }).refine(isStorableDay, { error: storableYearMessage });
}
