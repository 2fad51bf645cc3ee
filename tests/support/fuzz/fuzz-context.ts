import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { questionnaireVersions } from '../../../server/db/schema';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../field-setup';
import { agentsFor } from '../study-agents';
import type { createTestApp } from '../test-app';
import type { SignedInAgent } from '../signed-in-agent';
import type { Role } from '@shared/auth/role';

/** A study in the field with everything a write route's path and body can name. */
export interface FuzzContext {
  setup: FieldSetup;
  agents: Record<Role, SignedInAgent>;
  questionnaireId: string;
  draftVersion: number;
  /** A stored interview of the study (for review actions). */
  interviewId: string;
}

export async function createFuzzContext(
  testApp: ReturnType<typeof createTestApp>,
): Promise<FuzzContext> {
  const setup = await createFieldSetup(testApp, 'Write-route fuzz');
  const agents = await agentsFor(testApp, setup.organisation);
  const [draft] = await testApp.deps.db
    .select({
      questionnaireId: questionnaireVersions.questionnaireId,
      version: questionnaireVersions.version,
    })
    .from(questionnaireVersions)
    .where(eq(questionnaireVersions.id, setup.draftVersionId));
  const interview = fieldInterview(setup);
  const synced = await setup.agents.enumerator.post('/api/field/sync', { interviews: [interview] });
  if (synced.status !== 200 || !draft) throw new Error('The fuzz study could not be set up');
  return {
    setup,
    agents,
    questionnaireId: draft.questionnaireId,
    draftVersion: draft.version,
    interviewId: interview.id,
  };
}

/** The value each path parameter takes in a well-formed call. */
export function pathParameter(name: string, context: FuzzContext): string {
  const { setup } = context;
  const values: Record<string, string> = {
    studyId: setup.studyId,
    questionnaireId: context.questionnaireId,
    version: String(context.draftVersion),
    routeId: setup.routeId,
    // A member the fuzz agents do not sign in as: deactivating them leaves every route reachable.
    userId: setup.secondEnumerator.userId,
    interviewId: context.interviewId,
  };
  return values[name] ?? randomUUID(); // ids of things made per call (tokens, photos …)
}
