import { asc, eq, sql } from 'drizzle-orm';
import type { AnyPgColumn } from 'drizzle-orm/pg-core';
import type { ReviewFacets } from '@shared/field-sync/review-queue';
import type { Executor } from '../db/database';
import { interviews, routes, samplingPoints, users } from '../db/schema';

/** Interviews of the study, one row per distinct value of a column (an index scan each). */
const ofStudy = (studyId: string, column: AnyPgColumn) =>
  sql`(select distinct ${column} from ${interviews} where ${interviews.studyId} = ${studyId})`;

/** The people and routes that occur among a study's interviews, and the study's points, by name. */
export async function reviewFacets(db: Executor, studyId: string): Promise<ReviewFacets> {
  const [enumerators, routeRows, points] = await Promise.all([
    db
      .select({ id: users.id, name: users.name })
      .from(users)
      .where(sql`${users.id} in ${ofStudy(studyId, interviews.enumeratorId)}`)
      .orderBy(asc(users.name), asc(users.id)),
    db
      .select({ id: routes.id, name: routes.name })
      .from(routes)
      .where(sql`${routes.id} in ${ofStudy(studyId, interviews.routeId)}`)
      .orderBy(asc(routes.name), asc(routes.id)),
    db
      .select({ id: samplingPoints.id, code: samplingPoints.code, name: samplingPoints.name })
      .from(samplingPoints)
      .where(eq(samplingPoints.studyId, studyId))
      .orderBy(asc(samplingPoints.code), asc(samplingPoints.id)),
  ]);
  return { enumerators, routes: routeRows, points };
}
