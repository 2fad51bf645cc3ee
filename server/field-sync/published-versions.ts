import { and, eq, inArray } from 'drizzle-orm';
import { prepareAnswersCheck, type AnswersCheck } from '@shared/questionnaire/answers-check';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type { Executor } from '../db/database';
import { questionnaireVersions, questionnaires } from '../db/schema';

/** A published questionnaire version, as sync checks interviews against it. */
export interface PublishedVersion {
  id: string;
  studyId: string;
  definition: QuestionnaireDefinition;
  /** The check of an interview's answers, prepared once for every interview of the version. */
  readonly answersCheck: AnswersCheck;
}

/**
 * Prepares the version's answer check up front: its schemas (zod compiles a schema on its
 * first use), quick tests and condition targets.
 */
export function publishedVersion(
  row: Pick<PublishedVersion, 'id' | 'studyId'> & { definition: unknown },
): PublishedVersion {
  const definition = row.definition as QuestionnaireDefinition;
  return {
    id: row.id,
    studyId: row.studyId,
    definition,
    answersCheck: prepareAnswersCheck(definition),
  };
}

/**
 * Published versions never change (a database trigger refuses it), so once read they are kept,
 * answer checks prepared, for the life of the process: a batch of 200 interviews on one version
 * costs no lookup and no schema building after the first. Drafts and unknown ids are not kept,
 * so a later publication is seen.
 */
export class PublishedVersionCache {
  private readonly known = new Map<string, PublishedVersion>();

  constructor(private readonly limit = 500) {}

  /** The published versions among `ids`; an id missing from the answer is unknown or a draft. */
  async load(db: Executor, ids: readonly string[]): Promise<Map<string, PublishedVersion>> {
    const found = new Map<string, PublishedVersion>();
    const missing = [...new Set(ids)].filter((id) => {
      const cached = this.known.get(id);
      if (cached) found.set(id, cached);
      return !cached;
    });
    if (missing.length === 0) return found;
    const rows = await db
      .select({
        id: questionnaireVersions.id,
        studyId: questionnaires.studyId,
        definition: questionnaireVersions.definition,
      })
      .from(questionnaireVersions)
      .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
      .where(
        and(
          inArray(questionnaireVersions.id, missing),
          eq(questionnaireVersions.status, 'published'),
        ),
      );
    for (const row of rows) {
      const version = publishedVersion(row);
      if (this.known.size >= this.limit) this.known.clear();
      this.known.set(row.id, version);
      found.set(row.id, version);
    }
    return found;
  }
}
