import { z } from 'zod';
import { interviewStatuses } from '../interviews/interview-status';
import { qualityFlagKinds, qualityFlagSchema } from './quality/quality-flag';

/**
 * Query of `GET /api/studies/:studyId/review`: optional filters, then a page. Without a status
 * filter every interview is listed, flagged first, then received, returned, accepted, rejected.
 */
export const reviewQueueQuerySchema = z.strictObject({
  status: z.enum(interviewStatuses, { error: 'Filter by a known status' }).optional(),
  flag: z.enum(qualityFlagKinds, { error: 'Filter by a known flag' }).optional(),
  routeId: z.uuid('The route filter must be a route id').optional(),
  enumeratorId: z.uuid('The enumerator filter must be a person’s id').optional(),
  limit: z.coerce.number().int().min(1, 'At least 1').max(200, 'At most 200').default(50),
  offset: z.coerce.number().int().min(0, 'At least 0').default(0),
});
export type ReviewQueueQuery = z.infer<typeof reviewQueueQuerySchema>;

/** One interview in the review queue: enough to choose which to open. */
export const reviewQueueItemSchema = z.object({
  id: z.uuid(),
  status: z.enum(interviewStatuses),
  flags: z.array(qualityFlagSchema),
  enumerator: z.object({ userId: z.uuid(), name: z.string() }).nullable(),
  route: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  point: z.object({ id: z.uuid(), code: z.string(), name: z.string() }).nullable(),
  startedAt: z.string(),
  finishedAt: z.string(),
  receivedAt: z.string(),
  durationSeconds: z.number(),
  photoCount: z.number().int(),
  photosStored: z.number().int(),
  completeAt: z.string().nullable(),
  reviewedAt: z.string().nullable(),
});
export type ReviewQueueItem = z.infer<typeof reviewQueueItemSchema>;

/** `GET /api/studies/:studyId/review`: one page and how many match the filters in all. */
export const reviewQueueSchema = z.object({
  items: z.array(reviewQueueItemSchema),
  total: z.number().int(),
});
export type ReviewQueue = z.infer<typeof reviewQueueSchema>;
