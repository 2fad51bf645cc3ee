import { inArray, sql, type SQL } from 'drizzle-orm';
import type { InterviewFilter } from '@shared/analysis/interview-filter';
import { interviews, samplingPoints } from '../db/schema';

/**
 * The analysis filter as SQL conditions on `interviews` joined to `sampling_points` (for the
 * region): the one reading of the filter that fits and raw-data downloads share.
 */
export function interviewFilterConditions(filter: InterviewFilter): SQL[] {
  const where: SQL[] = [];
  const day = sql`(${interviews.finishedAt} at time zone 'UTC')::date`;
  if (filter.from) where.push(sql`${day} >= ${filter.from}::date`);
  if (filter.to) where.push(sql`${day} <= ${filter.to}::date`);
  if (filter.routeIds?.length) where.push(inArray(interviews.routeId, filter.routeIds));
  if (filter.regions?.length) where.push(inArray(samplingPoints.stratum, filter.regions));
  if (filter.flagged === 'exclude') where.push(sql`${interviews.flags} = '[]'::jsonb`);
  return where;
}
