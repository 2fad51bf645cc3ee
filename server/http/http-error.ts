import type { FieldIssue } from '@shared/http/api-error';

/** The one error type routes throw; the error handler turns it into `{ error: {...} }` JSON. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues?: FieldIssue[],
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const notSignedIn = () => new HttpError(401, 'not-signed-in', 'Sign in to continue.');

export const forbidden = (message = 'Your role does not allow this.') =>
  new HttpError(403, 'forbidden', message);

export const notFound = (what: string) => new HttpError(404, 'not-found', `${what} was not found.`);
