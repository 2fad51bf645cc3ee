import { z } from 'zod';
import { storableInstant } from '../../storable/storable-instant';
import { isNumberBetween, isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Location: the device's GPS fix where the interview happens. `targetAccuracyMetres` is what
 * the device waits for before offering to record; a worse fix is still kept, with its accuracy,
 * for quality checks to weigh.
 */
export const locationBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('location'),
  targetAccuracyMetres: z.int('Whole metres').min(5, 'At least 5 m').max(5000, 'At most 5000 m'),
});
export type LocationBlock = z.infer<typeof locationBlockSchema>;

const fixTimeSchema = storableInstant('The time of the fix');

/** A GPS fix: position, its accuracy in metres, and when it was taken. */
export function locationAnswerSchema(_block: LocationBlock) {
  return z.strictObject({
    latitude: z
      .number()
      .min(-90, 'Latitude runs from −90 to 90')
      .max(90, 'Latitude runs from −90 to 90'),
    longitude: z
      .number()
      .min(-180, 'Longitude runs from −180 to 180')
      .max(180, 'Longitude runs from −180 to 180'),
    accuracyMetres: z.number().finite().nonnegative('Accuracy cannot be negative'),
    capturedAt: fixTimeSchema,
  });
}
export type LocationAnswer = z.infer<ReturnType<typeof locationAnswerSchema>>;

const locationKeys = ['latitude', 'longitude', 'accuracyMetres', 'capturedAt'];

/** The quick test of a location answer (see `answerFitsFor`). */
export function locationAnswerFits(_block: LocationBlock) {
  return (answer: unknown) =>
    isRecordWith(answer, locationKeys) &&
    isNumberBetween(answer['latitude'], -90, 90) &&
    isNumberBetween(answer['longitude'], -180, 180) &&
    isNumberBetween(answer['accuracyMetres'], 0, Infinity) &&
    fixTimeSchema.safeParse(answer['capturedAt']).success;
}
