import { sql } from 'drizzle-orm';
import type { InterviewStatus } from '@shared/interviews/interview-status';
import type { PhotoContentType, PhotoManifestEntry } from '@shared/field-sync/photo-manifest';
import { anyOf } from '../db/any-of';
import type { Executor } from '../db/database';
import { preparedPerExecutor } from '../db/prepared-per-executor';
import { interviewPhotos, interviews } from '../db/schema';
import { contentFingerprint } from './interview-content';

/** A stored interview whose id a batch reuses, and what it holds. */
export interface ExistingInterview {
  id: string;
  studyId: string;
  enumeratorId: string | null;
  status: InterviewStatus;
  reviewedAt: Date | null;
  fingerprint: string;
}

/** The stored interviews with these ids, with their photo lists, keyed by id. */
export async function loadExistingInterviews(
  db: Executor,
  ids: readonly string[],
): Promise<Map<string, ExistingInterview>> {
  const found = new Map<string, ExistingInterview>();
  if (ids.length === 0) return found;
  const rows = await interviewsById(db).execute({ ids });
  if (rows.length === 0) return found;
  const photos = await photosOfInterviews(db).execute({ ids: rows.map((row) => row.id) });
  for (const row of rows) {
    const manifest: PhotoManifestEntry[] = photos
      .filter((photo) => photo.interviewId === row.id)
      .map((photo) => ({
        photoId: photo.id,
        sha256: photo.sha256,
        byteSize: photo.byteSize,
        contentType: photo.contentType as PhotoContentType,
      }));
    const fix =
      row.latitude !== null && row.longitude !== null
        ? { latitude: row.latitude, longitude: row.longitude, accuracyM: row.gpsAccuracyM ?? 0 }
        : null;
    const fingerprint = contentFingerprint({
      studyId: row.studyId,
      questionnaireVersionId: row.questionnaireVersionId,
      routeId: row.routeId,
      pointId: row.pointId,
      startedAt: row.startedAt.getTime(),
      finishedAt: row.finishedAt.getTime(),
      answers: row.answers,
      fix,
      respondentKey: row.respondentKey,
      photos: manifest,
    });
    const { id, studyId, enumeratorId, status, reviewedAt } = row;
    found.set(id, { id, studyId, enumeratorId, status, reviewedAt, fingerprint });
  }
  return found;
}

/** Which interview each of these photo ids already belongs to. */
export async function loadPhotoOwners(
  db: Executor,
  photoIds: readonly string[],
): Promise<Map<string, string>> {
  if (photoIds.length === 0) return new Map();
  const rows = await photoOwners(db).execute({ ids: photoIds });
  return new Map(rows.map((row) => [row.id, row.interviewId]));
}

const interviewsById = preparedPerExecutor((db) =>
  db
    .select()
    .from(interviews)
    .where(anyOf(interviews.id, sql.placeholder('ids'), 'uuid'))
    .prepare('field_sync_interviews_by_id'),
);

const photosOfInterviews = preparedPerExecutor((db) =>
  db
    .select()
    .from(interviewPhotos)
    .where(anyOf(interviewPhotos.interviewId, sql.placeholder('ids'), 'uuid'))
    .prepare('field_sync_photos_of_interviews'),
);

const photoOwners = preparedPerExecutor((db) =>
  db
    .select({ id: interviewPhotos.id, interviewId: interviewPhotos.interviewId })
    .from(interviewPhotos)
    .where(anyOf(interviewPhotos.id, sql.placeholder('ids'), 'uuid'))
    .prepare('field_sync_photo_owners'),
);
