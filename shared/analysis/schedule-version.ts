import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { analysisMethods } from './analysis-method';
import { fitScheduleSchema, weightingSummarySchema } from './fit-result';
import { fitSpecSchema } from './fit-spec';

/** Shown on every schedule, download and report (PRODUCT.md, "Privacy and care"). */
export const estimateCaution =
  'Every figure in this schedule is an estimate from a sample, shown with its interval; it is not ' +
  'advice. Pricing essential goods (water, energy, medicine) touches people’s welfare: take the ' +
  'usual care, and follow local consumer-protection and competition rules and the ethics review ' +
  'that applies to the study.';

/** A published version in lists: who, what and when, without its rows. */
export const scheduleVersionSummarySchema = z.object({
  id: z.uuid(),
  studyId: z.uuid(),
  studyName: z.string(),
  productName: z.string(),
  version: z.int().positive(),
  title: z.string(),
  /** The version this one corrects, if any. */
  replacesId: z.uuid().nullable(),
  /** The version that corrects this one, if any (then this one is superseded). */
  replacedById: z.uuid().nullable(),
  fitId: z.uuid(),
  method: z.enum(analysisMethods),
  methodLabel: z.string(),
  currency: z.string(),
  n: z.int().positive(),
  dataHash: z.string(),
  publishedAt: z.iso.datetime({ offset: true }),
  publishedByName: z.string(),
});
export type ScheduleVersionSummary = z.infer<typeof scheduleVersionSummarySchema>;

/**
 * A published demand schedule version: the price grid with predicted quantity or purchase
 * share, its band, revenue and elasticity, how many respondents each cell rests on, the method,
 * the specification, n and the data hash. It never changes.
 */
export const scheduleVersionSchema = scheduleVersionSummarySchema.extend({
  ...fitScheduleSchema.shape,
  spec: fitSpecSchema,
  weighting: weightingSummarySchema.nullable(),
  caution: z.string(),
});
export type ScheduleVersion = z.infer<typeof scheduleVersionSchema>;

/** The body of POST /api/studies/:studyId/schedules. */
export const publishScheduleRequestSchema = z.strictObject({
  fitId: z.uuid({ error: 'Choose a finished fit' }),
  title: storableText()
    .trim()
    .min(1, 'Give the schedule a title')
    .max(200, 'At most 200 characters'),
  replaces: z.uuid({ error: 'Name the version this corrects by its id' }).nullable().optional(),
});
export type PublishScheduleRequest = z.infer<typeof publishScheduleRequestSchema>;
