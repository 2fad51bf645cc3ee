import { and, asc, eq, inArray, isNotNull, sql, type SQL } from 'drizzle-orm';
import { PgDialect } from 'drizzle-orm/pg-core';
import { interviewStatuses, type InterviewStatus } from '@shared/interviews/interview-status';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import type { Block } from '@shared/questionnaire/block';
import type { RawDataRequest } from '@shared/raw-data/raw-data-request';
import {
  rawDataLayout,
  type LayoutVersion,
  type RawDataLayout,
} from '@shared/raw-data/raw-data-layout';
import { interviewFilterConditions } from '../analysis/interview-filter-conditions';
import type { Executor } from '../db/database';
import { interviews, questionnaires, questionnaireVersions, studies } from '../db/schema';
import { notFound } from '../http/http-error';

/** A study's download, planned: the study, its questionnaire versions and the columns. */
export interface RawDataSource {
  readonly study: { readonly id: string; readonly name: string; readonly currency: string };
  readonly digits: number;
  readonly versions: readonly LayoutVersion[];
  readonly layout: RawDataLayout;
  /** Conditions on `interviews` (joined to `sampling_points`) that pick the interviews. */
  readonly where: SQL;
  readonly states: readonly InterviewStatus[];
}

/** Reads what a download needs to know before its first row. */
export async function rawDataSource(
  db: Executor,
  studyId: string,
  request: RawDataRequest,
): Promise<RawDataSource> {
  const [study] = await db
    .select({ id: studies.id, name: studies.name, currency: studies.currency })
    .from(studies)
    .where(eq(studies.id, studyId));
  if (!study) throw notFound('That study');
  // Interviews point only at published versions, which never change.
  const rows = await db
    .select({
      id: questionnaireVersions.id,
      number: questionnaireVersions.version,
      definition: questionnaireVersions.definition,
    })
    .from(questionnaireVersions)
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .where(and(eq(questionnaires.studyId, studyId), isNotNull(questionnaireVersions.publishedAt)))
    .orderBy(asc(questionnaireVersions.version));
  const versions = rows.map((row) => ({
    id: row.id,
    number: row.number,
    blocks: (row.definition as { blocks?: Block[] }).blocks ?? [],
  }));
  const digits = minorUnitDigits(study.currency);
  const states = request.states?.length ? request.states : interviewStatuses;
  const where = and(
    eq(interviews.studyId, studyId),
    inArray(interviews.status, [...states]),
    ...interviewFilterConditions(request.filter),
  )!;
  return {
    study,
    digits,
    versions,
    layout: rawDataLayout(versions, study.currency, digits, request.weighting !== undefined),
    where,
    states,
  };
}

const dialect = new PgDialect({ casing: 'snake_case' });

/** SQL text and parameters of a drizzle `sql` fragment, for a cursor outside drizzle. */
export function compiled(query: SQL): { text: string; values: unknown[] } {
  const { sql: text, params } = dialect.sqlToQuery(query);
  return { text, values: params };
}

/**
 * One row per interview with everything a download shows: its facts, route, point and
 * enumerator names, answers, and the stored photos' object keys (id → key).
 */
export function interviewRowsQuery(where: SQL): SQL {
  return sql`
    SELECT interviews.id, interviews.questionnaire_version_id AS version_id, interviews.status,
      interviews.review_note, interviews.reviewed_at, interviews.route_id, routes.name AS route_name,
      interviews.point_id, sampling_points.code AS point_code, sampling_points.name AS point_name,
      sampling_points.stratum AS region, interviews.enumerator_id, users.name AS enumerator_name,
      interviews.started_at, interviews.finished_at, interviews.received_at, interviews.latitude,
      interviews.longitude, interviews.gps_accuracy_m, interviews.flags, interviews.photo_count,
      interviews.answers,
      (SELECT coalesce(json_object_agg(p.id, p.object_key), '{}'::json) FROM interview_photos p
        WHERE p.interview_id = interviews.id AND p.stored_at IS NOT NULL) AS photos
    FROM interviews
    LEFT JOIN sampling_points ON sampling_points.id = interviews.point_id
    LEFT JOIN routes ON routes.id = interviews.route_id
    LEFT JOIN users ON users.id = interviews.enumerator_id
    WHERE ${where}
    ORDER BY interviews.id`;
}
