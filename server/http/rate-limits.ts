import type { Request, RequestHandler, Response } from 'express';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { Config } from '../config';
import type { Database } from '../db/database';
import type { Actor } from '../auth/actor';
import { answerTooMany, type LimitName } from './too-many';

const readMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The app's rate limits, counted in PostgreSQL so that every web process shares them. */
export interface RateLimits {
  /** Sign-in starts, callbacks and invitation links per address. */
  signIn: RequestHandler;
  /** Refused bearer tokens per address: guessing tokens soon meets a wall. */
  tokenGuesses: RequestHandler;
  /** Sync batches and other state-changing calls per signed-in person. */
  writes: RequestHandler;
}

export function rateLimits(config: Config, db: Database): RateLimits {
  const limiter = (name: LimitName, points: number, duration: number) =>
    new RateLimiterPostgres({
      storeClient: db.$client,
      storeType: 'pool',
      tableName: 'rate_limits',
      tableCreated: true,
      // Expired rows are overwritten in place by the next count under the same key.
      clearExpiredByTimeout: false,
      keyPrefix: `${config.RATE_LIMIT_KEY_PREFIX}:${name}`,
      points,
      duration,
    });
  const signIn = limiter('sign-in-per-address', config.RATE_SIGN_IN_PER_ADDRESS, 15 * 60);
  const tokenFailures = limiter(
    'token-failures-per-address',
    config.RATE_TOKEN_FAILURES_PER_ADDRESS,
    15 * 60,
  );
  const sync = limiter('sync-per-person', config.RATE_SYNC_PER_USER, 60);
  const writes = limiter('writes-per-person', config.RATE_WRITES_PER_USER, 60);

  return {
    signIn: consuming(
      signIn,
      'sign-in-per-address',
      (req) => addressOf(req),
      'Too many sign-in attempts from this address.',
    ),
    tokenGuesses: async (req, res, next) => {
      if (!/^Bearer\s/i.test(req.get('authorization') ?? '')) return next();
      const key = addressOf(req);
      const state = await tokenFailures.get(key);
      if (state && state.consumedPoints >= config.RATE_TOKEN_FAILURES_PER_ADDRESS) {
        answerTooMany(
          res,
          429,
          'token-failures-per-address',
          state.msBeforeNext,
          'Too many refused access tokens from this address.',
        );
        return;
      }
      res.on('finish', () => {
        if (res.statusCode === 401) tokenFailures.consume(key).catch(() => undefined);
      });
      next();
    },
    writes: (req, res, next) => {
      const actor = res.locals['actor'] as Actor | undefined;
      if (!actor || readMethods.has(req.method)) return next();
      const isSync = req.path === '/field/sync';
      return consuming(
        isSync ? sync : writes,
        isSync ? 'sync-per-person' : 'writes-per-person',
        () => actor.userId,
        isSync
          ? 'This account has sent too many sync batches.'
          : 'This account has made too many changes in a short time.',
      )(req, res, next);
    },
  };
}

/** A middleware taking one point per request under `keyOf`, answering 429 once they are spent. */
function consuming(
  limiter: RateLimiterPostgres,
  name: LimitName,
  keyOf: (req: Request, res: Response) => string,
  message: string,
): RequestHandler {
  return async (req, res, next) => {
    try {
      await limiter.consume(keyOf(req, res));
    } catch (error) {
      if (!(error instanceof RateLimiterRes)) throw error;
      answerTooMany(res, 429, name, error.msBeforeNext, message);
      return;
    }
    next();
  };
}

/** The caller's address as the socket saw it (no proxy is trusted). */
const addressOf = (req: Request) => req.ip ?? req.socket.remoteAddress ?? 'unknown';
