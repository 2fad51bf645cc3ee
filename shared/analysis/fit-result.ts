import { z } from 'zod';
import { demandScheduleRowSchema } from '../estimation/demand-schedule/demand-schedule-schema';
import { elasticitySchema } from '../estimation/least-squares/demand-fit';
import { analysisMethods } from './analysis-method';
import { curveDescriptionSchema } from './curve-description';

const finite = z.number().finite();

/** One estimated coefficient (regression, logit or WTP model) with its interval. */
export const fitCoefficientSchema = z.object({
  term: z.string(),
  estimate: finite,
  stdError: finite.nullable(),
  ciLow: finite.nullable(),
  ciHigh: finite.nullable(),
  pValue: finite.nullable(),
});
export type FitCoefficient = z.infer<typeof fitCoefficientSchema>;

/** A headline estimate (median WTP, revenue-maximising price…) with its interval where known. */
export const keyFigureSchema = z.object({
  label: z.string(),
  estimate: finite,
  ciLow: finite.nullable(),
  ciHigh: finite.nullable(),
  unit: z.enum(['price', 'share', 'quantity', 'elasticity', 'index', 'count']),
});
export type KeyFigure = z.infer<typeof keyFigureSchema>;

/** How a detail table's numbers are written: the analysis screens' kinds of figure. */
export const detailColumnUnits = [
  'price',
  'share',
  'quantity',
  'elasticity',
  'index',
  'count',
] as const;

/**
 * A method's own table (ladder steps, threshold curves…), ready to show as it is. Each column
 * may name its unit; fits stored before units were given show plain numbers. `plot: 'lines'`
 * asks for the other columns drawn as lines against the first (the threshold curves).
 */
export const detailTableSchema = z.object({
  title: z.string(),
  columns: z.array(z.string()),
  columnUnits: z.array(z.enum(detailColumnUnits)).optional(),
  plot: z.enum(['lines']).optional(),
  rows: z.array(z.array(z.union([finite, z.string(), z.null()]))),
});
export type DetailTable = z.infer<typeof detailTableSchema>;

/** What raking to the researcher's margins did to the sample. */
export const weightingSummarySchema = z.object({
  variables: z.array(z.string()),
  n: z.int(),
  designEffect: finite,
  effectiveSampleSize: finite,
  weightCv: finite,
  iterations: z.int(),
  maxMarginError: finite,
  minWeight: finite,
  maxWeight: finite,
});
export type WeightingSummary = z.infer<typeof weightingSummarySchema>;

/** A schedule row with the number of respondents the cell rests on (see `cellSupport`). */
export const scheduleRowSchema = demandScheduleRowSchema.extend({
  respondents: z.int().nonnegative(),
});
export type ScheduleRow = z.infer<typeof scheduleRowSchema>;

/** The demand schedule of a fit on its price grid, prices in major units of the currency. */
export const fitScheduleSchema = z.object({
  curveMethod: z.string(),
  quantityKind: z.enum(['quantity', 'share']),
  confidenceLevel: z.number().gt(0).lt(1),
  observedPriceRange: z.object({ min: finite, max: finite }),
  rows: z.array(scheduleRowSchema).min(1),
  assumptions: z.array(z.string()),
});
export type FitSchedule = z.infer<typeof fitScheduleSchema>;

/** Where an interview's answers were left out, and how often. */
export const skippedCountSchema = z.object({ reason: z.string(), count: z.int().positive() });

/**
 * Everything the analysis screens show about one finished fit. Prices are in major units of
 * `currency`; every estimate carries its interval where the method gives one.
 */
export const fitResultSchema = z.object({
  method: z.enum(analysisMethods),
  methodLabel: z.string(),
  blockIds: z.array(z.string()),
  currency: z.string(),
  /** Respondents (interviews) whose answers entered the fit. */
  n: z.int().nonnegative(),
  /** Rows the estimator saw (ladder answers, shelf observations…). */
  observations: z.int().nonnegative(),
  dataHash: z.string().regex(/^[0-9a-f]{64}$/),
  interviewsMatched: z.int().nonnegative(),
  skipped: z.array(skippedCountSchema),
  weighting: weightingSummarySchema.nullable(),
  coefficients: z.array(fitCoefficientSchema),
  fitStatistics: z.array(z.object({ label: z.string(), value: finite })),
  elasticities: z.array(elasticitySchema),
  keyFigures: z.array(keyFigureSchema),
  tables: z.array(detailTableSchema),
  /** Fitted vs residual on the model's scale (regression only), for the diagnostics plot. */
  residuals: z.array(z.object({ fitted: finite, residual: finite })),
  curve: curveDescriptionSchema.nullable(),
  schedule: fitScheduleSchema.nullable(),
  /** Why there is no curve or schedule, when there is none. */
  noScheduleReason: z.string().nullable(),
  warnings: z.array(z.string()),
  assumptions: z.array(z.string()),
});
export type FitResult = z.infer<typeof fitResultSchema>;
