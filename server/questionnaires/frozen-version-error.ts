import { HttpError } from '../http/http-error';

/** The refusal every route gives for a change to a published version. */
export const versionPublished = (version: number | string) =>
  new HttpError(
    409,
    'version-published',
    `Version ${version} is published and cannot be changed; start a new draft to edit it.`,
  );

/**
 * Whether `error` is the database trigger refusing to change a published version (migration
 * 0002). Drizzle wraps the driver's error, so the cause chain is searched too.
 */
export function isFrozenVersionError(error: unknown): boolean {
  for (let current = error, depth = 0; current && depth < 5; depth++) {
    const { code, message, cause } = current as {
      code?: unknown;
      message?: unknown;
      cause?: unknown;
    };
    if (
      code === '23514' &&
      typeof message === 'string' &&
      message.includes('is published and cannot be changed')
    ) {
      return true;
    }
    current = cause;
  }
  return false;
}

/** Runs `work`; the trigger's refusal, should a race get that far, becomes the same 409. */
export async function refusingFrozenVersions<T>(
  version: number | string,
  work: () => Promise<T>,
): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (isFrozenVersionError(error)) throw versionPublished(version);
    throw error;
  }
}
