import { and, eq, inArray, sql } from 'drizzle-orm';
import { interviews, samplingPoints, studies, studyMembers, users } from '../../db/schema';
import { demoPeople } from '../demo-people';
import { lanternInterviews } from './lantern-interviews';
import { householdBlocks, shelfCheckBlocks } from './lantern-questionnaires';
import { lanternSites } from './lantern-sites';
import { lanternStudy } from './lantern-study';
import { insertRoutes, publishedVersion, type Tx } from './lantern-structure';

/**
 * Adds the solar-lantern study to the demo organisation once: members, two published
 * questionnaires, points, a route per region and the accepted interviews. Idempotent.
 */
export async function seedLanternStudy(tx: Tx, organisationId: string): Promise<void> {
  const [existing] = await tx
    .select({ id: studies.id })
    .from(studies)
    .where(and(eq(studies.organisationId, organisationId), eq(studies.name, lanternStudy.name)));
  if (existing) return;
  const people = await demoUserIds(tx);
  const [study] = await tx
    .insert(studies)
    .values({ ...lanternStudy, organisationId, createdBy: people.researcher })
    .returning({ id: studies.id });
  await tx.insert(studyMembers).values(
    (['researcher', 'supervisor', 'enumerator', 'client'] as const).map((role) => ({
      studyId: study.id,
      userId: people[role],
      roles: [role],
    })),
  );
  const versions = {
    shelf: await publishedVersion(
      tx,
      study.id,
      'Shop shelf check',
      shelfCheckBlocks,
      people.researcher,
    ),
    household: await publishedVersion(
      tx,
      study.id,
      'Household lantern interview',
      householdBlocks,
      people.researcher,
    ),
  };
  const points = await tx
    .insert(samplingPoints)
    .values(
      lanternSites.map(({ interviews: _n, region, ...site }) => ({
        ...site,
        stratum: region,
        studyId: study.id,
      })),
    )
    .returning({ id: samplingPoints.id, code: samplingPoints.code });
  const pointIds = new Map(points.map((p) => [p.code, p.id]));
  const routeIds = await insertRoutes(tx, study.id, pointIds, people.enumerator);
  const rows = lanternInterviews().map((interview) => ({
    id: interview.id,
    studyId: study.id,
    questionnaireVersionId: versions[interview.questionnaire],
    routeId: routeIds.get(interview.site.region)!,
    pointId: pointIds.get(interview.site.code)!,
    enumeratorId: people.enumerator,
    status: 'accepted' as const,
    answers: interview.answers,
    flags: interview.flags,
    startedAt: interview.startedAt,
    finishedAt: interview.finishedAt,
    receivedAt: interview.finishedAt,
    completeAt: interview.finishedAt,
    reviewedBy: people.supervisor,
    reviewedAt: interview.finishedAt,
  }));
  for (let i = 0; i < rows.length; i += 100)
    await tx.insert(interviews).values(rows.slice(i, i + 100));
  await tx.execute(
    sql`SELECT refresh_shelf_observation_rows(ARRAY(SELECT id FROM interviews WHERE study_id = ${study.id}))`,
  );
}

async function demoUserIds(tx: Tx) {
  const emails = demoPeople.map((p) => p.email);
  const found = await tx
    .select({ id: users.id, email: users.email })
    .from(users)
    .where(inArray(users.email, emails));
  const idOf = (role: string) => {
    const email = demoPeople.find((p) => p.roles.includes(role as never))!.email;
    return found.find((u) => u.email === email)!.id;
  };
  return {
    researcher: idOf('researcher'),
    supervisor: idOf('supervisor'),
    enumerator: idOf('enumerator'),
    client: idOf('client'),
  };
}
