import { and, count, eq } from 'drizzle-orm';
import { interviews, organisations, studies } from '../../server/db/schema';
import { demoOrganisationName } from '../../server/demo/demo-people';
import { lanternStudy } from '../../server/demo/lantern/lantern-study';
import { seedDemo } from '../../server/demo/seed-demo';
import { createTestApp } from '../support/test-app';

const { deps } = createTestApp();

afterAll(async () => {
  await deps.db.$client.end();
});

async function lanternCounts() {
  const found = await deps.db
    .select({ id: studies.id })
    .from(studies)
    .innerJoin(organisations, eq(organisations.id, studies.organisationId))
    .where(and(eq(organisations.name, demoOrganisationName), eq(studies.name, lanternStudy.name)));
  const [{ n }] = await deps.db
    .select({ n: count() })
    .from(interviews)
    .where(eq(interviews.studyId, found[0]?.id ?? '00000000-0000-4000-8000-000000000000'));
  return { studies: found.length, interviews: n };
}

it('loads the solar-lantern demo study once, however often the seed runs', async () => {
  // The test stack already ran the seed when it prepared the database.
  const before = await lanternCounts();
  expect(before).toEqual({ studies: 1, interviews: 72 + 240 });
  await seedDemo(deps.db);
  expect(await lanternCounts()).toEqual(before);
});
