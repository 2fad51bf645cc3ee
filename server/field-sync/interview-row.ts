import type { PhotoManifestEntry } from '@shared/field-sync/photo-manifest';
import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { interviewFix } from '@shared/field-sync/quality/gps-far-flag';
import type { interviewPhotos, interviews } from '../db/schema';
import type { CheckedInterview } from './check-interview';
import { contentFingerprint } from './interview-content';

export type InterviewInsert = typeof interviews.$inferInsert;
export type PhotoInsert = typeof interviewPhotos.$inferInsert;

/** The fingerprint of a checked interview, comparable with a stored one's. */
export function fingerprintOf({ interview, version }: CheckedInterview): string {
  return contentFingerprint({
    studyId: interview.studyId,
    questionnaireVersionId: interview.questionnaireVersionId,
    routeId: interview.routeId,
    pointId: interview.pointId,
    startedAt: Date.parse(interview.startedAt),
    finishedAt: Date.parse(interview.finishedAt),
    answers: interview.answers,
    fix: interviewFix(interview.gps, version.definition.blocks, interview.answers),
    respondentKey: interview.respondentKey ?? null,
    photos: interview.photos,
  });
}

/**
 * The row of an accepted interview. The enumerator is the session's person, never the body's;
 * the fix is the interview's own or its location answer's; an interview without photos is
 * complete at once.
 */
export function interviewRow(
  checked: CheckedInterview,
  enumeratorId: string,
  flags: QualityFlag[],
  receivedAt: Date,
): InterviewInsert {
  const { interview, version } = checked;
  const fix = interviewFix(interview.gps, version.definition.blocks, interview.answers);
  return {
    id: interview.id,
    studyId: interview.studyId,
    questionnaireVersionId: interview.questionnaireVersionId,
    routeId: interview.routeId,
    pointId: interview.pointId,
    enumeratorId,
    status: flags.length > 0 ? 'flagged' : 'received',
    answers: interview.answers,
    flags,
    startedAt: new Date(interview.startedAt),
    finishedAt: new Date(interview.finishedAt),
    receivedAt,
    latitude: fix?.latitude ?? null,
    longitude: fix?.longitude ?? null,
    gpsAccuracyM: fix?.accuracyM ?? null,
    respondentKey: interview.respondentKey ?? null,
    photoCount: interview.photos.length,
    completeAt: interview.photos.length === 0 ? receivedAt : null,
  };
}

/** The photo rows an interview declares, waiting for their bytes. */
export function photoRows(
  interviewId: string,
  photos: readonly PhotoManifestEntry[],
): PhotoInsert[] {
  return photos.map((photo) => ({
    id: photo.photoId,
    interviewId,
    sha256: photo.sha256,
    byteSize: photo.byteSize,
    contentType: photo.contentType,
  }));
}
