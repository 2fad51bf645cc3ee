import { eq } from 'drizzle-orm';
import request from 'supertest';
import type { IssuedApiToken, OrganisationApiToken } from '@shared/analysis/api-token';
import { apiErrorSchema } from '@shared/http/api-error';
import { apiTokens, fits, memberships, scheduleVersions } from '../../server/db/schema';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
const { db } = deps;
let organisation: TestOrganisation;
let elsewhere: TestOrganisation;
let studyA: string;
let studyB: string;
let versionA: string;
let versionB: string;
const as = {} as Record<'admin' | 'client' | 'outsiderAdmin' | 'keeper', SignedInAgent>;

/** A published schedule row written straight in (the publishing flow has its own tests). */
async function insertVersion(studyId: string): Promise<string> {
  const [fit] = await db
    .insert(fits)
    .values({ studyId, spec: {}, status: 'done' })
    .returning({ id: fits.id });
  const [row] = await db
    .insert(scheduleVersions)
    .values({
      studyId,
      fitId: fit.id,
      version: 1,
      title: 'Lamp schedule',
      method: 'price-ladder',
      spec: {},
      n: 40,
      dataHash: 'a'.repeat(64),
      schedule: { rows: [] },
      publishedByName: 'Keeper',
    })
    .returning({ id: scheduleVersions.id });
  return row.id;
}

beforeAll(async () => {
  organisation = await createTestOrganisation(db, 'Tokens');
  elsewhere = await createTestOrganisation(db, 'Tokens elsewhere');
  const { people } = organisation;
  const keeper = await insertPerson(db, organisation.id, 'admin', 'tokenkeeper');
  studyA = await insertStudy(db, organisation.id, [
    { person: people.researcher, roles: ['researcher'] },
    { person: people.client, roles: ['client'] },
  ]);
  studyB = await insertStudy(db, organisation.id, [
    { person: people.researcher, roles: ['researcher'] },
    { person: people.client, roles: ['client'] },
  ]);
  versionA = await insertVersion(studyA);
  versionB = await insertVersion(studyB);
  const sign = (userId: string, organisationId = organisation.id) =>
    signedInAgent(app, db, deps.config.SESSION_SECRET, { userId, organisationId });
  as.admin = await sign(people.admin.userId);
  as.keeper = await sign(keeper.userId);
  as.client = await sign(people.client.userId);
  as.outsiderAdmin = await sign(elsewhere.people.admin.userId, elsewhere.id);
});

afterAll(async () => {
  await db.$client.end();
});

const issue = async (body: object) => {
  const response = await as.client.post('/api/portal/tokens', body);
  expect(response.status).toBe(201);
  return response.body as IssuedApiToken;
};
const withToken = (path: string, token: string) =>
  request(app).get(path).set('Authorization', `Bearer ${token}`);
const listedIds = async (token: string) =>
  ((await withToken('/api/v1/schedules', token)).body as { id: string }[]).map((v) => v.id);
const issuePaths = (body: unknown) =>
  (apiErrorSchema.parse(body).error.issues ?? []).map((issue) => issue.path);
const dayMs = 86_400_000;

describe('expiry', () => {
  it('defaults to 90 days and takes a chosen lifetime up to 365 days', async () => {
    const plain = await issue({ name: 'Workbook' });
    const expected = Date.now() + 90 * dayMs; // the documented default
    expect(Math.abs(Date.parse(plain.expiresAt) - expected)).toBeLessThan(60_000);
    const year = await issue({ name: 'Yearly', expiresInDays: 365 });
    expect(Math.abs(Date.parse(year.expiresAt) - (Date.now() + 365 * dayMs))).toBeLessThan(60_000);
  });

  it.each([0, 366, 1.5, '30'])(
    'refuses a lifetime of %j with 400 naming expiresInDays',
    async (days) => {
      const before = await db.$count(apiTokens);
      const response = await as.client.post('/api/portal/tokens', {
        name: 'x',
        expiresInDays: days,
      });
      expect(response.status).toBe(400);
      expect(issuePaths(response.body)).toContain('expiresInDays');
      expect(await db.$count(apiTokens)).toBe(before);
    },
  );

  it('answers 401 saying the token expired', async () => {
    const token = await issue({ name: 'Short', expiresInDays: 1 });
    expect((await withToken('/api/v1/schedules', token.token)).status).toBe(200);
    await db
      .update(apiTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(apiTokens.id, token.id));
    const response = await withToken('/api/v1/schedules', token.token);
    expect(response.status).toBe(401);
    expect(response.body.error.message).toMatch(/expired on \d{4}-\d{2}-\d{2}/);
  });
});

