import { and, eq, sql } from 'drizzle-orm';
import type { LatLng } from '@shared/field-sync/quality/great-circle-distance';
import type { Executor } from '../db/database';
import { preparedPerExecutor } from '../db/prepared-per-executor';
import { routeStops, routes, samplingPoints, studies, studyMembers } from '../db/schema';

/** A route assigned to the enumerator: its study and the positions of its stops' points. */
export interface AssignedRoute {
  studyId: string;
  points: ReadonlyMap<string, LatLng>;
}

/** Routes the enumerator may record interviews on, by route id. */
export type EnumeratorScope = ReadonlyMap<string, AssignedRoute>;

/**
 * The routes assigned to this person in studies of their organisation where they are, still,
 * an enumerator — the only places a synced interview may come from. One query per batch.
 */
export async function loadEnumeratorScope(
  db: Executor,
  who: { userId: string; organisationId: string },
): Promise<EnumeratorScope> {
  const rows = await scopeQuery(db).execute({
    userId: who.userId,
    organisationId: who.organisationId,
  });
  const scope = new Map<string, { studyId: string; points: Map<string, LatLng> }>();
  for (const row of rows) {
    const route = scope.get(row.routeId) ?? { studyId: row.studyId, points: new Map() };
    if (row.pointId !== null && row.latitude !== null && row.longitude !== null) {
      route.points.set(row.pointId, { latitude: row.latitude, longitude: row.longitude });
    }
    scope.set(row.routeId, route);
  }
  return scope;
}

// Named: PostgreSQL took longer to plan this five-table join than to run it.
const scopeQuery = preparedPerExecutor((db) =>
  db
    .select({
      routeId: routes.id,
      studyId: routes.studyId,
      pointId: samplingPoints.id,
      latitude: samplingPoints.latitude,
      longitude: samplingPoints.longitude,
    })
    .from(routes)
    .innerJoin(
      studies,
      and(
        eq(studies.id, routes.studyId),
        eq(studies.organisationId, sql.placeholder('organisationId')),
      ),
    )
    .innerJoin(
      studyMembers,
      and(
        eq(studyMembers.studyId, routes.studyId),
        eq(studyMembers.userId, sql.placeholder('userId')),
        sql`'enumerator' = any(${studyMembers.roles})`,
      ),
    )
    .leftJoin(routeStops, eq(routeStops.routeId, routes.id))
    .leftJoin(samplingPoints, eq(samplingPoints.id, routeStops.pointId))
    .where(eq(routes.enumeratorId, sql.placeholder('userId')))
    .prepare('field_sync_enumerator_scope'),
);
