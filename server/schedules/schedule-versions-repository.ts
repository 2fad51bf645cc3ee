import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { AnalysisMethod } from '@shared/analysis/analysis-method';
import type { FitSpec } from '@shared/analysis/fit-spec';
import {
  estimateCaution,
  type ScheduleVersion,
  type ScheduleVersionSummary,
} from '@shared/analysis/schedule-version';
import type { Executor } from '../db/database';
import { scheduleVersions } from '../db/schema';
import { notFound } from '../http/http-error';
import type { PublishedSchedule } from './published-schedule';

// The version that names this one as replaced (at most one: replaces_id is unique).
const successor = sql<string | null>`(
  select s.id from schedule_versions s where s.replaces_id = schedule_versions.id
)`;

function versionRows(db: Executor) {
  return db
    .select({ row: scheduleVersions, replacedById: successor })
    .from(scheduleVersions)
    .orderBy(asc(scheduleVersions.studyId), desc(scheduleVersions.version));
}

type VersionRow = Awaited<ReturnType<typeof versionRows>>[number];

function toSummary({ row, replacedById }: VersionRow): ScheduleVersionSummary {
  const schedule = row.schedule as PublishedSchedule;
  return {
    id: row.id,
    studyId: row.studyId,
    studyName: schedule.studyName,
    productName: schedule.productName,
    version: row.version,
    title: row.title,
    replacesId: row.replacesId,
    replacedById: replacedById ?? null,
    fitId: row.fitId,
    method: row.method as AnalysisMethod,
    methodLabel: schedule.methodLabel,
    currency: schedule.currency,
    n: row.n,
    dataHash: row.dataHash,
    publishedAt: row.publishedAt.toISOString(),
    publishedByName: row.publishedByName,
  };
}

function toVersion(found: VersionRow): ScheduleVersion {
  const schedule = found.row.schedule as PublishedSchedule;
  return {
    ...toSummary(found),
    curveMethod: schedule.curveMethod,
    quantityKind: schedule.quantityKind,
    confidenceLevel: schedule.confidenceLevel,
    observedPriceRange: schedule.observedPriceRange,
    rows: schedule.rows,
    assumptions: schedule.assumptions,
    spec: found.row.spec as FitSpec,
    weighting: schedule.weighting,
    caution: estimateCaution,
  };
}

/** Published versions of some studies, newest first within each study. */
export async function listVersions(
  db: Executor,
  studyIds: readonly string[],
): Promise<ScheduleVersionSummary[]> {
  if (studyIds.length === 0) return [];
  const rows = await versionRows(db).where(inArray(scheduleVersions.studyId, [...studyIds]));
  return rows.map(toSummary);
}

/** One version of a study (404 when it is another study's or does not exist). */
export async function findVersion(
  db: Executor,
  studyId: string,
  versionId: string,
): Promise<ScheduleVersion> {
  const [found] = await versionRows(db).where(
    and(eq(scheduleVersions.id, versionId), eq(scheduleVersions.studyId, studyId)),
  );
  if (!found) throw notFound('That schedule version');
  return toVersion(found);
}

/** One version among some studies (for the read API, whose caller may read several). */
export async function findVersionAmong(
  db: Executor,
  studyIds: readonly string[],
  versionId: string,
): Promise<ScheduleVersion> {
  if (studyIds.length === 0) throw notFound('That schedule version');
  const [found] = await versionRows(db).where(
    and(eq(scheduleVersions.id, versionId), inArray(scheduleVersions.studyId, [...studyIds])),
  );
  if (!found) throw notFound('That schedule version');
  return toVersion(found);
}
