import {
  foreignKey,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import { fits } from './fits';
import { studies } from './studies';
import { users } from './users';

/**
 * A published demand schedule. A version never changes (a trigger refuses UPDATE and DELETE);
 * a correction is a new version that names the one it replaces, and each version is replaced at
 * most once, so the versions of a schedule form a chain.
 */
export const scheduleVersions = pgTable(
  'schedule_versions',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'restrict' }),
    fitId: uuid()
      .notNull()
      .references(() => fits.id, { onDelete: 'restrict' }),
    version: integer().notNull(),
    title: text().notNull(),
    replacesId: uuid(),
    method: text().notNull(),
    spec: jsonb().notNull(),
    n: integer().notNull(),
    dataHash: text().notNull(),
    /** The schedule as published: currency, quantity kind, rows with their bands and support. */
    schedule: jsonb().notNull(),
    publishedBy: uuid().references(() => users.id),
    publishedByName: text().notNull(),
    publishedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    unique('schedule_versions_number').on(table.studyId, table.version),
    unique('schedule_versions_replaces').on(table.replacesId),
    foreignKey({ columns: [table.replacesId], foreignColumns: [table.id] }),
  ],
);
