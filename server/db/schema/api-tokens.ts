import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { organisations } from './organisations';
import { users } from './users';

/**
 * An access token a client issued for their own planning tools. Only the SHA-256 of the token is
 * kept; `prefix` (its first characters) lets the owner tell tokens apart in the list.
 */
export const apiTokens = pgTable(
  'api_tokens',
  {
    id: uuid().primaryKey().defaultRandom(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    organisationId: uuid()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    tokenHash: text().notNull(),
    prefix: text().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp({ withTimezone: true }),
    revokedAt: timestamp({ withTimezone: true }),
    /** Why it was revoked: by its owner, by an admin, or because the role or membership went. */
    revokedReason: text({ enum: ['owner', 'admin', 'role-removed', 'member-deactivated'] }),
    /** Chosen at issue (at most a year); tokens issued before expiry existed got 90 days. */
    expiresAt: timestamp({ withTimezone: true })
      .notNull()
      .default(sql`now() + interval '90 days'`),
    /** When set, the token reaches only these studies (still only those the owner is a client of). */
    studyIds: uuid().array(),
  },
  (table) => [
    uniqueIndex('api_tokens_hash').on(table.tokenHash),
    index('api_tokens_owner').on(table.userId, table.organisationId),
  ],
);
