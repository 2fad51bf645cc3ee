import { eq } from 'drizzle-orm';
import type { Database } from '../db/database';
import { memberships, organisations, users } from '../db/schema';
import { demoOrganisationName, demoPeople } from './demo-people';
import { seedLanternStudy } from './lantern/seed-lantern-study';

/**
 * Loads the demo scenario once: the organisation and its people, then the solar-lantern study
 * with interviews drawn from known demand curves. Running it again changes nothing, so every
 * `npm start` may call it; a database from before the study existed gets the study added.
 */
export async function seedDemo(db: Database): Promise<void> {
  await db.transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: organisations.id })
      .from(organisations)
      .where(eq(organisations.name, demoOrganisationName));
    const organisationId = existing?.id ?? (await seedOrganisation(tx));
    await seedLanternStudy(tx, organisationId);
  });
}

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

async function seedOrganisation(tx: Tx): Promise<string> {
  const [organisation] = await tx
    .insert(organisations)
    .values({ name: demoOrganisationName })
    .returning({ id: organisations.id });
  for (const person of demoPeople) {
    const [user] = await tx
      .insert(users)
      .values({ email: person.email, name: person.name })
      .onConflictDoUpdate({ target: users.email, set: { name: person.name } })
      .returning({ id: users.id });
    await tx
      .insert(memberships)
      .values({ organisationId: organisation.id, userId: user.id, roles: person.roles });
  }
  return organisation.id;
}
