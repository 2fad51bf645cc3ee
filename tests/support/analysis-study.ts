import { randomUUID } from 'node:crypto';
import type { Block } from '@shared/questionnaire/block';
import type { Database } from '../../server/db/database';
import {
  interviews,
  questionnaireVersions,
  questionnaires,
  samplingPoints,
} from '../../server/db/schema';
import { lanternInterviews } from '../../server/demo/lantern/lantern-interviews';
import {
  householdBlocks,
  shelfCheckBlocks,
} from '../../server/demo/lantern/lantern-questionnaires';
import { lanternSites } from '../../server/demo/lantern/lantern-sites';

/** A published questionnaire version of a study, straight into the tables. */
export async function insertPublishedVersion(
  db: Database,
  studyId: string,
  title: string,
  blocks: Block[],
): Promise<string> {
  const [questionnaire] = await db
    .insert(questionnaires)
    .values({ studyId, title })
    .returning({ id: questionnaires.id });
  const [version] = await db
    .insert(questionnaireVersions)
    .values({
      questionnaireId: questionnaire.id,
      version: 1,
      status: 'published',
      definition: { blocks },
      publishedAt: new Date(),
    })
    .returning({ id: questionnaireVersions.id });
  return version.id;
}

/**
 * Fills a study with the demo's solar-lantern interviews (invented data drawn from known
 * curves: shelf elasticity −1.4, logistic WTP with median 1500 KES), under fresh ids, accepted.
 */
export async function insertLanternData(db: Database, studyId: string): Promise<void> {
  const versions = {
    shelf: await insertPublishedVersion(db, studyId, 'Shop shelf check', shelfCheckBlocks),
    household: await insertPublishedVersion(
      db,
      studyId,
      'Household lantern interview',
      householdBlocks,
    ),
  };
  const points = await db
    .insert(samplingPoints)
    .values(
      lanternSites.map(({ interviews: _n, region, ...site }) => ({
        ...site,
        stratum: region,
        studyId,
      })),
    )
    .returning({ id: samplingPoints.id, code: samplingPoints.code });
  const pointIds = new Map(points.map((p) => [p.code, p.id]));
  const rows = lanternInterviews().map((i) => ({
    id: randomUUID(),
    studyId,
    questionnaireVersionId: versions[i.questionnaire],
    pointId: pointIds.get(i.site.code)!,
    status: 'accepted' as const,
    answers: i.answers,
    flags: i.flags,
    startedAt: i.startedAt,
    finishedAt: i.finishedAt,
  }));
  for (let k = 0; k < rows.length; k += 100)
    await db.insert(interviews).values(rows.slice(k, k + 100));
}
