const when = new Intl.DateTimeFormat('en-GB', {
  dateStyle: 'long',
  timeStyle: 'short',
  timeZone: 'UTC',
});

/** "20 November 2026 at 10:00 UTC": a publication time as reports write it. */
export function publishedWhen(iso: string): string {
  return `${when.format(new Date(iso))} UTC`;
}
