import { eq, sql } from 'drizzle-orm';
import type { ReviewQueueItem } from '@shared/field-sync/review-queue';
import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { interviews, routes, samplingPoints, users } from '../db/schema';

/** The columns of a queue row: the interview, its people and places, and photos stored. */
export const reviewQueueColumns = {
  interview: interviews,
  enumeratorName: users.name,
  routeName: routes.name,
  pointCode: samplingPoints.code,
  pointName: samplingPoints.name,
  pointLatitude: samplingPoints.latitude,
  pointLongitude: samplingPoints.longitude,
  photosStored: sql<number>`(select count(*) from interview_photos p
    where p.interview_id = ${interviews.id} and p.stored_at is not null)::int`,
};

/** The joins those columns need. */
export const reviewJoins = {
  enumerator: eq(users.id, interviews.enumeratorId),
  route: eq(routes.id, interviews.routeId),
  point: eq(samplingPoints.id, interviews.pointId),
};

export interface ReviewRow {
  interview: typeof interviews.$inferSelect;
  enumeratorName: string | null;
  routeName: string | null;
  pointCode: string | null;
  pointName: string | null;
  photosStored: number;
}

/** One queue row as the API answers it. */
export function toQueueItem(row: ReviewRow): ReviewQueueItem {
  const { interview } = row;
  return {
    id: interview.id,
    status: interview.status,
    flags: interview.flags as QualityFlag[],
    enumerator:
      interview.enumeratorId && row.enumeratorName !== null
        ? { userId: interview.enumeratorId, name: row.enumeratorName }
        : null,
    route:
      interview.routeId && row.routeName !== null
        ? { id: interview.routeId, name: row.routeName }
        : null,
    point:
      interview.pointId && row.pointCode !== null && row.pointName !== null
        ? { id: interview.pointId, code: row.pointCode, name: row.pointName }
        : null,
    startedAt: interview.startedAt.toISOString(),
    finishedAt: interview.finishedAt.toISOString(),
    receivedAt: interview.receivedAt.toISOString(),
    durationSeconds: (interview.finishedAt.getTime() - interview.startedAt.getTime()) / 1000,
    photoCount: interview.photoCount,
    photosStored: row.photosStored,
    completeAt: interview.completeAt?.toISOString() ?? null,
    reviewedAt: interview.reviewedAt?.toISOString() ?? null,
  };
}
