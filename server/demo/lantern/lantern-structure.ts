import type { Database } from '../../db/database';
import { questionnaireVersions, questionnaires, routeStops, routes } from '../../db/schema';
import { lanternSites } from './lantern-sites';
import { lanternFieldwork } from './lantern-study';
import { lanternRegions } from './lantern-truths';

/** A transaction of the demo seed. */
export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** A questionnaire with one published version; returns the version's id. */
export async function publishedVersion(
  tx: Tx,
  studyId: string,
  title: string,
  blocks: unknown[],
  by: string,
) {
  const [questionnaire] = await tx
    .insert(questionnaires)
    .values({ studyId, title })
    .returning({ id: questionnaires.id });
  const [version] = await tx
    .insert(questionnaireVersions)
    .values({
      questionnaireId: questionnaire.id,
      version: 1,
      status: 'published',
      definition: { blocks },
      publishedAt: new Date(`${lanternFieldwork.start}T06:00:00Z`),
      publishedBy: by,
    })
    .returning({ id: questionnaireVersions.id });
  return version.id;
}

/** One route per region, assigned to the demo enumerator, every site of the region a stop. */
export async function insertRoutes(
  tx: Tx,
  studyId: string,
  pointIds: Map<string, string>,
  enumeratorId: string,
) {
  const end = new Date(
    Date.parse(`${lanternFieldwork.start}T00:00:00Z`) + lanternFieldwork.days * 86_400_000,
  );
  const ids = new Map<string, string>();
  for (const region of lanternRegions) {
    const [route] = await tx
      .insert(routes)
      .values({
        studyId,
        name: `${region} round`,
        enumeratorId,
        windowStart: lanternFieldwork.start,
        windowEnd: end.toISOString().slice(0, 10),
        assignedAt: new Date(`${lanternFieldwork.start}T06:00:00Z`),
      })
      .returning({ id: routes.id });
    const stops = lanternSites.filter((s) => s.region === region);
    await tx.insert(routeStops).values(
      stops.map((site, i) => ({
        routeId: route.id,
        studyId,
        pointId: pointIds.get(site.code)!,
        position: i + 1,
        quota: site.interviews,
      })),
    );
    ids.set(region, route.id);
  }
  return ids;
}
