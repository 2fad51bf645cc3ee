import {
  bigint,
  boolean,
  index,
  integer,
  pgTable,
  primaryKey,
  smallint,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { interviewStatusEnum } from './interviews';

/**
 * What every typed analysis row carries of its interview: where it belongs, who and where it
 * was taken, which block of which questionnaire version it answers (`blockRank` 0 is the first
 * block of its kind, the one a fit reads when it names none), and the two answers raking reads
 * (income band, household size), with the review state and flags filters read. Written from the interview's answers by the trigger of
 * drizzle/0011 in the same statement that stores or corrects the interview, so a fit reads
 * typed columns and never the answers' JSON.
 */
const interviewColumns = () => ({
  // No row-level foreign key: these rows are written and deleted with their interview by the
  // statement-level triggers of drizzle/0011, millions at a time when a study is large.
  interviewId: uuid().notNull(),
  studyId: uuid().notNull(),
  questionnaireVersionId: uuid().notNull(),
  blockId: text().notNull(),
  blockRank: smallint().notNull(),
  respondentKey: text(),
  enumeratorId: uuid(),
  routeId: uuid(),
  pointId: uuid(),
  finishedAt: timestamp({ withTimezone: true }).notNull(),
  /** The interview's review state and whether it carries quality flags, as analysis filters them. */
  status: interviewStatusEnum().notNull(),
  flagged: boolean().notNull(),
  incomeBand: text(),
  householdPeople: integer(),
});

/**
 * Every interview once, with what analysis filters read: how many interviews a fit's filters
 * match, counted without reading the interviews' answers.
 */
export const statedInterviews = pgTable(
  'stated_interviews',
  {
    interviewId: uuid().primaryKey(),
    studyId: uuid().notNull(),
    routeId: uuid(),
    pointId: uuid(),
    finishedAt: timestamp({ withTimezone: true }).notNull(),
    status: interviewStatusEnum().notNull(),
    flagged: boolean().notNull(),
  },
  (t) => [index('stated_interviews_study').on(t.studyId, t.status)],
);

/** One row per ladder step answered: the price asked and the answer (1/0, or intent 1–5). */
export const statedLadderSteps = pgTable(
  'stated_ladder_steps',
  {
    ...interviewColumns(),
    scale: text().notNull(),
    priceMinor: bigint({ mode: 'number' }).notNull(),
    response: smallint().notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.interviewId, t.blockId, t.priceMinor] }),
    index('stated_ladder_steps_study').on(t.studyId, t.blockRank, t.blockId),
  ],
);

/** The four price thresholds and, when asked, the two purchase likelihoods (1–5). */
export const statedThresholds = pgTable(
  'stated_thresholds',
  {
    ...interviewColumns(),
    tooCheapMinor: bigint({ mode: 'number' }).notNull(),
    cheapMinor: bigint({ mode: 'number' }).notNull(),
    expensiveMinor: bigint({ mode: 'number' }).notNull(),
    tooExpensiveMinor: bigint({ mode: 'number' }).notNull(),
    likelihoodCheap: smallint(),
    likelihoodExpensive: smallint(),
  },
  (t) => [
    primaryKey({ columns: [t.interviewId, t.blockId] }),
    index('stated_thresholds_study').on(t.studyId, t.blockRank, t.blockId),
  ],
);

/** The most a respondent said they would pay. */
export const statedWtpAmounts = pgTable(
  'stated_wtp_amounts',
  {
    ...interviewColumns(),
    amountMinor: bigint({ mode: 'number' }).notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.interviewId, t.blockId] }),
    index('stated_wtp_amounts_study').on(t.studyId, t.blockRank, t.blockId),
  ],
);

/** A payment-card answer as the interval [lower, upper) it places WTP in; upper null when open. */
export const statedCardIntervals = pgTable(
  'stated_card_intervals',
  {
    ...interviewColumns(),
    lowerMinor: bigint({ mode: 'number' }).notNull(),
    upperMinor: bigint({ mode: 'number' }),
  },
  (t) => [
    primaryKey({ columns: [t.interviewId, t.blockId] }),
    index('stated_card_intervals_study').on(t.studyId, t.blockRank, t.blockId),
  ],
);

/** A dichotomous-choice answer: the bid and reply, and the follow-up of a double-bounded block. */
export const statedBidAnswers = pgTable(
  'stated_bid_answers',
  {
    ...interviewColumns(),
    bounds: text().notNull(),
    bidMinor: bigint({ mode: 'number' }).notNull(),
    yes: boolean().notNull(),
    bid2Minor: bigint({ mode: 'number' }),
    yes2: boolean(),
  },
  (t) => [
    primaryKey({ columns: [t.interviewId, t.blockId] }),
    index('stated_bid_answers_study').on(t.studyId, t.blockRank, t.blockId),
  ],
);
