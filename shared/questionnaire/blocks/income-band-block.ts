import { z } from 'zod';
import { nonNegativeMinorSchema } from '../../money/minor-amount';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';
import { choiceOptionSchema, requireDistinctOptions } from '../choice-option';

export const incomePeriods = ['week', 'month', 'year'] as const;

/** One income band: a stored value, a label, and its lower (and upper) bound in minor units. */
export const incomeBandSchema = choiceOptionSchema.extend({
  fromMinor: nonNegativeMinorSchema,
  toMinor: nonNegativeMinorSchema.optional(),
});
export type IncomeBand = z.infer<typeof incomeBandSchema>;

/**
 * Income band: household income per `period`, as one of increasing, non-overlapping bands
 * (the last may be open-ended), so analyses can use a band's midpoint as income. With
 * `allowDecline` the respondent may decline to say.
 */
export const incomeBandBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('income-band'),
    period: z.enum(incomePeriods, { error: 'Choose week, month or year' }),
    bands: z.array(incomeBandSchema).min(2, 'Offer at least two bands').max(20, 'At most 20 bands'),
    allowDecline: z.boolean({ error: 'Say whether the respondent may decline' }),
  })
  .superRefine((block, ctx) => {
    requireDistinctOptions(block.bands, 'bands', ctx);
    block.bands.forEach((band, i) => {
      const at = (field: string) => ['bands', i, field];
      const last = i === block.bands.length - 1;
      if (band.toMinor === undefined && !last) {
        ctx.addIssue({
          code: 'custom',
          path: at('toMinor'),
          message: 'Only the last band may be open-ended',
        });
      }
      if (band.toMinor !== undefined && band.toMinor <= band.fromMinor) {
        ctx.addIssue({
          code: 'custom',
          path: at('toMinor'),
          message: `Band ${i + 1} must end above where it starts`,
        });
      }
      const previousEnd = block.bands[i - 1]?.toMinor;
      if (previousEnd !== undefined && band.fromMinor < previousEnd) {
        ctx.addIssue({
          code: 'custom',
          path: at('fromMinor'),
          message: `Band ${i + 1} overlaps band ${i}`,
        });
      }
    });
  });
export type IncomeBandBlock = z.infer<typeof incomeBandBlockSchema>;

/** One of the band values, or null when the respondent declined (only if allowed). */
export function incomeBandAnswerSchema(block: IncomeBandBlock) {
  const values = block.bands.map((b) => b.value);
  const band = z.string().refine((value) => values.includes(value), {
    error: `Choose one of: ${values.join(', ')}`,
  });
  return z.strictObject({ band: block.allowDecline ? band.nullable() : band });
}
export interface IncomeBandAnswer {
  band: string | null;
}

const incomeBandKeys = ['band'];

/** The quick test of an income-band answer (see `answerFitsFor`). */
export function incomeBandAnswerFits(block: IncomeBandBlock) {
  const values = new Set(block.bands.map((b) => b.value));
  return (answer: unknown) => {
    if (!isRecordWith(answer, incomeBandKeys)) return false;
    const band = answer['band'];
    if (band === null) return block.allowDecline;
    return typeof band === 'string' && values.has(band);
  };
}
