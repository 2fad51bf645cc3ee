import { roles, type Role } from '@shared/auth/role';
import type { createTestApp } from './test-app';
import { signedInAgent, type SignedInAgent } from './signed-in-agent';
import type { TestOrganisation } from './test-organisation';

/** One signed-in agent per role of a test organisation. */
export async function agentsFor(
  { app, deps }: ReturnType<typeof createTestApp>,
  organisation: TestOrganisation,
): Promise<Record<Role, SignedInAgent>> {
  const agents = {} as Record<Role, SignedInAgent>;
  for (const role of roles) {
    agents[role] = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
      userId: organisation.people[role].userId,
      organisationId: organisation.id,
    });
  }
  return agents;
}

/** A study body that passes the shared schema (an invented market). */
export const validStudy = {
  name: 'Water filter pricing',
  productName: 'Ceramic water filter',
  currency: 'KES',
  locale: 'en-KE',
  market: 'Households in two invented lakeside towns',
  targetSample: 300,
  priceMinMinor: 50000,
  priceMaxMinor: 400000,
};

/** The smallest questionnaire that can be published: consent and one question. */
export const smallDefinition = {
  blocks: [
    {
      id: 'consent',
      kind: 'consent',
      prompt: 'May I ask you a few questions?',
      statement: 'Your answers are used only for this study.',
      required: true,
    },
    {
      id: 'size',
      kind: 'household-size',
      prompt: 'How many people?',
      required: true,
      maxPeople: 20,
    },
  ],
};

/** Creates a questionnaire in the study, saves `smallDefinition` and publishes version 1. */
export async function publishSmallQuestionnaire(
  researcher: SignedInAgent,
  studyId: string,
): Promise<{ questionnaireId: string; base: string }> {
  const created = await researcher.post(`/api/studies/${studyId}/questionnaires`, {
    title: 'Main',
  });
  const questionnaireId = (created.body as { id: string }).id;
  const base = `/api/studies/${studyId}/questionnaires/${questionnaireId}`;
  const saved = await researcher.put(`${base}/draft`, { definition: smallDefinition });
  const published = await researcher.post(`${base}/versions/1/publish`);
  if (saved.status !== 200 || published.status !== 200) {
    throw new Error(
      `Publishing the small questionnaire failed: ${saved.status}, ${published.status}`,
    );
  }
  return { questionnaireId, base };
}
