import { eq } from 'drizzle-orm';
import type { Database } from '../db/database';
import { memberships, organisations, users } from '../db/schema';
import { demoOrganisationName, demoPeople } from './demo-people';

/**
 * Loads the demo scenario once: the organisation and its people. Running it again changes
 * nothing, so every `npm start` may call it.
 */
export async function seedDemo(db: Database): Promise<void> {
  await db.transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: organisations.id })
      .from(organisations)
      .where(eq(organisations.name, demoOrganisationName));
    if (existing) return;
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
  });
}
