import { pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { roleEnum } from './role-enum';
import { studies } from './studies';
import { users } from './users';

/** Who works on (or, for clients, may read) a study, and in which roles. */
export const studyMembers = pgTable(
  'study_members',
  {
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    roles: roleEnum().array().notNull(),
    addedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [primaryKey({ columns: [table.studyId, table.userId] })],
);
