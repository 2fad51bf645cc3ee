import { z } from 'zod';
import type { InterviewStatus } from '../interviews/interview-status';

/**
 * Interview statuses that count as a completed interview against a quota: everything the server
 * received except interviews sent back to the enumerator or rejected.
 */
export const completedStatuses = [
  'received',
  'flagged',
  'accepted',
] as const satisfies readonly InterviewStatus[];

/** Counts against a quota; `completed` includes the accepted and flagged ones. */
export const progressCountsSchema = z.object({
  quota: z.number().int(),
  completed: z.number().int(),
  accepted: z.number().int(),
  flagged: z.number().int(),
});
export type ProgressCounts = z.infer<typeof progressCountsSchema>;

/** Progress at one stop of a route. */
export const pointProgressSchema = progressCountsSchema.extend({
  pointId: z.uuid(),
  position: z.number().int(),
  code: z.string(),
  name: z.string(),
});
export type PointProgress = z.infer<typeof pointProgressSchema>;

/** Progress of one route: its totals and each stop in visiting order. */
export const routeProgressSchema = progressCountsSchema.extend({
  routeId: z.uuid(),
  name: z.string(),
  enumeratorName: z.string().nullable(),
  windowStart: z.string(),
  windowEnd: z.string(),
  points: z.array(pointProgressSchema),
});
export type RouteProgress = z.infer<typeof routeProgressSchema>;

/** `GET /api/studies/:studyId/progress`: every route the caller may see, and their sum. */
export const studyProgressSchema = z.object({
  totals: progressCountsSchema,
  routes: z.array(routeProgressSchema),
  computedAt: z.string(),
});
export type StudyProgress = z.infer<typeof studyProgressSchema>;

/** Share of the quota completed, 0–1 (a quota of 0 cannot occur: stops need at least 1). */
export function quotaShare(counts: ProgressCounts): number {
  return counts.quota > 0 ? Math.min(1, counts.completed / counts.quota) : 0;
}
