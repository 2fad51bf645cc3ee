import { z } from 'zod';
import { fitResultSchema } from './fit-result';
import { fitSpecSchema } from './fit-spec';
import { fitStatuses } from './fit-status';

/** Why a fit failed, in words for the researcher, with the engine's code and the field at fault. */
export const fitErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  field: z.string().nullable(),
});
export type FitError = z.infer<typeof fitErrorSchema>;

/** A fit as GET /api/studies/:studyId/fits/:fitId returns it. */
export const fitResourceSchema = z.object({
  id: z.uuid(),
  studyId: z.uuid(),
  spec: fitSpecSchema,
  status: z.enum(fitStatuses),
  progress: z.int().min(0).max(100),
  result: fitResultSchema.nullable(),
  error: fitErrorSchema.nullable(),
  dataHash: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  startedAt: z.iso.datetime({ offset: true }).nullable(),
  finishedAt: z.iso.datetime({ offset: true }).nullable(),
});
export type FitResource = z.infer<typeof fitResourceSchema>;

/** A fit in the list: everything but the (large) result. */
export const fitSummarySchema = fitResourceSchema.omit({ result: true }).extend({
  n: z.int().nullable(),
  hasSchedule: z.boolean(),
});
export type FitSummary = z.infer<typeof fitSummarySchema>;

/** The answer to POST /api/studies/:studyId/fits. */
export const fitCreatedSchema = z.object({ fitId: z.uuid() });
