import { randomUUID } from 'node:crypto';
import type { Role } from '@shared/auth/role';
import type { Database } from '../../server/db/database';
import { memberships, studies, studyMembers, users } from '../../server/db/schema';
import type { TestPerson } from './test-organisation';

/**
 * A study written straight into the tables, with its members, for tests of the features that
 * work inside a study (the study API has its own tests).
 */
export async function insertStudy(
  db: Database,
  organisationId: string,
  members: readonly { person: TestPerson; roles: Role[] }[],
  name = `Lamp pricing ${randomUUID().slice(0, 6)}`,
): Promise<string> {
  const [study] = await db
    .insert(studies)
    .values({
      organisationId,
      name,
      productName: 'Solar lamp',
      currency: 'KES',
      locale: 'en-KE',
      market: 'Two invented market towns on a lake shore',
      targetSample: 400,
      priceMinMinor: 50000,
      priceMaxMinor: 250000,
      status: 'draft',
    })
    .returning({ id: studies.id });
  if (members.length > 0) {
    await db
      .insert(studyMembers)
      .values(
        members.map(({ person, roles }) => ({ studyId: study.id, userId: person.userId, roles })),
      );
  }
  return study.id;
}

/** One more member of an organisation, e.g. a second enumerator. */
export async function insertPerson(
  db: Database,
  organisationId: string,
  role: Role,
  label: string,
): Promise<TestPerson> {
  const suffix = randomUUID().slice(0, 8);
  const email = `${label}.${suffix}@example.test`;
  const name = `${label[0].toUpperCase()}${label.slice(1)} ${suffix}`;
  const [user] = await db.insert(users).values({ email, name }).returning({ id: users.id });
  await db.insert(memberships).values({ organisationId, userId: user.id, roles: [role] });
  return { userId: user.id, email, name, roles: [role] };
}
