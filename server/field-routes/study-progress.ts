import type { FieldRoute } from '@shared/routes/field-route';
import type { ProgressCounts, StudyProgress } from '@shared/routes/route-progress';
import type { Executor } from '../db/database';
import { listFieldRoutes } from './field-routes-query';
import { progressCounts, type ProgressRow } from './progress-query';
import type { RouteVisibility } from './route-visibility';

const none: ProgressCounts = { quota: 0, completed: 0, accepted: 0, flagged: 0 };
const countsOf = ({ quota, completed, accepted, flagged }: ProgressCounts): ProgressCounts => ({
  quota,
  completed,
  accepted,
  flagged,
});

/**
 * Progress of the routes the caller may see: the counts come from SQL; this only lays them out
 * beside each route's name, enumerator and stops, in visiting order.
 */
export async function studyProgress(
  db: Executor,
  studyId: string,
  visibility: RouteVisibility,
): Promise<StudyProgress> {
  const [routes, rows] = await Promise.all([
    listFieldRoutes(db, studyId, visibility),
    progressCounts(db, studyId, visibility),
  ]);
  const key = (routeId: string | null, pointId: string | null) => `${routeId}/${pointId}`;
  const byKey = new Map<string, ProgressRow>(
    rows.map((row) => [key(row.routeId, row.pointId), row]),
  );
  const counts = (routeId: string | null, pointId: string | null) => {
    const row = byKey.get(key(routeId, pointId));
    return row ? countsOf(row) : none;
  };
  return {
    totals: counts(null, null),
    routes: routes.map((route: FieldRoute) => ({
      routeId: route.id,
      name: route.name,
      enumeratorName: route.enumerator?.name ?? null,
      windowStart: route.windowStart,
      windowEnd: route.windowEnd,
      ...counts(route.id, null),
      points: route.stops.map((stop) => ({
        pointId: stop.pointId,
        position: stop.position,
        code: stop.code,
        name: stop.name,
        ...counts(route.id, stop.pointId),
      })),
    })),
    computedAt: new Date().toISOString(),
  };
}
