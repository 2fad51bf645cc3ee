import { HttpErrorResponse } from '@angular/common/http';
import type { ApiError, FieldIssue } from '@shared/http/api-error';
import { notOpenToYourAccount } from './access-words';

/** What the client needs to know about a failed API call, in words a person can act on. */
export interface ApiProblem {
  readonly status: number;
  readonly code: string;
  readonly message: string;
  readonly issues: readonly FieldIssue[];
}

const fallbackMessages: Record<number, string> = {
  0: 'Fieldcurve cannot reach its server. Check the connection and try again.',
  // What the service worker answers when the network is gone: no server ever saw the request.
  504: 'Fieldcurve cannot reach its server. Check the connection and try again.',
  401: 'You are signed out. Sign in again to carry on.',
  403: 'Your roles do not allow this action.',
  404: 'That item no longer exists.',
  409: 'Someone changed this at the same time. Reload and try again.',
};

const offlineMessage =
  'This device is offline. Fieldcurve will load this once the connection is back.';

// The server's role refusal names roles ("This is open to researchers and supervisors only."):
// readers get the plain sentence the route guard uses.
const roleRefusal = /^This is open to [a-z, ]+ only( in this study)?\.$/;

/** Reads the `{ error: { code, message, issues? } }` body the API sends, or explains the status. */
export function readApiProblem(error: unknown): ApiProblem {
  const status = error instanceof HttpErrorResponse ? error.status : 0;
  const body: unknown = error instanceof HttpErrorResponse ? error.error : undefined;
  if (isApiError(body)) {
    return {
      status,
      code: body.error.code,
      message: plainRefusal(body.error.code, body.error.message),
      issues: body.error.issues ?? [],
    };
  }
  if ((status === 0 || status === 504) && globalThis.navigator?.onLine === false) {
    return { status, code: 'network', message: offlineMessage, issues: [] };
  }
  const message =
    fallbackMessages[status] ??
    (status >= 500
      ? 'The server ran into a problem. Try again in a moment.'
      : `The request failed (HTTP ${status}).`);
  return { status, code: status === 0 ? 'network' : `http-${status}`, message, issues: [] };
}

function plainRefusal(code: string, message: string): string {
  const refused = code === 'forbidden' ? roleRefusal.exec(message) : null;
  if (!refused) return message;
  return refused[1] ? notOpenToYourAccount.replace('.', `${refused[1]}.`) : notOpenToYourAccount;
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
