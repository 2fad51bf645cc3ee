import { and, asc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import type { InterviewFilter } from '@shared/analysis/interview-filter';
import type { Block } from '@shared/questionnaire/block';
import type { Executor } from '../db/database';
import { interviews, questionnaireVersions, samplingPoints, studies } from '../db/schema';
import { notFound } from '../http/http-error';
import type { AnalysisInterview } from './analysis-interview';
import type { FitInput } from './run-fit';

/**
 * The accepted interviews of a study that the filters match (in interview-id order, with the
 * blocks of the questionnaire version each was taken with), and the study's currency.
 */
export async function loadFitInput(
  db: Executor,
  studyId: string,
  filter: InterviewFilter,
): Promise<FitInput> {
  const [study] = await db
    .select({ currency: studies.currency })
    .from(studies)
    .where(eq(studies.id, studyId));
  if (!study) throw notFound('That study');
  const rows = await db
    .select({
      id: interviews.id,
      finishedAt: interviews.finishedAt,
      routeId: interviews.routeId,
      pointId: interviews.pointId,
      region: samplingPoints.stratum,
      answers: interviews.answers,
      versionId: interviews.questionnaireVersionId,
    })
    .from(interviews)
    .leftJoin(samplingPoints, eq(samplingPoints.id, interviews.pointId))
    .where(and(...conditions(studyId, filter)))
    .orderBy(asc(interviews.id));
  const blocks = await versionBlocks(db, [...new Set(rows.map((r) => r.versionId))]);
  const matched: AnalysisInterview[] = rows.map((row) => ({
    id: row.id,
    finishedAt: row.finishedAt.toISOString(),
    routeId: row.routeId,
    pointId: row.pointId,
    region: row.region,
    answers: (row.answers ?? {}) as Record<string, unknown>,
    blocks: blocks.get(row.versionId) ?? [],
  }));
  return { interviews: matched, currency: study.currency };
}

function conditions(studyId: string, filter: InterviewFilter): SQL[] {
  const where: SQL[] = [eq(interviews.studyId, studyId), eq(interviews.status, 'accepted')];
  const day = sql`(${interviews.finishedAt} at time zone 'UTC')::date`;
  if (filter.from) where.push(sql`${day} >= ${filter.from}::date`);
  if (filter.to) where.push(sql`${day} <= ${filter.to}::date`);
  if (filter.routeIds?.length) where.push(inArray(interviews.routeId, filter.routeIds));
  if (filter.regions?.length) where.push(inArray(samplingPoints.stratum, filter.regions));
  if (filter.flagged === 'exclude') where.push(sql`${interviews.flags} = '[]'::jsonb`);
  return where;
}

async function versionBlocks(db: Executor, ids: string[]): Promise<Map<string, Block[]>> {
  if (ids.length === 0) return new Map();
  const versions = await db
    .select({ id: questionnaireVersions.id, definition: questionnaireVersions.definition })
    .from(questionnaireVersions)
    .where(inArray(questionnaireVersions.id, ids));
  // Definitions were validated when they were stored; published ones cannot change since.
  return new Map(versions.map((v) => [v.id, (v.definition as { blocks?: Block[] }).blocks ?? []]));
}
