import { and, eq, sql } from 'drizzle-orm';
import { fieldRoutePath, type StudyEnumerator } from '@shared/routes/field-route';
import type { Config } from '../config';
import type { Executor } from '../db/database';
import { routes, studies } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import type { Mailer } from '../mail/mailer';
import type { Actor } from '../auth/actor';
import { getFieldRoute } from './field-routes-query';
import { routeAssignedMail, routeWithdrawnMail } from './route-assignment-mail';
import { findStudyEnumerator } from './study-enumerators';

export interface AssignmentRequest {
  studyId: string;
  routeId: string;
  enumeratorId: string | null;
  assignedBy: Actor;
  /** Send the e-mail even when the enumerator does not change (an explicit "assign" again). */
  resend: boolean;
}

/**
 * Assigns a route to an enumerator of the study, reassigns it, or takes it back, and e-mails the
 * people concerned. Run it in the transaction that changes the route: if the relay refuses the
 * mail, the assignment does not happen either.
 */
export async function assignRoute(
  db: Executor,
  deps: { mailer: Mailer; config: Config },
  request: AssignmentRequest,
): Promise<void> {
  const { studyId, routeId, enumeratorId } = request;
  const [current] = await db
    .select({ enumeratorId: routes.enumeratorId })
    .from(routes)
    .where(and(eq(routes.studyId, studyId), eq(routes.id, routeId)))
    .for('update');
  if (!current) throw notFound('That route');
  const next =
    enumeratorId === null ? undefined : await findStudyEnumerator(db, studyId, enumeratorId);
  if (enumeratorId !== null && !next) {
    throw new HttpError(
      400,
      'invalid-input',
      'The enumerator is not an enumerator of this study.',
      [{ path: 'enumeratorId', message: 'This person is not an enumerator of this study.' }],
    );
  }
  const changed = current.enumeratorId !== enumeratorId;
  if (!changed && !request.resend) return;
  if (changed) {
    await db
      .update(routes)
      .set({ enumeratorId, assignedAt: enumeratorId === null ? null : sql`now()` })
      .where(eq(routes.id, routeId));
  }
  const previous =
    changed && current.enumeratorId
      ? await findStudyEnumerator(db, studyId, current.enumeratorId)
      : undefined;
  await notifyEnumerators(db, deps, request, { previous, next });
}

async function notifyEnumerators(
  db: Executor,
  { mailer, config }: { mailer: Mailer; config: Config },
  request: AssignmentRequest,
  people: { previous?: StudyEnumerator; next?: StudyEnumerator },
): Promise<void> {
  const { studyId, routeId } = request;
  const route = await getFieldRoute(db, studyId, routeId, {});
  const [study] = await db
    .select({ name: studies.name })
    .from(studies)
    .where(eq(studies.id, studyId));
  const studyName = study?.name ?? 'your study';
  if (people.previous) {
    await mailer.send(routeWithdrawnMail({ to: people.previous, route, studyName }));
  }
  if (people.next) {
    const link = new URL(fieldRoutePath(routeId), config.APP_URL).href;
    const assignedBy = request.assignedBy.name;
    await mailer.send(routeAssignedMail({ to: people.next, route, studyName, assignedBy, link }));
  }
}
