import { and, eq, sql } from 'drizzle-orm';
import type { PublishScheduleRequest } from '@shared/analysis/schedule-version';
import type { Executor } from '../db/database';
import { scheduleVersions } from '../db/schema';
import { HttpError } from '../http/http-error';

const notReplaced = sql`not exists (
  select 1 from schedule_versions s where s.replaces_id = ${scheduleVersions.id}
)`;

const sameTitle = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/**
 * Refuses to publish what clients already have: a fit that a version still in force was
 * published from (its clients would get the same figures twice), and a second schedule in force
 * under the title of another, which would leave two "current" versions of one schedule.
 */
export async function refuseRepublishing(
  db: Executor,
  studyId: string,
  fitId: string,
  request: Pick<PublishScheduleRequest, 'title' | 'replaces'>,
): Promise<void> {
  const inForce = await db
    .select({
      id: scheduleVersions.id,
      version: scheduleVersions.version,
      title: scheduleVersions.title,
      fitId: scheduleVersions.fitId,
    })
    .from(scheduleVersions)
    .where(and(eq(scheduleVersions.studyId, studyId), notReplaced));
  const published = inForce.find((v) => v.fitId === fitId);
  if (published) {
    throw new HttpError(
      409,
      'already-published',
      `This fit is already published as version ${published.version} ("${published.title}"), ` +
        'and its clients have it. To correct that version, run a new fit and publish it as ' +
        'replacing version ' +
        `${published.version}.`,
    );
  }
  const namesake = inForce.find((v) => sameTitle(v.title, request.title));
  if (namesake && namesake.id !== request.replaces) {
    throw new HttpError(
      409,
      'title-in-use',
      `Version ${namesake.version} is already published as "${namesake.title}". Choose it under ` +
        'Replaces to publish a correction, or give the new schedule another title.',
      [{ path: 'title', message: `Version ${namesake.version} already has this title` }],
    );
  }
}
