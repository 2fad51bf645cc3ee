import { z } from 'zod';
import { firstStageSchema } from './instrumental-fit';
import { linearFitSchema } from './linear-fit';

/** One elasticity of quantity with its interval. */
export const elasticitySchema = z.object({
  /** The regressor's column name. */
  term: z.string(),
  kind: z.enum(['own-price', 'income', 'cross-price', 'other']),
  estimate: z.number(),
  stdError: z.number(),
  ciLow: z.number(),
  ciHigh: z.number(),
  /** The regressor's value where it is evaluated (null when the elasticity is constant). */
  atValue: z.number().nullable(),
  /** The quantity used in the ratio (linear form only). */
  atQuantity: z.number().nullable(),
  /** 'coefficient' = a log-log coefficient; 'delta' = a function of β with a delta-method SE. */
  method: z.enum(['coefficient', 'delta']),
});
export type Elasticity = z.infer<typeof elasticitySchema>;

/** A fitted demand curve: the regression plus its elasticities. */
export const demandFitSchema = linearFitSchema.extend({
  form: z.enum(['linear', 'loglog', 'semilog']),
  /** Columns that entered as natural logarithms (the response included). */
  loggedColumns: z.array(z.string()),
  /** Base level left out per fixed-effect column. */
  fixedEffectBases: z.record(z.string(), z.string().nullable()),
  elasticities: z.array(elasticitySchema),
  instruments: z.array(z.string()).optional(),
  endogenous: z.array(z.string()).optional(),
  firstStages: z.array(firstStageSchema).optional(),
});
export type DemandFit = z.infer<typeof demandFitSchema>;
