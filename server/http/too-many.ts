import type { Response } from 'express';
import type { ApiError } from '@shared/http/api-error';

/** The names a 429 or 503 answer gives the limit that was reached. */
export type LimitName =
  | 'sign-in-per-address'
  | 'token-failures-per-address'
  | 'sync-per-person'
  | 'writes-per-person'
  | 'sync-busy';

/**
 * Answers that a limit was reached: `Retry-After` in whole seconds (at least one), and JSON
 * naming the limit so a device or an integrator knows which one it met.
 */
export function answerTooMany(
  res: Response,
  status: 429 | 503,
  limit: LimitName,
  retryAfterMs: number,
  message: string,
): void {
  const seconds = Math.max(1, Math.ceil(retryAfterMs / 1000));
  res.setHeader('Retry-After', String(seconds));
  const body: ApiError = {
    error: {
      code: status === 429 ? 'rate-limited' : 'busy',
      message: `${message} Try again in ${seconds} s.`,
      limit,
    },
  };
  res.status(status).json(body);
}
