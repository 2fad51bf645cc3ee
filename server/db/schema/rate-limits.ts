import { bigint, integer, pgTable, varchar } from 'drizzle-orm/pg-core';

/**
 * Counters of rate-limiter-flexible's PostgreSQL store, in the layout it reads and writes: every
 * web process counts in the same rows, so a limit holds however many processes serve.
 */
export const rateLimits = pgTable('rate_limits', {
  key: varchar({ length: 255 }).primaryKey(),
  points: integer().notNull().default(0),
  expire: bigint({ mode: 'number' }),
});
