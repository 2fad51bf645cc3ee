import { sql, type SQL } from 'drizzle-orm';
import type { InterviewFilter } from '@shared/analysis/interview-filter';

/**
 * The analysis filters as conditions on a typed table aliased `s` (which carries the
 * interview's study, route, point, finish time, review state and flags) joined to
 * `sampling_points`: the same rules as on the interviews themselves (see load-fit-input).
 */
export function statedFilter(studyId: string, filter: InterviewFilter): SQL {
  const where: SQL[] = [sql`s.study_id = ${studyId}`, sql`s.status = 'accepted'`];
  const day = sql`(s.finished_at at time zone 'UTC')::date`;
  if (filter.from) where.push(sql`${day} >= ${filter.from}::date`);
  if (filter.to) where.push(sql`${day} <= ${filter.to}::date`);
  if (filter.routeIds?.length) {
    where.push(
      sql`s.route_id IN (${sql.join(
        filter.routeIds.map((id) => sql`${id}`),
        sql`, `,
      )})`,
    );
  }
  if (filter.regions?.length) {
    where.push(
      sql`sampling_points.stratum IN (${sql.join(
        filter.regions.map((r) => sql`${r}`),
        sql`, `,
      )})`,
    );
  }
  if (filter.flagged === 'exclude') where.push(sql`NOT s.flagged`);
  return sql.join(where, sql` AND `);
}
