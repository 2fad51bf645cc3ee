import { count, eq } from 'drizzle-orm';
import { fieldDeviceSchema, type FieldDevice } from '@shared/field-sync/field-device';
import { apiErrorSchema } from '@shared/http/api-error';
import { fieldDevices, interviews } from '../../server/db/schema';
import { createFieldSetup, fieldInterview, type FieldSetup } from '../support/field-setup';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';

// A lost phone: the study's supervisor (or an admin) sees each enumerator device, what it last
// sent and what it still held, and signs it out; the phone is told why at its next call.
const testApp = createTestApp();
const { app } = testApp;
const { db } = testApp.deps;
let setup: FieldSetup;
let admin: SignedInAgent;

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Field devices');
  admin = await signedInAgent(app, db, testApp.deps.config.SESSION_SECRET, {
    userId: setup.organisation.people.admin.userId,
    organisationId: setup.organisation.id,
  });
});

afterAll(async () => {
  await db.$client.end();
});

const devicesPath = () => `/api/studies/${setup.studyId}/devices`;

async function listDevices(agent: SignedInAgent): Promise<FieldDevice[]> {
  const response = await agent.get(devicesPath());
  expect(response.status).toBe(200);
  return fieldDeviceSchema.array().parse(response.body);
}

async function syncFrom(agent: SignedInAgent, phone: string, outboxCount: number) {
  return agent
    .post('/api/field/sync', { interviews: [fieldInterview(setup)], outboxCount })
    .set('User-Agent', phone);
}

describe('a study’s field devices', () => {
  it('lists each device with what it last sent, what was stored and what it still held', async () => {
    expect((await syncFrom(setup.agents.enumerator, 'Phone A (test)', 7)).status).toBe(200);
    const [device] = (await listDevices(setup.agents.supervisor)).filter(
      (d) => d.label === 'Phone A (test)',
    );
    expect(device).toMatchObject({
      enumeratorName: setup.organisation.people.enumerator.name,
      lastSyncSent: 1,
      lastSyncAccepted: 1,
      queuedAtLastSync: 7,
      signedOutAt: null,
    });
    // An admin sees the same list.
    expect((await listDevices(admin)).map((d) => d.id)).toContain(device.id);
  });

  it('is closed to researchers, clients and enumerators, and to supervisors of other studies', async () => {
    for (const agent of [setup.agents.researcher, setup.agents.client, setup.agents.enumerator]) {
      expect((await agent.get(devicesPath())).status).toBe(403);
    }
    const other = await setup.agents.supervisor.get(`/api/studies/${setup.otherStudyId}/devices`);
    expect(other.status).toBe(404);
  });

  it('signs one device out: its next sync is refused with the reason, nothing is lost', async () => {
    expect((await syncFrom(setup.agents.second, 'Phone B (test)', 0)).status).toBe(200);
    const listed = await listDevices(setup.agents.supervisor);
    const phoneA = listed.find((d) => d.label === 'Phone A (test)')!;
    const storedBefore = await storedCount();

    const signOut = await setup.agents.supervisor.post(`${devicesPath()}/${phoneA.id}/sign-out`);
    expect(signOut.status).toBe(200);
    expect(fieldDeviceSchema.parse(signOut.body).signedOutAt).not.toBeNull();

    const refused = await syncFrom(setup.agents.enumerator, 'Phone A (test)', 6);
    expect(refused.status).toBe(401);
    expect(apiErrorSchema.parse(refused.body).error.message).toMatch(
      /signed out by an administrator or supervisor/,
    );
    expect(await storedCount()).toBe(storedBefore);
    // The other enumerator's phone goes on syncing.
    expect((await syncFrom(setup.agents.second, 'Phone B (test)', 0)).status).toBe(200);
    // Signing out twice changes nothing.
    const again = await setup.agents.supervisor.post(`${devicesPath()}/${phoneA.id}/sign-out`);
    expect(again.status).toBe(200);
    expect(again.body.signedOutAt).toBe(signOut.body.signedOutAt);
  });

  it('answers a malformed device id with 400 naming it, and an unknown one with 404', async () => {
    const malformed = await setup.agents.supervisor.post(`${devicesPath()}/not-a-uuid/sign-out`);
    expect(malformed.status).toBe(400);
    expect(JSON.stringify(malformed.body)).toMatch(/deviceId/);
    const unknown = await setup.agents.supervisor.post(
      `${devicesPath()}/00000000-0000-4000-8000-000000000000/sign-out`,
    );
    expect(unknown.status).toBe(404);
    const [{ signedOut }] = await db
      .select({ signedOut: count(fieldDevices.signedOutAt) })
      .from(fieldDevices)
      .where(eq(fieldDevices.organisationId, setup.organisation.id));
    expect(signedOut).toBe(1);
  });
});

async function storedCount(): Promise<number> {
  const [{ stored }] = await db
    .select({ stored: count() })
    .from(interviews)
    .where(eq(interviews.studyId, setup.studyId));
  return stored;
}
