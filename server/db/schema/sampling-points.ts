import { doublePrecision, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { studies } from './studies';

/** A place an enumerator visits; `code` is the stable external code that makes re-uploads idempotent. */
export const samplingPoints = pgTable(
  'sampling_points',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    code: text().notNull(),
    name: text().notNull(),
    kind: text().notNull(),
    latitude: doublePrecision().notNull(),
    longitude: doublePrecision().notNull(),
    stratum: text().notNull(),
    notes: text().notNull().default(''),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    unique('sampling_points_code').on(table.studyId, table.code),
    // Lets route stops prove, by foreign key, that a point belongs to the route's study.
    unique('sampling_points_study_id').on(table.studyId, table.id),
  ],
);
