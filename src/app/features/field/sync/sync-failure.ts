import { HttpErrorResponse } from '@angular/common/http';
import { readApiProblem } from '../../../core/api-problem';

/**
 * Whether trying again later may succeed: no network (status 0, or the service worker's 504),
 * a time-out, throttling, or a server fault. A refusal (400, 403) or an ended session (401)
 * will not change by waiting.
 */
export function isTransientFailure(error: unknown): boolean {
  if (!(error instanceof HttpErrorResponse)) return false;
  return error.status === 0 || error.status === 408 || error.status === 429 || error.status >= 500;
}

/** A sentence for the sync page. */
export function describeSyncFailure(error: unknown): string {
  if (error instanceof HttpErrorResponse) {
    if (error.status === 0 || error.status === 504) return 'No connection to the server.';
    return readApiProblem(error).message;
  }
  return error instanceof Error ? error.message : 'The sync stopped on an unexpected problem.';
}
