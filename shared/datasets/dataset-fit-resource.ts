import { z } from 'zod';
import { fitStatuses } from '../analysis/fit-status';
import { demandFitSchema } from '../estimation/least-squares/demand-fit';
import { datasetFitSpecSchema, fixedEffectMethods } from './dataset-fit-spec';

/** What a dataset fit stores: the demand fit, how it was made, and the data it ran on. */
export const datasetFitResultSchema = z.object({
  fit: demandFitSchema,
  /** (Weighted) means of the regressors as they entered (logs, dummies): the curve's point. */
  regressorMeans: z.record(z.string(), z.number()),
  fixedEffectMethod: z.enum(fixedEffectMethods),
  dataset: z.object({
    id: z.uuid(),
    name: z.string(),
    contentHash: z.string(),
    rowCount: z.number(),
  }),
  /** Where the fit ran: the rows never left the database. */
  engine: z.literal('in-database'),
});
export type DatasetFitResult = z.infer<typeof datasetFitResultSchema>;

export const datasetFitResourceSchema = z.object({
  id: z.uuid(),
  studyId: z.uuid(),
  datasetId: z.uuid().nullable(),
  spec: datasetFitSpecSchema,
  status: z.enum(fitStatuses),
  progress: z.number(),
  result: datasetFitResultSchema.nullable(),
  error: z
    .object({ code: z.string(), message: z.string(), field: z.string().nullable() })
    .nullable(),
  dataHash: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type DatasetFitResource = z.infer<typeof datasetFitResourceSchema>;
