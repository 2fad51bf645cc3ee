import { and, asc, count, desc, eq, gte, lt, lte, sql, type SQL } from 'drizzle-orm';
import { referenceIdRange } from '@shared/field-sync/reference-id-range';
import type {
  ReviewQueue,
  ReviewQueueQuery,
  ReviewQueueSort,
} from '@shared/field-sync/review-queue';
import type { Executor } from '../db/database';
import { interviews, routes, samplingPoints, users } from '../db/schema';
import { reviewJoins, reviewQueueColumns, toQueueItem } from './review-columns';

/** Flagged first (they need a decision), then received, returned, accepted, rejected. */
const statusOrder = sql`case ${interviews.status}
  when 'flagged' then 0 when 'received' then 1 when 'returned' then 2
  when 'accepted' then 3 else 4 end`;

/** Each order ends on the id, so pages never repeat or skip an interview. */
const orders: Record<ReviewQueueSort, SQL[]> = {
  'needs-decision': [statusOrder, asc(interviews.receivedAt), asc(interviews.id)],
  newest: [desc(interviews.finishedAt), desc(interviews.id)],
  oldest: [asc(interviews.finishedAt), asc(interviews.id)],
};

function nextDay(day: string): Date {
  const date = new Date(`${day}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + 1);
  return date;
}

/** The filters of a queue query as one condition on `interviews`. */
export function reviewQueueFilter(studyId: string, query: ReviewQueueQuery): SQL | undefined {
  const range = query.reference === undefined ? undefined : referenceIdRange(query.reference);
  return and(
    eq(interviews.studyId, studyId),
    query.status === undefined ? undefined : eq(interviews.status, query.status),
    query.flag === undefined
      ? undefined
      : sql`${interviews.flags} @> ${JSON.stringify([{ kind: query.flag }])}::jsonb`,
    query.routeId === undefined ? undefined : eq(interviews.routeId, query.routeId),
    query.pointId === undefined ? undefined : eq(interviews.pointId, query.pointId),
    query.enumeratorId === undefined ? undefined : eq(interviews.enumeratorId, query.enumeratorId),
    query.from === undefined
      ? undefined
      : gte(interviews.finishedAt, new Date(`${query.from}T00:00:00Z`)),
    query.to === undefined ? undefined : lt(interviews.finishedAt, nextDay(query.to)),
    range === undefined
      ? undefined
      : and(gte(interviews.id, range.lowest), lte(interviews.id, range.highest)),
  );
}

/** A page of the study's review queue with the filters and order applied, and the total. */
export async function reviewQueue(
  db: Executor,
  studyId: string,
  query: ReviewQueueQuery,
): Promise<ReviewQueue> {
  const where = reviewQueueFilter(studyId, query);
  const [rows, [total]] = await Promise.all([
    db
      .select(reviewQueueColumns)
      .from(interviews)
      .leftJoin(users, reviewJoins.enumerator)
      .leftJoin(routes, reviewJoins.route)
      .leftJoin(samplingPoints, reviewJoins.point)
      .where(where)
      .orderBy(...orders[query.sort ?? 'needs-decision'])
      .limit(query.limit)
      .offset(query.offset),
    db.select({ n: count() }).from(interviews).where(where),
  ]);
  return { items: rows.map(toQueueItem), total: total.n };
}
