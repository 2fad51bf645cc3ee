import { z } from 'zod';
import { blockIdSchema } from '../questionnaire/block-id';
import { interviewFilterSchema } from './interview-filter';
import { weightingSpecSchema } from './weighting-spec';

/** Prices of the schedule: `steps` equally spaced prices from `from` to `to`, in major units. */
export const priceGridSchema = z
  .strictObject({
    from: z
      .number({ error: 'Give the lowest price' })
      .finite()
      .nonnegative('Prices cannot be negative'),
    to: z.number({ error: 'Give the highest price' }).finite().positive('Must be above zero'),
    steps: z
      .int('A whole number of prices')
      .min(2, 'At least two prices')
      .max(200, 'At most 200 prices'),
  })
  .refine((grid) => grid.to > grid.from, {
    error: 'The highest price must be above the lowest',
    path: ['to'],
  });
export type PriceGridSpec = z.infer<typeof priceGridSchema>;

/** What every fit states, whatever its method. Money is in major units of the study currency. */
const commonShape = {
  /** The block to read; default the first block of the method's kind in each questionnaire. */
  blockId: blockIdSchema.optional(),
  filters: interviewFilterSchema,
  weighting: weightingSpecSchema.nullable(),
  priceGrid: priceGridSchema,
  unitCost: z.number().finite().nonnegative('A unit cost cannot be negative').nullable(),
  confidenceLevel: z
    .number()
    .gt(0.5, 'Choose a level above 50 %')
    .lt(1, 'Choose a level below 100 %'),
};

export const demandForms = ['linear', 'loglog', 'semilog'] as const;
export const regressionCovariates = ['income', 'household-size'] as const;
export const standardErrorTypes = ['classical', 'hc1', 'cluster-point'] as const;
export const instrumentChoices = ['none', 'peer-price'] as const;

/**
 * Least squares on observed prices and quantities. `source` picks shelf observations (price per
 * pack unit, units sold per 30 days) or purchase recall (price paid, units per 30 days).
 * `peer-price` instruments the own price with the mean price at the other points of the same
 * region (two-stage least squares); `cluster-point` clusters standard errors by sampling point.
 */
export const observedPricesSpecSchema = z.strictObject({
  method: z.literal('observed-prices'),
  ...commonShape,
  source: z.enum(['shelf', 'recall'], { error: 'Choose shelf observations or purchase recall' }),
  form: z.enum(demandForms, { error: 'Choose linear, log-log or semi-log' }),
  covariates: z.array(z.enum(regressionCovariates)).max(2),
  regionEffects: z.boolean(),
  standardErrors: z.enum(standardErrorTypes, { error: 'Choose classical, HC1 or clustered' }),
  instrument: z.enum(instrumentChoices),
});

export const priceLadderSpecSchema = z.strictObject({
  method: z.literal('price-ladder'),
  ...commonShape,
});

export const priceThresholdsSpecSchema = z.strictObject({
  method: z.literal('price-thresholds'),
  ...commonShape,
});

/** Percentile bootstrap of mean and median WTP; the seed makes a re-run give the same interval. */
export const wtpOpenSpecSchema = z.strictObject({
  method: z.literal('wtp-open'),
  ...commonShape,
  bootstrap: z.strictObject({
    replicates: z.int().min(100, 'At least 100 resamples').max(20000, 'At most 20000 resamples'),
    seed: z
      .int()
      .min(0)
      .max(2 ** 32 - 1),
  }),
});

export const paymentCardSpecSchema = z.strictObject({
  method: z.literal('payment-card'),
  ...commonShape,
  distribution: z.enum(['normal', 'logistic'], { error: 'Choose normal or logistic' }),
});

/** Single- or double-bounded follows from how the block was asked. */
export const dichotomousChoiceSpecSchema = z.strictObject({
  method: z.literal('dichotomous-choice'),
  ...commonShape,
});

/** Everything that defines a fit: the data, the method, its options and the schedule's grid. */
export const fitSpecSchema = z.discriminatedUnion('method', [
  observedPricesSpecSchema,
  priceLadderSpecSchema,
  priceThresholdsSpecSchema,
  wtpOpenSpecSchema,
  paymentCardSpecSchema,
  dichotomousChoiceSpecSchema,
]);
export type FitSpec = z.infer<typeof fitSpecSchema>;
export type FitSpecOf<M extends FitSpec['method']> = Extract<FitSpec, { method: M }>;

/** The body of POST /api/studies/:studyId/fits. */
export const fitRequestSchema = z.strictObject({ spec: fitSpecSchema });
export type FitRequest = z.infer<typeof fitRequestSchema>;

/** The seed a new open-WTP fit starts from unless the researcher changes it. */
export const defaultBootstrap = { replicates: 2000, seed: 20240917 } as const;
