import type { RequestHandler } from 'express';

/**
 * `Cache-Control: no-store` on every API answer: field phones are shared, and a signed-in
 * person's JSON must not stay in the browser's or a proxy's cache for the next one to read. A
 * route that may be cached (none today) sets its own header after this one.
 */
export const noStore: RequestHandler = (_req, res, next) => {
  res.set('Cache-Control', 'no-store');
  next();
};
