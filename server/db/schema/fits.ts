import { sql } from 'drizzle-orm';
import {
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { fitStatuses } from '@shared/analysis/fit-status';
import { studies } from './studies';
import { users } from './users';

export const fitStatusEnum = pgEnum('fit_status', fitStatuses);

/**
 * One fit a researcher asked for: its specification, the job's state and progress, and once a
 * worker has run it, the result and the hash of the exact data it used. `attempts` counts how
 * often a worker started the engine on it, so a job that ran twice is visible.
 */
export const fits = pgTable(
  'fits',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    spec: jsonb().notNull(),
    status: fitStatusEnum().notNull().default('queued'),
    progress: integer().notNull().default(0),
    result: jsonb(),
    error: jsonb(),
    dataHash: text(),
    attempts: integer().notNull().default(0),
    workerId: text(),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp({ withTimezone: true }),
    finishedAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    index('fits_study_created').on(table.studyId, table.createdAt),
    check('fits_progress', sql`${table.progress} between 0 and 100`),
  ],
);
