import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type {
  Questionnaire,
  QuestionnaireVersion,
} from '@shared/questionnaire/questionnaire-resource';
import type { Database, Executor } from '../db/database';
import { questionnaireVersions, questionnaires } from '../db/schema';
import { notFound } from '../http/http-error';
import { toVersion, toVersionSummary, versionSummaryColumns } from './version-row';

/**
 * The study's questionnaires with their versions, newest version first. Without `seesDrafts`
 * (supervisors, enumerators) only published versions show, and questionnaires with none are
 * left out.
 */
export async function listQuestionnaires(
  db: Executor,
  studyId: string,
  seesDrafts: boolean,
): Promise<Questionnaire[]> {
  const rows = await db
    .select()
    .from(questionnaires)
    .where(eq(questionnaires.studyId, studyId))
    .orderBy(asc(questionnaires.createdAt));
  if (rows.length === 0) return [];
  const versions = await db
    .select(versionSummaryColumns)
    .from(questionnaireVersions)
    .where(
      inArray(
        questionnaireVersions.questionnaireId,
        rows.map((r) => r.id),
      ),
    )
    .orderBy(desc(questionnaireVersions.version));
  return rows
    .map((row) => ({
      id: row.id,
      studyId: row.studyId,
      title: row.title,
      createdAt: row.createdAt.toISOString(),
      versions: versions
        .filter((v) => v.questionnaireId === row.id && (seesDrafts || v.status === 'published'))
        .map(toVersionSummary),
    }))
    .filter((q) => q.versions.length > 0);
}

/** One questionnaire of the study, or 404 when it is not there (or has nothing the caller sees). */
export async function getQuestionnaire(
  db: Executor,
  studyId: string,
  questionnaireId: string,
  seesDrafts: boolean,
): Promise<Questionnaire> {
  const found = (await listQuestionnaires(db, studyId, seesDrafts)).find(
    (q) => q.id === questionnaireId,
  );
  if (!found) throw notFound('That questionnaire');
  return found;
}

/** One version with its content; drafts are 404 to those who may not see them. */
export async function getVersion(
  db: Executor,
  studyId: string,
  questionnaireId: string,
  version: number,
  seesDrafts: boolean,
): Promise<QuestionnaireVersion> {
  const [row] = await db
    .select({ version: questionnaireVersions })
    .from(questionnaireVersions)
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .where(
      and(
        eq(questionnaires.studyId, studyId),
        eq(questionnaires.id, questionnaireId),
        eq(questionnaireVersions.version, version),
      ),
    );
  if (!row || (!seesDrafts && row.version.status !== 'published')) {
    throw notFound(`Version ${version} of that questionnaire`);
  }
  return toVersion(row.version);
}

/** A new questionnaire in the study, starting as draft version 1 holding a consent block. */
export async function createQuestionnaire(
  db: Database,
  studyId: string,
  title: string,
): Promise<Questionnaire> {
  return db.transaction(async (tx) => {
    const [row] = await tx.insert(questionnaires).values({ studyId, title }).returning();
    const definition = { blocks: [starterBlock('consent', 'consent')] };
    const [version] = await tx
      .insert(questionnaireVersions)
      .values({ questionnaireId: row.id, version: 1, definition })
      .returning();
    return {
      id: row.id,
      studyId,
      title: row.title,
      createdAt: row.createdAt.toISOString(),
      versions: [toVersionSummary({ ...version, blockCount: 1 })],
    };
  });
}
