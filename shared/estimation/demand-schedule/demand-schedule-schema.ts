import { z } from 'zod';

/** One price of a published demand schedule. */
export const demandScheduleRowSchema = z.object({
  price: z.number().finite().nonnegative(),
  /** Predicted quantity, or purchase share in [0, 1]. */
  quantity: z.number().finite(),
  /** Confidence band; null where the model gives none. */
  ciLow: z.number().finite().nullable(),
  ciHigh: z.number().finite().nullable(),
  /** price × quantity (per potential buyer when the quantity is a share). */
  revenue: z.number().finite(),
  /** Point price elasticity; null for a step curve or where the quantity is 0. */
  elasticity: z.number().finite().nullable(),
  /** True outside the range of prices the model was fitted on. */
  extrapolated: z.boolean(),
});

/**
 * A demand schedule: the input of every published report. Prices strictly increase, and a band,
 * where present, contains the prediction.
 */
export const demandScheduleSchema = z
  .object({
    method: z.string().min(1),
    quantityKind: z.enum(['quantity', 'share']),
    n: z.number().int().positive(),
    confidenceLevel: z.number().gt(0).lt(1),
    observedPriceRange: z.object({ min: z.number().finite(), max: z.number().finite() }),
    rows: z.array(demandScheduleRowSchema).min(1),
    assumptions: z.array(z.string()),
  })
  .superRefine((schedule, ctx) => {
    schedule.rows.forEach((row, i) => {
      if (i > 0 && !(row.price > schedule.rows[i - 1].price)) {
        ctx.addIssue({
          code: 'custom',
          path: ['rows', i, 'price'],
          message: 'prices must strictly increase',
        });
      }
      if ((row.ciLow === null) !== (row.ciHigh === null)) {
        ctx.addIssue({
          code: 'custom',
          path: ['rows', i, 'ciLow'],
          message: 'give both ends of the band or neither',
        });
      }
      if (
        row.ciLow !== null &&
        row.ciHigh !== null &&
        !(row.ciLow <= row.quantity && row.quantity <= row.ciHigh)
      ) {
        ctx.addIssue({
          code: 'custom',
          path: ['rows', i, 'ciLow'],
          message: 'the band must contain the prediction',
        });
      }
    });
  });

export type DemandScheduleRow = z.infer<typeof demandScheduleRowSchema>;
export type DemandSchedule = z.infer<typeof demandScheduleSchema>;
