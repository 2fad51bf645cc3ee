import { z } from 'zod';
import { questionnaireDefinitionSchema } from '../questionnaire/questionnaire-definition';
import { gpsFixSchema } from './field-interview';
import { photoContentTypes } from './photo-manifest';
import { reviewQueueItemSchema } from './review-queue';

/** A photo of an interview; `url` is the API path that serves the stored image (null until stored). */
export const interviewPhotoSchema = z.object({
  photoId: z.uuid(),
  contentType: z.enum(photoContentTypes),
  byteSize: z.number().int(),
  sha256: z.string(),
  stored: z.boolean(),
  url: z.string().nullable(),
});
export type InterviewPhoto = z.infer<typeof interviewPhotoSchema>;

/**
 * `GET /api/studies/:studyId/interviews/:interviewId`: the interview with its answers and the
 * questionnaire version they follow, its flags (GPS distance included), where the device was
 * and where the point is, its photos, and the last review.
 */
export const interviewDetailSchema = reviewQueueItemSchema.extend({
  questionnaireVersionId: z.uuid(),
  questionnaireTitle: z.string(),
  questionnaireVersion: z.number().int(),
  definition: questionnaireDefinitionSchema,
  answers: z.record(z.string(), z.unknown()),
  gps: gpsFixSchema.nullable(),
  pointPosition: z.object({ latitude: z.number(), longitude: z.number() }).nullable(),
  photos: z.array(interviewPhotoSchema),
  reviewNote: z.string().nullable(),
  reviewerName: z.string().nullable(),
});
export type InterviewDetail = z.infer<typeof interviewDetailSchema>;
