import { z } from 'zod';
import { interviewStatuses } from '../interviews/interview-status';
import { qualityFlagKinds, qualityFlagSchema } from './quality/quality-flag';

/** How the queue is ordered: decisions needed first (the default), or by interview time. */
export const reviewQueueSorts = ['needs-decision', 'newest', 'oldest'] as const;
export type ReviewQueueSort = (typeof reviewQueueSorts)[number];

const dayPattern = /^\d{4}-\d{2}-\d{2}$/;
const day = (message: string) =>
  z
    .string()
    .regex(dayPattern, message)
    .refine((value) => !Number.isNaN(Date.parse(`${value}T00:00:00Z`)), message);

/**
 * An interview reference as people quote it: the first hex digits of its id (at least four,
 * dashes optional), case-insensitive, with or without the word "interview" in front.
 */
export const interviewReferenceSchema = z
  .string()
  .trim()
  .toLowerCase()
  .transform((value) => value.replace(/^interview\s+/, '').replaceAll('-', ''))
  .pipe(
    z
      .string()
      .regex(
        /^[0-9a-f]{4,32}$/,
        'Type at least four characters of the reference, such as 3f9a0c12',
      ),
  );

/**
 * Query of `GET /api/studies/:studyId/review`: optional filters, an order, then a page. Without
 * a status filter every interview is listed; by default flagged first, then received, returned,
 * accepted, rejected. Interview days are the study's calendar days in UTC.
 */
export const reviewQueueQuerySchema = z
  .strictObject({
    status: z.enum(interviewStatuses, { error: 'Filter by a known status' }).optional(),
    flag: z.enum(qualityFlagKinds, { error: 'Filter by a known flag' }).optional(),
    routeId: z.uuid('The route filter must be a route id').optional(),
    pointId: z.uuid('The point filter must be a sampling point id').optional(),
    enumeratorId: z.uuid('The enumerator filter must be a person’s id').optional(),
    from: day('Give the first day as YYYY-MM-DD').optional(),
    to: day('Give the last day as YYYY-MM-DD').optional(),
    reference: interviewReferenceSchema.optional(),
    sort: z
      .enum(reviewQueueSorts, { error: 'Sort by needs-decision, newest or oldest' })
      .optional(),
    limit: z.coerce.number().int().min(1, 'At least 1').max(200, 'At most 200').default(50),
    offset: z.coerce
      .number()
      .int()
      .min(0, 'At least 0')
      .max(10_000_000, 'At most 10,000,000')
      .default(0),
  })
  .superRefine((query, ctx) => {
    if (query.from !== undefined && query.to !== undefined && query.to < query.from) {
      ctx.addIssue({
        code: 'custom',
        path: ['to'],
        message: 'The last day comes before the first',
      });
    }
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

/** Body of `POST /api/studies/:studyId/review/accept`: several interviews accepted at once. */
export const bulkAcceptSchema = z.strictObject({
  interviewIds: z
    .array(z.uuid('Each interview id must be a UUID'), { error: 'List the interviews to accept' })
    .min(1, 'Choose at least one interview')
    .max(200, 'Accept at most 200 interviews at once'),
});
export type BulkAcceptBody = z.infer<typeof bulkAcceptSchema>;

/** What a bulk acceptance did: interviews already accepted are left as they were. */
export const bulkAcceptResultSchema = z.object({
  accepted: z.number().int(),
  alreadyAccepted: z.number().int(),
});
export type BulkAcceptResult = z.infer<typeof bulkAcceptResultSchema>;

/** Interviews waiting for a supervisor's decision in one study (received or flagged). */
export const pendingReviewCountSchema = z.object({
  studyId: z.uuid(),
  pending: z.number().int(),
  flagged: z.number().int(),
});
export type PendingReviewCount = z.infer<typeof pendingReviewCountSchema>;

/** Who, which routes and which points appear among a study's interviews: the filter choices. */
export const reviewFacetsSchema = z.object({
  enumerators: z.array(z.object({ id: z.uuid(), name: z.string() })),
  routes: z.array(z.object({ id: z.uuid(), name: z.string() })),
  points: z.array(z.object({ id: z.uuid(), code: z.string(), name: z.string() })),
});
export type ReviewFacets = z.infer<typeof reviewFacetsSchema>;
