import { and, asc, eq, inArray } from 'drizzle-orm';
import type { FieldRoute, RouteStop } from '@shared/routes/field-route';
import type { SamplingPointKind } from '@shared/sampling/sampling-point-kind';
import type { Executor } from '../db/database';
import { routeStops, routes, samplingPoints, users } from '../db/schema';
import { notFound } from '../http/http-error';
import type { RouteVisibility } from './route-visibility';

/** The routes of a study the caller may see (optionally one), with their stops in order. */
export async function listFieldRoutes(
  db: Executor,
  studyId: string,
  visibility: RouteVisibility,
  routeId?: string,
): Promise<FieldRoute[]> {
  const rows = await db
    .select({ route: routes, enumeratorName: users.name, enumeratorEmail: users.email })
    .from(routes)
    .leftJoin(users, eq(users.id, routes.enumeratorId))
    .where(
      and(
        eq(routes.studyId, studyId),
        routeId === undefined ? undefined : eq(routes.id, routeId),
        visibility.onlyAssignedTo === undefined
          ? undefined
          : eq(routes.enumeratorId, visibility.onlyAssignedTo),
      ),
    )
    .orderBy(asc(routes.createdAt), asc(routes.name));
  const stops = await stopsOf(
    db,
    rows.map((row) => row.route.id),
  );
  return rows.map(({ route, enumeratorName, enumeratorEmail }) => ({
    id: route.id,
    studyId: route.studyId,
    name: route.name,
    windowStart: route.windowStart,
    windowEnd: route.windowEnd,
    enumerator:
      route.enumeratorId && enumeratorName !== null && enumeratorEmail !== null
        ? { userId: route.enumeratorId, name: enumeratorName, email: enumeratorEmail }
        : null,
    assignedAt: route.assignedAt?.toISOString() ?? null,
    stops: stops.get(route.id) ?? [],
  }));
}

/** One route, or 404 when it does not exist in the study or is not the caller's to see. */
export async function getFieldRoute(
  db: Executor,
  studyId: string,
  routeId: string,
  visibility: RouteVisibility,
): Promise<FieldRoute> {
  const [route] = await listFieldRoutes(db, studyId, visibility, routeId);
  if (!route) throw notFound('That route');
  return route;
}

async function stopsOf(db: Executor, routeIds: string[]): Promise<Map<string, RouteStop[]>> {
  const byRoute = new Map<string, RouteStop[]>();
  if (routeIds.length === 0) return byRoute;
  const rows = await db
    .select({
      routeId: routeStops.routeId,
      position: routeStops.position,
      quota: routeStops.quota,
      point: samplingPoints,
    })
    .from(routeStops)
    .innerJoin(samplingPoints, eq(samplingPoints.id, routeStops.pointId))
    .where(inArray(routeStops.routeId, routeIds))
    .orderBy(asc(routeStops.routeId), asc(routeStops.position));
  for (const { routeId, position, quota, point } of rows) {
    const list = byRoute.get(routeId) ?? [];
    list.push({
      position,
      quota,
      pointId: point.id,
      code: point.code,
      name: point.name,
      kind: point.kind as SamplingPointKind,
      stratum: point.stratum,
      latitude: point.latitude,
      longitude: point.longitude,
    });
    byRoute.set(routeId, list);
  }
  return byRoute;
}
