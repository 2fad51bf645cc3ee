import { and, asc, count, eq, sql } from 'drizzle-orm';
import type { ReviewQueue, ReviewQueueQuery } from '@shared/field-sync/review-queue';
import type { Executor } from '../db/database';
import { interviews, routes, samplingPoints, users } from '../db/schema';
import { reviewJoins, reviewQueueColumns, toQueueItem } from './review-columns';

/** Flagged first (they need a decision), then received, returned, accepted, rejected. */
const statusOrder = sql`case ${interviews.status}
  when 'flagged' then 0 when 'received' then 1 when 'returned' then 2
  when 'accepted' then 3 else 4 end`;

/**
 * A page of the study's review queue with the filters applied, oldest first within a status,
 * and how many interviews match in all.
 */
export async function reviewQueue(
  db: Executor,
  studyId: string,
  query: ReviewQueueQuery,
): Promise<ReviewQueue> {
  const where = and(
    eq(interviews.studyId, studyId),
    query.status === undefined ? undefined : eq(interviews.status, query.status),
    query.flag === undefined
      ? undefined
      : sql`${interviews.flags} @> ${JSON.stringify([{ kind: query.flag }])}::jsonb`,
    query.routeId === undefined ? undefined : eq(interviews.routeId, query.routeId),
    query.enumeratorId === undefined ? undefined : eq(interviews.enumeratorId, query.enumeratorId),
  );
  const [rows, [total]] = await Promise.all([
    db
      .select(reviewQueueColumns)
      .from(interviews)
      .leftJoin(users, reviewJoins.enumerator)
      .leftJoin(routes, reviewJoins.route)
      .leftJoin(samplingPoints, reviewJoins.point)
      .where(where)
      .orderBy(statusOrder, asc(interviews.receivedAt), asc(interviews.id))
      .limit(query.limit)
      .offset(query.offset),
    db.select({ n: count() }).from(interviews).where(where),
  ]);
  return { items: rows.map(toQueueItem), total: total.n };
}
