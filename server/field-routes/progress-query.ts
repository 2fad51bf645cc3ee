import { sql } from 'drizzle-orm';
import { completedStatuses, type ProgressCounts } from '@shared/routes/route-progress';
import type { Executor } from '../db/database';
import type { RouteVisibility } from './route-visibility';

/** One aggregate row: a stop, a route's total (no point) or the study's total (neither). */
export interface ProgressRow extends ProgressCounts {
  routeId: string | null;
  pointId: string | null;
}

/**
 * Interview counts against quota per stop, per route and for the study, in one statement:
 * interviews are counted per (route, point) first so a stop's quota is summed once, then
 * GROUPING SETS roll the stops up into routes and the study total.
 */
export async function progressCounts(
  db: Executor,
  studyId: string,
  visibility: RouteVisibility,
): Promise<ProgressRow[]> {
  const completed = sql.join(
    completedStatuses.map((status) => sql`${status}`),
    sql`, `,
  );
  const onlyAssigned =
    visibility.onlyAssignedTo === undefined
      ? sql``
      : sql`and r.enumerator_id = ${visibility.onlyAssignedTo}`;
  const result = await db.execute<{
    route_id: string | null;
    point_id: string | null;
    quota: number;
    completed: number;
    accepted: number;
    flagged: number;
  }>(sql`
    with counts as (
      select route_id, point_id,
        count(*) filter (where status::text in (${completed})) as completed,
        count(*) filter (where status = 'accepted') as accepted,
        count(*) filter (where status = 'flagged') as flagged
      from interviews
      where study_id = ${studyId} and route_id is not null and point_id is not null
      group by route_id, point_id
    )
    select s.route_id, s.point_id,
      coalesce(sum(s.quota), 0)::int as quota,
      coalesce(sum(c.completed), 0)::int as completed,
      coalesce(sum(c.accepted), 0)::int as accepted,
      coalesce(sum(c.flagged), 0)::int as flagged
    from route_stops s
    join routes r on r.id = s.route_id
    left join counts c on c.route_id = s.route_id and c.point_id = s.point_id
    where s.study_id = ${studyId} ${onlyAssigned}
    group by grouping sets ((s.route_id, s.point_id), (s.route_id), ())
  `);
  return result.rows.map((row) => ({
    routeId: row.route_id,
    pointId: row.point_id,
    quota: row.quota,
    completed: row.completed,
    accepted: row.accepted,
    flagged: row.flagged,
  }));
}
