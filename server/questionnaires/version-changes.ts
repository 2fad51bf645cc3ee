import { and, desc, eq, sql } from 'drizzle-orm';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import type { QuestionnaireVersion } from '@shared/questionnaire/questionnaire-resource';
import type { Database, Executor } from '../db/database';
import { questionnaireVersions, questionnaires } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { refusingFrozenVersions, versionPublished } from './frozen-version-error';
import { definitionRefused } from './definition-refused';
import { toVersion } from './version-row';

type ProblemFinder = (definition: unknown) => QuestionnaireProblem[];

/**
 * Replaces a draft's content, when `problemsOf` finds nothing wrong with the new definition.
 * `target` is a version number, or 'current' for the questionnaire's open draft. A published
 * target is refused before its content is even looked at.
 */
export async function saveDraft(
  db: Database,
  studyId: string,
  questionnaireId: string,
  target: number | 'current',
  definition: unknown,
  problemsOf: ProblemFinder,
): Promise<QuestionnaireVersion> {
  return db.transaction(async (tx) => {
    await lockQuestionnaire(tx, studyId, questionnaireId);
    const row = await findVersion(tx, questionnaireId, target);
    if (row.status === 'published') throw versionPublished(row.version);
    const problems = problemsOf(definition);
    if (problems.length > 0) throw definitionRefused(problems, 'definition');
    const [saved] = await refusingFrozenVersions(row.version, () =>
      tx
        .update(questionnaireVersions)
        .set({ definition })
        .where(eq(questionnaireVersions.id, row.id))
        .returning(),
    );
    return toVersion(saved);
  });
}

/** Freezes a draft version, once its content is ready to be asked. */
export async function publishVersion(
  db: Database,
  studyId: string,
  questionnaireId: string,
  version: number,
  userId: string,
  problemsOf: ProblemFinder,
): Promise<QuestionnaireVersion> {
  return db.transaction(async (tx) => {
    await lockQuestionnaire(tx, studyId, questionnaireId);
    const row = await findVersion(tx, questionnaireId, version);
    if (row.status === 'published') throw versionPublished(version);
    const problems = problemsOf(row.definition);
    if (problems.length > 0) throw definitionRefused(problems, 'definition', 'cannot be published');
    const [published] = await refusingFrozenVersions(version, () =>
      tx
        .update(questionnaireVersions)
        .set({ status: 'published', publishedAt: sql`now()`, publishedBy: userId })
        .where(eq(questionnaireVersions.id, row.id))
        .returning(),
    );
    return toVersion(published);
  });
}

/** Starts draft version n+1 as a copy of the newest published version. */
export async function startNewDraft(
  db: Database,
  studyId: string,
  questionnaireId: string,
): Promise<QuestionnaireVersion> {
  return db.transaction(async (tx) => {
    await lockQuestionnaire(tx, studyId, questionnaireId);
    const rows = await tx
      .select()
      .from(questionnaireVersions)
      .where(eq(questionnaireVersions.questionnaireId, questionnaireId))
      .orderBy(desc(questionnaireVersions.version));
    const draft = rows.find((r) => r.status === 'draft');
    if (draft)
      throw new HttpError(
        409,
        'draft-exists',
        `Version ${draft.version} is already an open draft; edit that one.`,
      );
    const [created] = await tx
      .insert(questionnaireVersions)
      .values({ questionnaireId, version: rows[0].version + 1, definition: rows[0].definition })
      .returning();
    return toVersion(created);
  });
}

async function lockQuestionnaire(
  tx: Executor,
  studyId: string,
  questionnaireId: string,
): Promise<void> {
  const [row] = await tx
    .select({ id: questionnaires.id })
    .from(questionnaires)
    .where(and(eq(questionnaires.id, questionnaireId), eq(questionnaires.studyId, studyId)))
    .for('update');
  if (!row) throw notFound('That questionnaire');
}

async function findVersion(tx: Executor, questionnaireId: string, target: number | 'current') {
  const rows = await tx
    .select()
    .from(questionnaireVersions)
    .where(
      and(
        eq(questionnaireVersions.questionnaireId, questionnaireId),
        target === 'current'
          ? eq(questionnaireVersions.status, 'draft')
          : eq(questionnaireVersions.version, target),
      ),
    )
    .orderBy(desc(questionnaireVersions.version));
  if (rows[0]) return rows[0];
  if (target !== 'current') throw notFound(`Version ${target} of that questionnaire`);
  throw new HttpError(
    409,
    'version-published',
    'Every version of this questionnaire is published; start a new draft to edit it.',
  );
}
