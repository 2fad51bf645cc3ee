/**
 * The SQLSTATE of an error PostgreSQL raised (as pg gives it, or wrapped by Drizzle), or null
 * for anything else — a lost connection is not the data's fault and is not caught as such.
 */
export function sqlStateOf(error: unknown): string | null {
  for (let cause = error, depth = 0; cause && depth < 3; depth += 1) {
    const code = (cause as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
    cause = (cause as { cause?: unknown }).cause;
  }
  return null;
}

/** PostgreSQL's own words for why it refused, for the enumerator's sync report. */
export function refusalMessage(error: unknown): string {
  const pgError = (error as { cause?: unknown }).cause ?? error;
  const message = (pgError as { message?: unknown }).message;
  return `The database refused to store it: ${typeof message === 'string' ? message : 'unknown reason'}`;
}
