import { HttpErrorResponse } from '@angular/common/http';
import type { ApiError, FieldIssue } from '@shared/http/api-error';

/** What the client needs to know about a failed API call, in words a person can act on. */
export interface ApiProblem {
  readonly status: number;
  readonly code: string;
  readonly message: string;
  readonly issues: readonly FieldIssue[];
}

const fallbackMessages: Record<number, string> = {
  0: 'Fieldcurve cannot reach its server. Check the connection and try again.',
  401: 'You are signed out. Sign in again to carry on.',
  403: 'Your roles do not allow this action.',
  404: 'That item no longer exists.',
  409: 'Someone changed this at the same time. Reload and try again.',
};

/** Reads the `{ error: { code, message, issues? } }` body the API sends, or explains the status. */
export function readApiProblem(error: unknown): ApiProblem {
  const status = error instanceof HttpErrorResponse ? error.status : 0;
  const body: unknown = error instanceof HttpErrorResponse ? error.error : undefined;
  if (isApiError(body)) {
    return {
      status,
      code: body.error.code,
      message: body.error.message,
      issues: body.error.issues ?? [],
    };
  }
  const message =
    fallbackMessages[status] ??
    (status >= 500
      ? 'The server ran into a problem. Try again in a moment.'
      : `The request failed (HTTP ${status}).`);
  return { status, code: status === 0 ? 'network' : `http-${status}`, message, issues: [] };
}

function isFieldIssue(value: unknown): boolean {
  if (typeof value !== 'object' || value === null) return false;
  const { path, message } = value as Record<string, unknown>;
  return typeof path === 'string' && typeof message === 'string';
}

// A structural check rather than the shared zod schema keeps zod out of the start-up bundle.
function isApiError(body: unknown): body is ApiError {
  if (typeof body !== 'object' || body === null || !('error' in body)) return false;
  const inner = (body as { error: unknown }).error;
  if (typeof inner !== 'object' || inner === null) return false;
  const { code, message, issues } = inner as Record<string, unknown>;
  const issuesOk =
    issues === undefined || (Array.isArray(issues) && (issues as unknown[]).every(isFieldIssue));
  return typeof code === 'string' && typeof message === 'string' && issuesOk;
}
