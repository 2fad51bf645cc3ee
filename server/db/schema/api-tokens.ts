import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
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
  },
  (table) => [
    uniqueIndex('api_tokens_hash').on(table.tokenHash),
    index('api_tokens_owner').on(table.userId, table.organisationId),
  ],
);
