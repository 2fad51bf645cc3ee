import { and, asc, eq, inArray } from 'drizzle-orm';
import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type { Actor } from '../auth/actor';
import type { Executor } from '../db/database';
import { questionnaireVersions, questionnaires, studies } from '../db/schema';
import { listFieldRoutes } from '../field-routes/field-routes-query';
import { loadEnumeratorScope } from './enumerator-scope';

/**
 * Everything the enumerator's device caches to work offline: their assigned routes (in studies
 * where they are still an enumerator), those studies, and every published version of the
 * studies' questionnaires — older versions too, for interviews begun on them.
 */
export async function fieldAssignments(db: Executor, actor: Actor): Promise<FieldAssignments> {
  const scope = await loadEnumeratorScope(db, actor);
  const studyIds = [...new Set([...scope.values()].map((route) => route.studyId))];
  const generatedAt = new Date().toISOString();
  const enumerator = { userId: actor.userId, name: actor.name };
  if (studyIds.length === 0) {
    return { enumerator, studies: [], routes: [], questionnaireVersions: [], generatedAt };
  }
  const studyRows = await db
    .select()
    .from(studies)
    .where(inArray(studies.id, studyIds))
    .orderBy(asc(studies.name));
  const routeLists = await Promise.all(
    studyIds.map((studyId) => listFieldRoutes(db, studyId, { onlyAssignedTo: actor.userId })),
  );
  const versions = await db
    .select({
      version: questionnaireVersions,
      studyId: questionnaires.studyId,
      title: questionnaires.title,
    })
    .from(questionnaireVersions)
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .where(
      and(inArray(questionnaires.studyId, studyIds), eq(questionnaireVersions.status, 'published')),
    )
    .orderBy(asc(questionnaires.createdAt), asc(questionnaireVersions.version));
  return {
    enumerator,
    studies: studyRows.map((study) => ({
      id: study.id,
      name: study.name,
      productName: study.productName,
      secondProductName: study.secondProductName,
      currency: study.currency,
      locale: study.locale,
      market: study.market,
      priceMinMinor: study.priceMinMinor,
      priceMaxMinor: study.priceMaxMinor,
      status: study.status,
    })),
    routes: routeLists.flat().filter((route) => scope.has(route.id)),
    questionnaireVersions: versions.map(({ version, studyId, title }) => ({
      id: version.id,
      questionnaireId: version.questionnaireId,
      studyId,
      title,
      version: version.version,
      publishedAt: (version.publishedAt ?? version.createdAt).toISOString(),
      definition: version.definition as QuestionnaireDefinition,
    })),
    generatedAt,
  };
}
