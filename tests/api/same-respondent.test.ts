import { createHash } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import { interviewDetailSchema } from '@shared/field-sync/interview-detail';
import { respondentKeyFor } from '@shared/field-sync/respondent-key';
import { syncBatchResultSchema, type SyncItemResult } from '@shared/field-sync/sync-batch';
import { interviews } from '../../server/db/schema';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../support/field-setup';
import type { SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db } = testApp.deps;
let setup: FieldSetup;
let elsewhere: FieldSetup;

/** One phone number, typed two ways by the enumerator on two visits. */
const typedFirst = '+254 712 345 678';
const typedAgain = '254-712-345-678';

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Same respondent');
  elsewhere = await createFieldSetup(testApp, 'Same respondent elsewhere');
});

afterAll(async () => {
  await db.$client.end();
});

async function syncOne(agent: SignedInAgent, interview: FieldInterview) {
  const response = await agent.post('/api/field/sync', { interviews: [interview] });
  expect(response.status).toBe(200);
  const [result] = syncBatchResultSchema.parse(response.body).results;
  const [row] = await db.select().from(interviews).where(eq(interviews.id, interview.id));
  return { result, row };
}

const statusOf = (result: SyncItemResult) => (result.outcome === 'accepted' ? result.status : null);

describe('the same respondent, keyed on the device', () => {
  it('makes the key the device rule defines: SHA-256 of study and normalised reference', async () => {
    // Node's crypto.createHash as a second implementation of the documented rule.
    const expected = createHash('sha256')
      .update(`${setup.studyId}:254712345678`, 'utf8')
      .digest('base64url');
    expect(await respondentKeyFor(setup.studyId, typedFirst)).toBe(expected);
  });

  it('flags the second interview, in a later batch, as the same respondent as the first', async () => {
    const first = fieldInterview(setup, {
      respondentKey: await respondentKeyFor(setup.studyId, typedFirst),
    });
    const firstSync = await syncOne(setup.agents.enumerator, first);
    expect(statusOf(firstSync.result)).toBe('received');
    expect(firstSync.row.flags).toEqual([]);

    const second = fieldInterview(setup, {
      pointId: setup.points[1].id,
      respondentKey: await respondentKeyFor(setup.studyId, typedAgain),
    });
    const { result, row } = await syncOne(setup.agents.enumerator, second);
    expect(statusOf(result)).toBe('flagged');
    expect(row.flags).toEqual([{ kind: 'duplicate-respondent', otherInterviewIds: [first.id] }]);

    const response = await setup.agents.supervisor.get(
      `/api/studies/${setup.studyId}/interviews/${second.id}`,
    );
    expect(response.status).toBe(200);
    expect(interviewDetailSchema.parse(response.body).flags).toEqual([
      { kind: 'duplicate-respondent', otherInterviewIds: [first.id] },
    ]);
  });

  it('does not match the same reference typed in another study', async () => {
    const keyHere = await respondentKeyFor(setup.studyId, typedFirst);
    const keyThere = await respondentKeyFor(elsewhere.studyId, typedFirst);
    expect(keyThere).not.toBe(keyHere);
    const typedThere = await syncOne(
      elsewhere.agents.enumerator,
      fieldInterview(elsewhere, { respondentKey: keyThere }),
    );
    expect(statusOf(typedThere.result)).toBe('received');
    expect(typedThere.row.flags).toEqual([]);
    // Even the very key of the first study finds nothing outside it: matches stay in a study.
    const sameKey = await syncOne(
      elsewhere.agents.enumerator,
      fieldInterview(elsewhere, { respondentKey: keyHere }),
    );
    expect(sameKey.row.flags).toEqual([]);
  });
});
