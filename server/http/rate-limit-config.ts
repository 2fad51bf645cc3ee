import { z } from 'zod';

const count = (fallback: number) => z.coerce.number().int().min(1).default(fallback);

/**
 * Rate limits and the sync gate, from the environment. The defaults protect a production
 * organisation without getting in a busy field team's way; the test stack sets them far higher
 * so that no test trips one by accident (the rate-limit tests set their own low ones).
 */
export const rateLimitConfig = {
  /** Sign-in starts and callbacks from one address per 15 minutes. */
  RATE_SIGN_IN_PER_ADDRESS: count(60),
  /** Refused read-API tokens from one address per 15 minutes; after that even a good one waits. */
  RATE_TOKEN_FAILURES_PER_ADDRESS: count(20),
  /** Sync batches one person may send per minute. */
  RATE_SYNC_PER_USER: count(120),
  /** Other state-changing calls one person may make per minute. */
  RATE_WRITES_PER_USER: count(300),
  /** Sets the counters of one app apart from another's sharing the database (tests only). */
  RATE_LIMIT_KEY_PREFIX: z
    .string()
    .regex(/^[a-z0-9-]{1,40}$/)
    .default('fc'),
  /** Sync batches one web process works on at once; the rest wait briefly in line. */
  SYNC_CONCURRENCY: count(2),
  /** Batches that may wait in one process's line before more are told to come back later. */
  SYNC_QUEUE_LENGTH: count(40),
  /**
   * How long a batch may wait in line before it is told to come back later: briefly, so a sync
   * call never hangs for seconds (the device's outbox simply tries again after `Retry-After`).
   */
  SYNC_QUEUE_WAIT_MS: count(750),
};
