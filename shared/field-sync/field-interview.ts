import { z } from 'zod';
import { refuseUnstorableJson } from '../storable/storable-json';
import { storableInstant } from '../storable/storable-instant';
import { maxPhotosPerInterview, photoManifestEntrySchema } from './photo-manifest';

const instant = storableInstant;

/** The device's GPS fix for the whole interview, with its stated accuracy in metres. */
export const gpsFixSchema = z.strictObject({
  latitude: z
    .number({ error: 'Latitude is a number' })
    .min(-90, 'Latitude runs from −90 to 90')
    .max(90, 'Latitude runs from −90 to 90'),
  longitude: z
    .number({ error: 'Longitude is a number' })
    .min(-180, 'Longitude runs from −180 to 180')
    .max(180, 'Longitude runs from −180 to 180'),
  accuracyM: z.number().finite().nonnegative('Accuracy cannot be negative'),
});
export type GpsFix = z.infer<typeof gpsFixSchema>;

/**
 * One finished interview as the device sends it. The id is a UUID made on the device when the
 * interview starts and is the idempotency key of sync: the same interview sent twice is stored
 * once. The enumerator is never part of it — the server takes them from the session.
 *
 * - `answers`: keyed by block id, checked against the questionnaire version.
 * - `respondentKey`: a hash the device makes of what identifies a respondent (never a name),
 *   used only to spot the same respondent interviewed twice in a study.
 * - `photos`: every photo the answers refer to, declared before its bytes are uploaded.
 * - `returnedAt`: when correcting an interview a supervisor returned, the `reviewedAt` of that
 *   return (from the notice); lets an unchanged resubmission through.
 */
export const fieldInterviewSchema = z
  .strictObject({
    id: z.uuid({ error: 'The interview id must be a UUID made on the device' }),
    studyId: z.uuid({ error: 'The study id must be a UUID' }),
    questionnaireVersionId: z.uuid({ error: 'The questionnaire version id must be a UUID' }),
    routeId: z.uuid({ error: 'The route id must be a UUID' }),
    pointId: z.uuid({ error: 'The point id must be a UUID' }),
    startedAt: instant('The start'),
    finishedAt: instant('The end'),
    answers: z
      .record(z.string(), z.unknown(), { error: 'Answers are an object keyed by block id' })
      .superRefine(refuseUnstorableJson),
    gps: gpsFixSchema.optional(),
    respondentKey: z
      .string()
      .regex(/^[A-Za-z0-9_-]{16,128}$/, {
        error: 'The respondent key is a hash of 16–128 letters, digits, - or _ (never a name)',
      })
      .optional(),
    photos: z
      .array(photoManifestEntrySchema, { error: 'List the interview’s photos (or none)' })
      .max(maxPhotosPerInterview, `At most ${maxPhotosPerInterview} photos per interview`),
    returnedAt: instant('The return being answered').optional(),
  })
  .superRefine((interview, ctx) => {
    if (Date.parse(interview.finishedAt) < Date.parse(interview.startedAt)) {
      ctx.addIssue({
        code: 'custom',
        path: ['finishedAt'],
        message: 'The interview cannot end before it started',
      });
    }
    // Most interviews have no photo or one: no set to build for them.
    if (interview.photos.length > 1) {
      const seen = new Set<string>();
      interview.photos.forEach((photo, index) => {
        if (seen.has(photo.photoId)) {
          ctx.addIssue({
            code: 'custom',
            path: ['photos', index, 'photoId'],
            message: 'This photo is listed twice',
          });
        }
        seen.add(photo.photoId);
      });
    }
  });
export type FieldInterview = z.infer<typeof fieldInterviewSchema>;
