import { sql } from 'drizzle-orm';
import type { LatLng } from '@shared/field-sync/quality/great-circle-distance';
import type { Executor } from '../db/database';

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
  const result = await db.execute<{
    route_id: string;
    study_id: string;
    point_id: string | null;
    latitude: number | null;
    longitude: number | null;
  }>(sql`
    select r.id as route_id, r.study_id, p.id as point_id, p.latitude, p.longitude
    from routes r
    join studies st on st.id = r.study_id and st.organisation_id = ${who.organisationId}
    join study_members m on m.study_id = r.study_id and m.user_id = ${who.userId}
      and 'enumerator' = any(m.roles)
    left join route_stops s on s.route_id = r.id
    left join sampling_points p on p.id = s.point_id
    where r.enumerator_id = ${who.userId}
  `);
  const scope = new Map<string, { studyId: string; points: Map<string, LatLng> }>();
  for (const row of result.rows) {
    const route = scope.get(row.route_id) ?? { studyId: row.study_id, points: new Map() };
    if (row.point_id !== null && row.latitude !== null && row.longitude !== null) {
      route.points.set(row.point_id, { latitude: row.latitude, longitude: row.longitude });
    }
    scope.set(row.route_id, route);
  }
  return scope;
}
