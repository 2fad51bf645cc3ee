import { eq } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import type { Study } from '@shared/studies/study';
import type { StudyMember, StudyMemberCandidate } from '@shared/studies/study-member';
import { studies, studyMembers } from '../../server/db/schema';
import type { SignedInAgent } from '../support/signed-in-agent';
import { agentsFor, publishSmallQuestionnaire, validStudy } from '../support/study-agents';
import { insertPerson } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const testApp = createTestApp();
const { deps } = testApp;
let home: TestOrganisation;
let agents: Record<Role, SignedInAgent>;
let outsider: SignedInAgent;

beforeAll(async () => {
  home = await createTestOrganisation(deps.db, 'Studies home');
  agents = await agentsFor(testApp, home);
  const elsewhere = await createTestOrganisation(deps.db, 'Studies elsewhere');
  outsider = (await agentsFor(testApp, elsewhere)).researcher;
});

afterAll(async () => {
  await deps.db.$client.end();
});

async function createStudy(name = validStudy.name): Promise<Study> {
  const response = await agents.researcher.post('/api/studies', { ...validStudy, name });
  expect(response.status).toBe(201);
  return response.body as Study;
}

async function addMember(studyId: string, role: Role, roles: Role[] = [role]) {
  return agents.researcher.put(`/api/studies/${studyId}/members/${home.people[role].userId}`, {
    roles,
  });
}

const storedStudyCount = async (name: string) =>
  (await deps.db.select().from(studies).where(eq(studies.name, name))).length;

describe('creating a study', () => {
  it('stores the study and makes its creator a researcher on it', async () => {
    const study = await createStudy('Creation check');
    expect(study).toMatchObject({
      ...validStudy,
      name: 'Creation check',
      status: 'draft',
      myRoles: ['researcher'],
    });
    const members = await deps.db
      .select()
      .from(studyMembers)
      .where(eq(studyMembers.studyId, study.id));
    expect(members.map((m) => [m.userId, m.roles])).toEqual([
      [home.people.researcher.userId, ['researcher']],
    ]);
  });

  it.each([
    ['an unknown currency', { currency: 'ABC' }, 'currency'],
    ['a bad locale', { locale: 'not a locale' }, 'locale'],
    ['a target sample of zero', { targetSample: 0 }, 'targetSample'],
    ['a price range the wrong way round', { priceMaxMinor: 100 }, 'priceMaxMinor'],
    ['a fractional price', { priceMinMinor: 10.5 }, 'priceMinMinor'],
  ])('refuses %s with the field named, storing nothing', async (_label, change, path) => {
    const name = `Refused ${path}`;
    const response = await agents.researcher.post('/api/studies', {
      ...validStudy,
      ...change,
      name,
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues.map((i: { path: string }) => i.path)).toContain(path);
    expect(await storedStudyCount(name)).toBe(0);
  });

  it.each(['supervisor', 'enumerator', 'client', 'admin'] as const)(
    'is refused to someone who is only a %s',
    async (role) => {
      const response = await agents[role].post('/api/studies', {
        ...validStudy,
        name: `By ${role}`,
      });
      expect(response.status).toBe(403);
      expect(await storedStudyCount(`By ${role}`)).toBe(0);
    },
  );
});

describe('reading studies', () => {
  let study: Study;
  beforeAll(async () => {
    study = await createStudy('Reading check');
    await addMember(study.id, 'client');
  });

  it('lists only the studies the caller works on', async () => {
    const mine = (await agents.researcher.get('/api/studies')).body as Study[];
    expect(mine.map((s) => s.id)).toContain(study.id);
    const supervisorList = (await agents.supervisor.get('/api/studies')).body as Study[];
    expect(supervisorList.map((s) => s.id)).not.toContain(study.id);
    expect(((await outsider.get('/api/studies')).body as Study[]).map((s) => s.id)).not.toContain(
      study.id,
    );
  });

  it('shows a client member the study with their roles in it', async () => {
    const response = await agents.client.get(`/api/studies/${study.id}`);
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ id: study.id, myRoles: ['client'] });
  });

  it('answers 404 to non-members and to another organisation', async () => {
    expect((await agents.supervisor.get(`/api/studies/${study.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/studies/${study.id}`)).status).toBe(404);
  });
});

