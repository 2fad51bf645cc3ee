import { pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisations';
import { roleEnum } from './role-enum';
import { users } from './users';

/** A person's place in an organisation, with every role they hold there. */
export const memberships = pgTable(
  'memberships',
  {
    organisationId: uuid()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    roles: roleEnum().array().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    /** Set while an admin has deactivated the person: the row (and their history) stays. */
    deactivatedAt: timestamp({ withTimezone: true }),
  },
  (table) => [primaryKey({ columns: [table.organisationId, table.userId] })],
);
