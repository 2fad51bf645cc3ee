import { and, eq, sql } from 'drizzle-orm';
import { logger } from '../http/logger';
import { portalSchedulePath } from '@shared/analysis/portal-paths';
import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import type { AppDependencies } from '../app-dependencies';
import { studyMembers, users } from '../db/schema';
import { schedulePublishedMail } from './schedule-published-mail';
import { findVersion } from './schedule-versions-repository';

/**
 * E-mails every client member of the study about a new version. A mail that fails is logged,
 * not thrown: the version is published either way.
 */
export async function notifyClients(
  deps: AppDependencies,
  version: ScheduleVersion,
): Promise<number> {
  const clients = await deps.db
    .select({ email: users.email, name: users.name })
    .from(studyMembers)
    .innerJoin(users, eq(users.id, studyMembers.userId))
    .where(
      and(eq(studyMembers.studyId, version.studyId), sql`'client' = any(${studyMembers.roles})`),
    );
  const link = `${deps.config.APP_URL}${portalSchedulePath(version.studyId, version.id)}`;
  const replacedVersion = version.replacesId
    ? (await findVersion(deps.db, version.studyId, version.replacesId)).version
    : null;
  const sent = await Promise.allSettled(
    clients.map((to) =>
      deps.mailer.send(schedulePublishedMail({ to, version, replacedVersion, link })),
    ),
  );
  sent.forEach((outcome, i) => {
    if (outcome.status === 'rejected')
      logger.error({ err: outcome.reason, to: clients[i].email }, 'schedule mail failed');
  });
  return sent.filter((s) => s.status === 'fulfilled').length;
}
