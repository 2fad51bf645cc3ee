import {
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { studies } from './studies';
import { users } from './users';

export const questionnaireVersionStatusEnum = pgEnum('questionnaire_version_status', [
  'draft',
  'published',
]);

export const questionnaires = pgTable('questionnaires', {
  id: uuid().primaryKey().defaultRandom(),
  studyId: uuid()
    .notNull()
    .references(() => studies.id, { onDelete: 'cascade' }),
  title: text().notNull(),
  createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
});

/**
 * One version of a questionnaire. A published version is frozen (a trigger refuses updates and
 * deletes); editing afterwards starts a new draft version. Responses point at the version.
 */
export const questionnaireVersions = pgTable(
  'questionnaire_versions',
  {
    id: uuid().primaryKey().defaultRandom(),
    questionnaireId: uuid()
      .notNull()
      .references(() => questionnaires.id, { onDelete: 'restrict' }),
    version: integer().notNull(),
    status: questionnaireVersionStatusEnum().notNull().default('draft'),
    definition: jsonb().notNull(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    publishedAt: timestamp({ withTimezone: true }),
    publishedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (table) => [
    uniqueIndex('questionnaire_versions_number').on(table.questionnaireId, table.version),
  ],
);
