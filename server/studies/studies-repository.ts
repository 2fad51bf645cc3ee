import { and, desc, eq, sql } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import type { Study, StudyCreate, StudyUpdate } from '@shared/studies/study';
import type { StudyStatus } from '@shared/studies/study-status';
import { studyStatusChangeProblem } from '@shared/studies/study-status-change';
import type { Actor } from '../auth/actor';
import type { Database, Executor } from '../db/database';
import { questionnaireVersions, questionnaires, studies, studyMembers } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { toStudy } from './study-row';

/**
 * The studies the actor is a member of, newest first, each with the actor's roles in it — only
 * those they still hold in the organisation (a study left with none is not listed).
 */
export async function listStudiesOf(db: Database, actor: Actor): Promise<Study[]> {
  const rows = await db
    .select({ study: studies, roles: studyMembers.roles })
    .from(studyMembers)
    .innerJoin(studies, eq(studies.id, studyMembers.studyId))
    .where(
      and(eq(studyMembers.userId, actor.userId), eq(studies.organisationId, actor.organisationId)),
    )
    .orderBy(desc(studies.createdAt));
  return rows.flatMap((row) => {
    const current = row.roles.filter((role) => actor.roles.includes(role));
    return current.length > 0 ? [toStudy(row.study, current)] : [];
  });
}

/** Creates a study in the actor's organisation; its creator joins it as a researcher. */
export async function createStudy(db: Database, actor: Actor, input: StudyCreate): Promise<Study> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(studies)
      .values({ ...input, organisationId: actor.organisationId, createdBy: actor.userId })
      .returning();
    await tx
      .insert(studyMembers)
      .values({ studyId: row.id, userId: actor.userId, roles: ['researcher'] });
    return toStudy(row, ['researcher']);
  });
}

export async function getStudy(db: Executor, studyId: string, myRoles: Role[]): Promise<Study> {
  const [row] = await db.select().from(studies).where(eq(studies.id, studyId));
  if (!row) throw notFound('That study');
  return toStudy(row, myRoles);
}

/**
 * Applies a partial update. The price range is checked against the stored values too, and the
 * currency is fixed once a questionnaire is published, since its prices are in minor units.
 */
export async function updateStudy(
  db: Database,
  studyId: string,
  update: StudyUpdate,
  myRoles: Role[],
): Promise<Study> {
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(studies).where(eq(studies.id, studyId)).for('update');
    if (!current) throw notFound('That study');
    const min = update.priceMinMinor ?? current.priceMinMinor;
    const max = update.priceMaxMinor ?? current.priceMaxMinor;
    if (max <= min) {
      const path = update.priceMaxMinor === undefined ? 'priceMinMinor' : 'priceMaxMinor';
      throw new HttpError(400, 'invalid-input', 'The highest price must be above the lowest.', [
        {
          path,
          message: `The price range would run from ${min} to ${max} minor units; the highest must be above the lowest`,
        },
      ]);
    }
    if (
      update.currency &&
      update.currency !== current.currency &&
      (await hasPublishedVersion(tx, studyId))
    ) {
      throw new HttpError(
        409,
        'currency-locked',
        'The currency cannot change once a questionnaire version is published: its prices are in that currency.',
      );
    }
    const [row] = await tx
      .update(studies)
      .set({ ...update, updatedAt: sql`now()` })
      .where(eq(studies.id, studyId))
      .returning();
    return toStudy(row, myRoles);
  });
}

/** Moves the study along draft → in the field → closed, or says why it may not. */
export async function changeStudyStatus(
  db: Database,
  studyId: string,
  to: StudyStatus,
  myRoles: Role[],
): Promise<Study> {
  return db.transaction(async (tx) => {
    const [current] = await tx.select().from(studies).where(eq(studies.id, studyId)).for('update');
    if (!current) throw notFound('That study');
    const problem = studyStatusChangeProblem(
      current.status,
      to,
      await hasPublishedVersion(tx, studyId),
    );
    if (problem) throw new HttpError(409, 'status-change-refused', `${problem}.`);
    const [row] = await tx
      .update(studies)
      .set({ status: to, updatedAt: sql`now()` })
      .where(eq(studies.id, studyId))
      .returning();
    return toStudy(row, myRoles);
  });
}

async function hasPublishedVersion(db: Executor, studyId: string): Promise<boolean> {
  const [row] = await db
    .select({ id: questionnaireVersions.id })
    .from(questionnaireVersions)
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .where(and(eq(questionnaires.studyId, studyId), eq(questionnaireVersions.status, 'published')))
    .limit(1);
  return row !== undefined;
}
