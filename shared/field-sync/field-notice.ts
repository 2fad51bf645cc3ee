import { z } from 'zod';
import { gpsFixSchema } from './field-interview';
import { photoManifestEntrySchema } from './photo-manifest';

/**
 * An interview of the signed-in enumerator that a supervisor returned (to be corrected and sent
 * again with the same id) or rejected, with the supervisor's note. Returned ones carry what
 * the server holds, so a device that lost its copy can still correct it.
 */
export const fieldNoticeSchema = z.object({
  interviewId: z.uuid(),
  status: z.enum(['returned', 'rejected']),
  note: z.string(),
  reviewedAt: z.string(),
  reviewerName: z.string().nullable(),
  studyId: z.uuid(),
  studyName: z.string(),
  routeId: z.uuid().nullable(),
  pointId: z.uuid().nullable(),
  pointName: z.string().nullable(),
  questionnaireVersionId: z.uuid(),
  startedAt: z.string(),
  finishedAt: z.string(),
  answers: z.record(z.string(), z.unknown()),
  gps: gpsFixSchema.nullable(),
  respondentKey: z.string().nullable(),
  photos: z.array(photoManifestEntrySchema),
});
export type FieldNotice = z.infer<typeof fieldNoticeSchema>;

/** `GET /api/field/notices`: newest review first. */
export const fieldNoticesSchema = z.object({ notices: z.array(fieldNoticeSchema) });
export type FieldNotices = z.infer<typeof fieldNoticesSchema>;
