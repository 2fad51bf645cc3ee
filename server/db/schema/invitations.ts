import { pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisations';
import { roleEnum } from './role-enum';
import { users } from './users';

/** An admin's invitation; only a hash of the link's token is kept. */
export const invitations = pgTable(
  'invitations',
  {
    id: uuid().primaryKey().defaultRandom(),
    organisationId: uuid()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    email: text().notNull(),
    name: text().notNull(),
    roles: roleEnum().array().notNull(),
    tokenHash: text().notNull(),
    invitedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp({ withTimezone: true }).notNull(),
    acceptedAt: timestamp({ withTimezone: true }),
  },
  (table) => [uniqueIndex('invitations_token_hash_unique').on(table.tokenHash)],
);
