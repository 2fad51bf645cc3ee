import {
  bigint,
  check,
  integer,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { studyStatuses } from '@shared/studies/study-status';
import { organisations } from './organisations';
import { users } from './users';

export const studyStatusEnum = pgEnum('study_status', studyStatuses);

/**
 * A demand study. Prices are integer minor units of the study's currency (cents, paise…), so
 * money never passes through binary floating point in storage.
 */
export const studies = pgTable(
  'studies',
  {
    id: uuid().primaryKey().defaultRandom(),
    organisationId: uuid()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    productName: text().notNull(),
    secondProductName: text(),
    currency: text().notNull(),
    locale: text().notNull(),
    market: text().notNull(),
    targetSample: integer().notNull(),
    priceMinMinor: bigint({ mode: 'number' }).notNull(),
    priceMaxMinor: bigint({ mode: 'number' }).notNull(),
    status: studyStatusEnum().notNull().default('draft'),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check(
      'studies_price_range',
      sql`${table.priceMinMinor} > 0 and ${table.priceMaxMinor} > ${table.priceMinMinor}`,
    ),
    check('studies_target_sample', sql`${table.targetSample} > 0`),
  ],
);