describe('editing a study', () => {
  let study: Study;
  beforeAll(async () => {
    study = await createStudy('Editing check');
    await addMember(study.id, 'supervisor');
  });

  it('changes the fields sent and keeps the rest', async () => {
    const response = await agents.researcher.patch(`/api/studies/${study.id}`, {
      market: 'Shops along an invented ring road',
      secondProductName: 'Replacement candle',
    });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      market: 'Shops along an invented ring road',
      secondProductName: 'Replacement candle',
      name: 'Editing check',
    });
    const cleared = await agents.researcher.patch(`/api/studies/${study.id}`, {
      secondProductName: null,
    });
    expect(cleared.body.secondProductName).toBeNull();
  });

  it('checks a new lowest price against the stored highest one', async () => {
    const response = await agents.researcher.patch(`/api/studies/${study.id}`, {
      priceMinMinor: 500000,
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('priceMinMinor');
    const [row] = await deps.db.select().from(studies).where(eq(studies.id, study.id));
    expect(row.priceMinMinor).toBe(validStudy.priceMinMinor);
  });

  it('keeps the currency once a questionnaire version is published', async () => {
    const locked = await createStudy('Currency lock');
    await publishSmallQuestionnaire(agents.researcher, locked.id);
    const response = await agents.researcher.patch(`/api/studies/${locked.id}`, {
      currency: 'UGX',
    });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('currency-locked');
    expect(
      (await agents.researcher.patch(`/api/studies/${locked.id}`, { name: 'Renamed' })).status,
    ).toBe(200);
  });

  it('is refused to a supervisor of the study', async () => {
    const response = await agents.supervisor.patch(`/api/studies/${study.id}`, { name: 'Renamed' });
    expect(response.status).toBe(403);
  });
});

describe('the study status', () => {
  it('goes into the field only once a questionnaire is published, then closes for good', async () => {
    const study = await createStudy('Status check');
    const path = `/api/studies/${study.id}/status`;
    const early = await agents.researcher.post(path, { status: 'in_field' });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toContain('Publish a questionnaire version');

    await publishSmallQuestionnaire(agents.researcher, study.id);

    expect((await agents.researcher.post(path, { status: 'in_field' })).body.status).toBe(
      'in_field',
    );
    expect((await agents.researcher.post(path, { status: 'draft' })).status).toBe(409);
    expect((await agents.researcher.post(path, { status: 'closed' })).body.status).toBe('closed');
    const reopen = await agents.researcher.post(path, { status: 'in_field' });
    expect(reopen.status).toBe(409);
    expect(reopen.body.error.message).toBe('A closed study cannot be reopened.');
  });

  it('refuses an unknown status with the field named', async () => {
    const study = await createStudy('Unknown status');
    const response = await agents.researcher.post(`/api/studies/${study.id}/status`, {
      status: 'paused',
    });
    expect(response.status).toBe(400);
    expect(response.body.error.issues[0].path).toBe('status');
  });
});

describe('study members', () => {
  let study: Study;
  beforeAll(async () => {
    study = await createStudy('Members check');
  });

  it('adds an organisation member with roles they hold, and lists them', async () => {
    const added = await addMember(study.id, 'enumerator');
    expect(added.status).toBe(200);
    expect(added.body).toMatchObject({
      userId: home.people.enumerator.userId,
      roles: ['enumerator'],
      organisationRoles: ['enumerator'],
    });
    const list = (await agents.researcher.get(`/api/studies/${study.id}/members`))
      .body as StudyMember[];
    expect(list.map((m) => m.userId).sort()).toEqual(
      [home.people.researcher.userId, home.people.enumerator.userId].sort(),
    );
    const candidates = (await agents.researcher.get(`/api/studies/${study.id}/member-candidates`))
      .body as StudyMemberCandidate[];
    expect(candidates.map((c) => c.userId)).toContain(home.people.supervisor.userId);
    expect(candidates.map((c) => c.userId)).not.toContain(home.people.enumerator.userId);
  });

  it('refuses a study role the person does not hold in the organisation', async () => {
    const response = await addMember(study.id, 'client', ['client', 'supervisor']);
    expect(response.status).toBe(400);
    expect(response.body.error.issues).toEqual([
      {
        path: 'roles.1',
        message: 'This person does not hold the supervisor role in the organisation',
      },
    ]);
  });

  it('refuses a person from another organisation', async () => {
    const stranger = await insertPerson(
      deps.db,
      (await createTestOrganisation(deps.db, 'Other')).id,
      'enumerator',
      'stranger',
    );
    const response = await agents.researcher.put(
      `/api/studies/${study.id}/members/${stranger.userId}`,
      { roles: ['enumerator'] },
    );
    expect(response.status).toBe(404);
  });

  it('keeps the last researcher', async () => {
    const response = await agents.researcher.delete(
      `/api/studies/${study.id}/members/${home.people.researcher.userId}`,
    );
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('last-researcher');
  });

  it('takes a member off the study', async () => {
    await addMember(study.id, 'client');
    const response = await agents.researcher.delete(
      `/api/studies/${study.id}/members/${home.people.client.userId}`,
    );
    expect(response.status).toBe(204);
    expect((await agents.client.get(`/api/studies/${study.id}`)).status).toBe(404);
  });

  it('lets a supervisor of the study read the members but not change them', async () => {
    await addMember(study.id, 'supervisor');
    expect((await agents.supervisor.get(`/api/studies/${study.id}/members`)).status).toBe(200);
    expect((await addMemberAs(agents.supervisor, study.id, home.people.client.userId)).status).toBe(
      403,
    );
  });
});

function addMemberAs(agent: SignedInAgent, studyId: string, userId: string) {
  return agent.put(`/api/studies/${studyId}/members/${userId}`, { roles: ['client'] });
}
