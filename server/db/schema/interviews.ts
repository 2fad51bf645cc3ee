import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { interviewStatuses } from '@shared/interviews/interview-status';
import { users } from './users';

export const interviewStatusEnum = pgEnum('interview_status', interviewStatuses);

/**
 * One interview as the server accepted it. The id is made on the device and is the idempotency
 * key of sync: the same interview sent twice is stored once.
 */
export const interviews = pgTable(
  'interviews',
  {
    id: uuid().primaryKey(),
    // The five references below are checked once per statement, not per row: see
    // drizzle/0007_interview_reference_checks.sql. Sync stores interviews hundreds at a time,
    // all pointing at the same few parents, and a row-level foreign key would look up and lock
    // the same study, version, route and enumerator once for every row.
    studyId: uuid().notNull(),
    questionnaireVersionId: uuid().notNull(),
    routeId: uuid(),
    pointId: uuid(),
    enumeratorId: uuid(),
    status: interviewStatusEnum().notNull().default('received'),
    answers: jsonb().notNull(),
    flags: jsonb().notNull().default([]),
    startedAt: timestamp({ withTimezone: true }).notNull(),
    finishedAt: timestamp({ withTimezone: true }).notNull(),
    receivedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    /** Where the device stood when the interview ended, and how sure it was (metres). */
    latitude: doublePrecision(),
    longitude: doublePrecision(),
    gpsAccuracyM: doublePrecision(),
    /** A keyed hash of what identifies a respondent at a point, for the duplicate check; never a name. */
    respondentKey: text(),
    /** Photos the interview refers to; it is complete when that many are stored. */
    photoCount: integer().notNull().default(0),
    completeAt: timestamp({ withTimezone: true }),
    reviewNote: text(),
    reviewedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    reviewedAt: timestamp({ withTimezone: true }),
  },
  (table) => [
    index('interviews_study_status').on(table.studyId, table.status),
    index('interviews_route_point').on(table.routeId, table.pointId),
    index('interviews_respondent').on(table.studyId, table.respondentKey),
  ],
);
