import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { csrfHeaderName } from '@shared/auth/session';
import { HttpError } from '../http/http-error';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's synchronizer token, made on first use. */
export function csrfTokenFor(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

/**
 * Refuses a state-changing request unless it echoes the session's token in a header; a page on
 * another site can make the browser send the cookie, but cannot read the token.
 */
export const requireCsrfToken: RequestHandler = (req, _res, next) => {
  if (safeMethods.has(req.method)) {
    next();
    return;
  }
  const sent = req.get(csrfHeaderName) ?? '';
  const expected = req.session.csrfToken ?? '';
  const ok =
    expected.length > 0 &&
    sent.length === expected.length &&
    timingSafeEqual(Buffer.from(sent), Buffer.from(expected));
  if (!ok) {
    throw new HttpError(
      403,
      'csrf-token-invalid',
      'The request lacks a valid CSRF token; reload the page and try again.',
    );
  }
  next();
};
