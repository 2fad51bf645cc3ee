import { randomUUID } from 'node:crypto';
import type { Role } from '@shared/auth/role';
import { roles } from '@shared/auth/role';
import type { Database } from '../../server/db/database';
import { memberships, organisations, users } from '../../server/db/schema';

export interface TestPerson {
  userId: string;
  email: string;
  name: string;
  roles: Role[];
}

export interface TestOrganisation {
  id: string;
  name: string;
  /** One member per role, keyed by that role. */
  people: Record<Role, TestPerson>;
}

/** A fresh organisation with one member per role; unique names keep parallel test files apart. */
export async function createTestOrganisation(
  db: Database,
  label = 'Test',
): Promise<TestOrganisation> {
  const suffix = randomUUID().slice(0, 8);
  const [organisation] = await db
    .insert(organisations)
    .values({ name: `${label} organisation ${suffix}` })
    .returning();
  const people = {} as Record<Role, TestPerson>;
  for (const role of roles) {
    const email = `${role}.${suffix}@example.test`;
    const name = `${role[0].toUpperCase()}${role.slice(1)} ${suffix}`;
    const [user] = await db.insert(users).values({ email, name }).returning({ id: users.id });
    await db
      .insert(memberships)
      .values({ organisationId: organisation.id, userId: user.id, roles: [role] });
    people[role] = { userId: user.id, email, name, roles: [role] };
  }
  return { id: organisation.id, name: organisation.name, people };
}
