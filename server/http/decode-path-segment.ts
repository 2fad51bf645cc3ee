import { HttpError } from './http-error';

/**
 * Decodes one segment of a request path; a malformed `%` escape (`%E0%A4%A`, a lone `%`) is
 * the caller's mistake, answered 400 naming the path, not an exception that becomes a 500.
 */
export function decodePathSegment(segment: string): string {
  try {
    return decodeURIComponent(segment);
  } catch {
    throw new HttpError(400, 'invalid-input', 'The address has a malformed % escape.', [
      { path: 'path', message: `“${segment.slice(0, 60)}” is not a valid percent-encoded value` },
    ]);
  }
}
