import { z } from 'zod';

/** One estimated coefficient with its standard error, t statistic and confidence interval. */
export const coefficientRowSchema = z.object({
  /** The regressor's column name, or '(intercept)'. */
  term: z.string(),
  estimate: z.number(),
  stdError: z.number(),
  /** null when the standard error is exactly zero (a perfect fit). */
  tStatistic: z.number().nullable(),
  pValue: z.number().nullable(),
  ciLow: z.number(),
  ciHigh: z.number(),
});
export type CoefficientRow = z.infer<typeof coefficientRowSchema>;

/** How the coefficient covariance was estimated. */
export const standardErrorSummarySchema = z.object({
  type: z.enum(['classical', 'hc1', 'cluster']),
  /** Factor applied to the sandwich (1 for classical). */
  smallSampleFactor: z.number(),
  /** Degrees of freedom of the t intervals. */
  df: z.number(),
  clusterColumn: z.string().optional(),
  clusters: z.number().int().optional(),
});
export type StandardErrorSummary = z.infer<typeof standardErrorSummarySchema>;

/** Result of a least-squares fit (OLS, WLS, 2SLS, or a solve from cross-products). */
export const linearFitSchema = z.object({
  n: z.number().int(),
  parameters: z.number().int(),
  dfResidual: z.number().int(),
  response: z.string(),
  intercept: z.boolean(),
  weighted: z.boolean(),
  coefficients: z.array(coefficientRowSchema),
  /** Coefficient covariance, rows and columns in the order of `coefficients`. */
  covariance: z.array(z.array(z.number())),
  standardErrors: standardErrorSummarySchema,
  confidenceLevel: z.number(),
  /** Centred with an intercept; uncentred (1 − RSS/Σy²) without one. */
  rSquared: z.number(),
  adjustedRSquared: z.number(),
  rSquaredKind: z.enum(['centred', 'uncentred']),
  /** Test that every coefficient but the intercept is zero; null when it does not exist. */
  fStatistic: z.number().nullable(),
  fDf: z.tuple([z.number(), z.number()]).nullable(),
  /** 'anova' = classical mean-square ratio; 'wald' = robust Wald statistic divided by q. */
  fTest: z.enum(['anova', 'wald']),
  residualSD: z.number(),
  residualSumOfSquares: z.number(),
  /** Scaled condition number of the design (see solveLeastSquares). */
  conditionNumber: z.number(),
  assumptions: z.array(z.string()),
});
export type LinearFit = z.infer<typeof linearFitSchema>;
