/** A calendar day as `YYYY-MM-DD` from a date picker's local date (no time-zone shift). */
export function toIsoDay(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
}

/** The local-midnight date of a `YYYY-MM-DD` day, for a date picker. */
export function fromIsoDay(day: string): Date {
  const [year, month, date] = day.split('-').map(Number);
  return new Date(year, month - 1, date);
}

/** A day as people read it in the browser's language, e.g. "5 Apr 2027". */
export function formatDay(day: string): string {
  return fromIsoDay(day).toLocaleDateString(undefined, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
  });
}
