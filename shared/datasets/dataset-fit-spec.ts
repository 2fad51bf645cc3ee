import { z } from 'zod';
import { demandForms } from '../analysis/fit-spec';
import { storedNameSchema } from './dataset-columns';

/** A covariate of a dataset fit: a stored numeric column and what it stands for. */
export const datasetCovariateSchema = z.strictObject({
  column: storedNameSchema,
  role: z.enum(['income', 'cross-price', 'other'], {
    error: 'Choose income, cross price or other',
  }),
});

/** Classical, HC1, or clustered on a stored grouping column. */
export const datasetStandardErrorsSchema = z.discriminatedUnion(
  'type',
  [
    z.strictObject({ type: z.literal('classical') }),
    z.strictObject({ type: z.literal('hc1') }),
    z.strictObject({ type: z.literal('cluster'), column: storedNameSchema }),
  ],
  { error: 'Choose classical, HC1 or clustered errors' },
);

/**
 * An observed-demand fit on a brought dataset, run where its rows are stored. Fixed effects
 * enter as dummies of each grouping's levels (base level dropped); an instrument makes the fit
 * two-stage least squares with the own price endogenous.
 */
export const datasetFitSpecSchema = z
  .strictObject({
    form: z.enum(demandForms, { error: 'Choose linear, log-log or semi-log' }),
    covariates: z.array(datasetCovariateSchema).max(20, 'At most 20 covariates'),
    fixedEffects: z.array(storedNameSchema).max(3, 'At most 3 fixed-effect groupings'),
    weighted: z.boolean(),
    standardErrors: datasetStandardErrorsSchema,
    instruments: z.array(storedNameSchema).max(5, 'At most 5 instruments'),
    confidenceLevel: z
      .number()
      .gt(0.5, 'Choose a level above 50 %')
      .lt(1, 'Choose a level below 100 %'),
  })
  .superRefine((spec, ctx) => {
    const covariates = spec.covariates.map((c) => c.column);
    covariates.forEach((column, i) => {
      if (covariates.indexOf(column) !== i)
        ctx.addIssue({
          code: 'custom',
          path: ['covariates', i, 'column'],
          message: `${column} is a covariate twice`,
        });
    });
    spec.instruments.forEach((column, i) => {
      if (covariates.includes(column))
        ctx.addIssue({
          code: 'custom',
          path: ['instruments', i],
          message: `${column} is already a covariate; an excluded instrument must be left out of the model`,
        });
    });
    spec.fixedEffects.forEach((column, i) => {
      if (spec.fixedEffects.indexOf(column) !== i)
        ctx.addIssue({
          code: 'custom',
          path: ['fixedEffects', i],
          message: `${column} is named twice`,
        });
    });
  });
export type DatasetFitSpec = z.infer<typeof datasetFitSpecSchema>;

export const datasetFitRequestSchema = z.strictObject({ spec: datasetFitSpecSchema });

/** How the fixed effects entered the model (said on every result). */
export const fixedEffectMethods = ['dummies'] as const;