describe('names', () => {
  it.each(['bad\u0000name', 'tab\tname', 'half \uD83D emoji', ' ', 'x'.repeat(101)])(
    'refuses the name %j with 400 naming name',
    async (name) => {
      const response = await as.client.post('/api/portal/tokens', { name });
      expect(response.status).toBe(400);
      expect(issuePaths(response.body)).toContain('name');
    },
  );
});

describe('restriction to chosen studies', () => {
  it('reaches only the chosen study’s schedules', async () => {
    const all = await issue({ name: 'All studies' });
    expect(await listedIds(all.token)).toEqual(expect.arrayContaining([versionA, versionB]));
    const onlyA = await issue({ name: 'Study A only', studyIds: [studyA] });
    expect(onlyA.studyIds).toEqual([studyA]);
    expect(await listedIds(onlyA.token)).toEqual([versionA]);
    expect((await withToken(`/api/v1/schedules/${versionB}`, onlyA.token)).status).toBe(404);
    expect((await withToken(`/api/v1/schedules/${versionA}`, onlyA.token)).status).toBe(200);
  });

  it('refuses a study the client may not read with 400 naming studyIds.1', async () => {
    const foreign = await insertStudy(db, organisation.id, []);
    const response = await as.client.post('/api/portal/tokens', {
      name: 'Sneaky',
      studyIds: [studyA, foreign],
    });
    expect(response.status).toBe(400);
    expect(issuePaths(response.body)).toEqual(['studyIds.1']);
  });
});

describe('the admin view', () => {
  it('lists every token of the organisation with its owner, and none of another', async () => {
    const token = await issue({ name: 'Listed' });
    const listed = (await as.admin.get('/api/admin/tokens')).body as OrganisationApiToken[];
    const mine = listed.find((t) => t.id === token.id);
    expect(mine).toMatchObject({ ownerEmail: organisation.people.client.email, revokedAt: null });
    expect(JSON.stringify(listed)).not.toContain(token.token);
    const theirs = (await as.outsiderAdmin.get('/api/admin/tokens')).body as OrganisationApiToken[];
    expect(theirs.map((t) => t.id)).not.toContain(token.id);
  });

  it('revokes another person’s token; the token then answers 401 saying so', async () => {
    const token = await issue({ name: 'To revoke' });
    expect((await as.outsiderAdmin.delete(`/api/admin/tokens/${token.id}`)).status).toBe(404);
    const revoked = await as.admin.delete(`/api/admin/tokens/${token.id}`);
    expect(revoked.status).toBe(200);
    expect(revoked.body).toMatchObject({ revokedReason: 'admin' });
    const response = await withToken('/api/v1/schedules', token.token);
    expect(response.status).toBe(401);
    expect(response.body.error.message).toMatch(/an administrator revoked it/);
  });

  it('is open to admins only', async () => {
    expect((await as.client.get('/api/admin/tokens')).status).toBe(403);
  });
});

describe('automatic revocation', () => {
  it('revokes the tokens when the client role is taken away', async () => {
    const person = await insertPerson(db, organisation.id, 'client', 'demotedclient');
    const agent = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: person.userId,
      organisationId: organisation.id,
    });
    const token = (await agent.post('/api/portal/tokens', { name: 'Soon gone' }))
      .body as IssuedApiToken;
    expect((await withToken('/api/v1/schedules', token.token)).status).toBe(200);
    const demoted = await as.keeper.put(`/api/members/${person.userId}/roles`, {
      roles: ['enumerator'],
    });
    expect(demoted.status).toBe(204);
    const response = await withToken('/api/v1/schedules', token.token);
    expect(response.status).toBe(401);
    expect(response.body.error.message).toMatch(/no longer holds the client role/);
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, token.id));
    expect(row.revokedReason).toBe('role-removed');
  });

  it('revokes the tokens when the member is deactivated', async () => {
    const person = await insertPerson(db, organisation.id, 'client', 'leavingclient');
    const agent = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: person.userId,
      organisationId: organisation.id,
    });
    const token = (await agent.post('/api/portal/tokens', { name: 'Leaving' }))
      .body as IssuedApiToken;
    expect((await as.keeper.post(`/api/members/${person.userId}/deactivate`)).status).toBe(204);
    const response = await withToken('/api/v1/schedules', token.token);
    expect(response.status).toBe(401);
    expect(response.body.error.message).toMatch(/deactivated/);
  });

  it('refuses a live token whose owner lost the client role behind the API’s back', async () => {
    const person = await insertPerson(db, organisation.id, 'client', 'staleclient');
    const agent = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: person.userId,
      organisationId: organisation.id,
    });
    const token = (await agent.post('/api/portal/tokens', { name: 'Stale' }))
      .body as IssuedApiToken;
    await db
      .update(memberships)
      .set({ roles: ['enumerator'] })
      .where(eq(memberships.userId, person.userId));
    expect((await withToken('/api/v1/schedules', token.token)).status).toBe(401);
  });
});
