import { and, desc, eq, inArray } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { FieldNotice } from '@shared/field-sync/field-notice';
import type { PhotoContentType } from '@shared/field-sync/photo-manifest';
import type { Executor } from '../db/database';
import { interviewPhotos, interviews, samplingPoints, studies, users } from '../db/schema';

const reviewer = alias(users, 'reviewer');

/**
 * The enumerator's interviews that a supervisor returned or rejected, newest review first, with
 * the note and — for correcting a returned one — what the server holds of it.
 */
export async function fieldNotices(db: Executor, enumeratorId: string): Promise<FieldNotice[]> {
  const rows = await db
    .select({
      interview: interviews,
      studyName: studies.name,
      pointName: samplingPoints.name,
      reviewerName: reviewer.name,
    })
    .from(interviews)
    .innerJoin(studies, eq(studies.id, interviews.studyId))
    .leftJoin(samplingPoints, eq(samplingPoints.id, interviews.pointId))
    .leftJoin(reviewer, eq(reviewer.id, interviews.reviewedBy))
    .where(
      and(
        eq(interviews.enumeratorId, enumeratorId),
        inArray(interviews.status, ['returned', 'rejected']),
      ),
    )
    .orderBy(desc(interviews.reviewedAt));
  const photos =
    rows.length === 0
      ? []
      : await db
          .select()
          .from(interviewPhotos)
          .where(
            inArray(
              interviewPhotos.interviewId,
              rows.map((row) => row.interview.id),
            ),
          );
  return rows.map(({ interview: row, studyName, pointName, reviewerName }) => ({
    interviewId: row.id,
    status: row.status as 'returned' | 'rejected',
    note: row.reviewNote ?? '',
    reviewedAt: (row.reviewedAt ?? row.receivedAt).toISOString(),
    reviewerName,
    studyId: row.studyId,
    studyName,
    routeId: row.routeId,
    pointId: row.pointId,
    pointName,
    questionnaireVersionId: row.questionnaireVersionId,
    startedAt: row.startedAt.toISOString(),
    finishedAt: row.finishedAt.toISOString(),
    answers: row.answers as Record<string, unknown>,
    gps:
      row.latitude !== null && row.longitude !== null
        ? { latitude: row.latitude, longitude: row.longitude, accuracyM: row.gpsAccuracyM ?? 0 }
        : null,
    respondentKey: row.respondentKey,
    photos: photos
      .filter((photo) => photo.interviewId === row.id)
      .map((photo) => ({
        photoId: photo.id,
        sha256: photo.sha256,
        byteSize: photo.byteSize,
        contentType: photo.contentType as PhotoContentType,
      })),
  }));
}
