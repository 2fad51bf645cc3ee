import { z } from 'zod';
import { linearFitSchema } from './linear-fit';

/** Strength of the excluded instruments in one first-stage regression. */
export const firstStageSchema = z.object({
  /** The endogenous regressor this first stage predicts. */
  endogenous: z.string(),
  /** F (Wald/q, on the requested covariance) that all excluded instruments are zero. */
  fStatistic: z.number().nullable(),
  fDf: z.tuple([z.number(), z.number()]),
  coefficients: linearFitSchema.shape.coefficients,
});
export type FirstStage = z.infer<typeof firstStageSchema>;

/** A two-stage least-squares fit: the structural fit plus its first stages. */
export const instrumentalFitSchema = linearFitSchema.extend({
  instruments: z.array(z.string()),
  endogenous: z.array(z.string()),
  firstStages: z.array(firstStageSchema),
});
export type InstrumentalFit = z.infer<typeof instrumentalFitSchema>;
