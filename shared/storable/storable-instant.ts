import { z } from 'zod';
import { isStorableYear, storableYearMessage } from './storable-year';

/**
 * True when an ISO date-time with offset names an instant PostgreSQL stores: in UTC (which is
 * how it is stored) its year lies in 1..9999. `0001-01-01T00:30:00+01:00` is year 0 in UTC.
 */
export function isStorableInstant(text: string): boolean {
  const time = Date.parse(text);
  return Number.isFinite(time) && isStorableYear(new Date(time).getUTCFullYear());
}

/** An ISO date-time with a time zone that the database can store; `what` names it in messages. */
export function storableInstant(what: string) {
  return z.iso
    .datetime({
      offset: true,
      abort: true,
      error: `${what} must be an ISO date-time with a time zone`,
    })
    .refine(isStorableInstant, {
      error: `${what} is out of range: ${storableYearMessage.toLowerCase()} (in UTC)`,
    });
}
