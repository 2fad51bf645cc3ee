import { z } from 'zod';

const priceRangeSchema = z.object({ min: z.number().finite(), max: z.number().finite() });
/**
 * The share at each knot of a tabulated curve in respondent resamples, one row per resample:
 * the curve's sampling spread, for its band and for intervals of figures read off it. Absent on
 * fits stored before it was computed, and when too many knots would make it too large.
 */
const resampledSharesSchema = z.array(z.array(z.number().min(0).max(1))).optional();
const covarianceSchema = z.array(z.array(z.number().finite()).length(2)).length(2);

const regressionShape = {
  /** Intercept with every covariate and fixed effect held at its sample (weighted) mean. */
  intercept: z.number().finite(),
  /** Coefficient on price (linear, semi-log) or on ln price (log-log: the elasticity). */
  priceCoefficient: z.number().finite(),
  /** Covariance of [intercept, priceCoefficient]. */
  covariance: covarianceSchema,
  /** Degrees of freedom of the t band; null for a normal band. */
  dfResidual: z.number().positive().nullable(),
  observedPriceRange: priceRangeSchema,
  n: z.int().positive(),
};

/**
 * A fitted demand curve as plain data, so the browser can rebuild it (see `fittedCurveFrom`) and
 * compute elasticities, optimal prices, surplus and policy effects from the same numbers the
 * server published.
 */
export const curveDescriptionSchema = z.discriminatedUnion('kind', [
  /** q = a + b·p */
  z.object({ kind: z.literal('linear'), ...regressionShape }),
  /** ln q = a + b·ln p */
  z.object({ kind: z.literal('loglog'), ...regressionShape }),
  /** ln q = a + b·p */
  z.object({ kind: z.literal('semilog'), ...regressionShape }),
  /** Purchase share 1/(1 + e^−(a + b·p)) of a price ladder. */
  z.object({
    kind: z.literal('logistic-share'),
    intercept: z.number().finite(),
    slope: z.number().finite(),
    covariance: covarianceSchema,
    observedPriceRange: priceRangeSchema,
    n: z.int().positive(),
  }),
  /** Share with WTP above the price, F(α − β·p), of a payment card or dichotomous choice. */
  z.object({
    kind: z.literal('wtp-model'),
    method: z.string(),
    distribution: z.enum(['normal', 'logistic']),
    alpha: z.number().finite(),
    beta: z.number().finite(),
    covariance: covarianceSchema,
    observedPriceRange: priceRangeSchema,
    n: z.int().positive(),
  }),
  /** Empirical share with stated WTP at or above each distinct amount (a step curve). */
  z.object({
    kind: z.literal('step-share'),
    points: z
      .array(z.object({ price: z.number().finite(), share: z.number().min(0).max(1) }))
      .min(1),
    resampledShares: resampledSharesSchema,
    observedPriceRange: priceRangeSchema,
    n: z.int().positive(),
  }),
  /** A piecewise-linear share (the Newton–Miller–Smith trial curve), 0 outside its knots. */
  z.object({
    kind: z.literal('piecewise-share'),
    prices: z.array(z.number().finite()).min(2),
    shares: z.array(z.number().finite()).min(2),
    resampledShares: resampledSharesSchema,
    observedPriceRange: priceRangeSchema,
    n: z.int().positive(),
  }),
]);
export type CurveDescription = z.infer<typeof curveDescriptionSchema>;
