import {
  doublePrecision,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  uuid,
} from 'drizzle-orm/pg-core';

/**
 * Each answered shelf observation as typed columns, written when an interview is stored (and
 * by drizzle/0010 for those stored before), so an observed-price fit reads columns in the
 * database instead of every interview's JSON. Refreshed by the SQL function
 * refresh_shelf_observation_rows(ids) from the interview and its questionnaire version.
 */
export const shelfObservationRows = pgTable(
  'shelf_observation_rows',
  {
    interviewId: uuid().notNull(),
    studyId: uuid().notNull(),
    blockId: text().notNull(),
    priceMinor: doublePrecision().notNull(),
    packSize: doublePrecision().notNull(),
    quantity: doublePrecision().notNull(),
    /** Days the units were counted over; null when the block counts stock on hand. */
    periodDays: integer(),
  },
  (table) => [
    primaryKey({ columns: [table.interviewId, table.blockId] }),
    index('shelf_observation_rows_study').on(table.studyId),
  ],
);
