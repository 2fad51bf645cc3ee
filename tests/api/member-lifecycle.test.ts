import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { Role } from '@shared/auth/role';
import { accessPolicy } from '../../server/auth/access-policy';
import type { AccessRule } from '../../server/auth/access-rule';
import { memberships, studyMembers } from '../../server/db/schema';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { insertPerson, insertStudy } from '../support/study-rows';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
const { db } = deps;

afterAll(async () => {
  await db.$client.end();
});

/** One organisation per case: the person under test, an admin-researcher who acts, and a study. */
interface Setting {
  organisation: TestOrganisation;
  keeper: SignedInAgent;
  person: SignedInAgent;
  userId: string;
  studyId: string;
}

const studyRolesOfPeople: Record<Exclude<Role, 'admin'>, Role[]> = {
  researcher: ['researcher'],
  supervisor: ['supervisor'],
  enumerator: ['enumerator'],
  client: ['client'],
};

async function setting(role: Role): Promise<Setting> {
  const organisation = await createTestOrganisation(db, `Lifecycle ${role}`);
  const keeperPerson = await insertPerson(db, organisation.id, 'admin', 'keeper');
  await db
    .update(memberships)
    .set({ roles: ['admin', 'researcher'] })
    .where(eq(memberships.userId, keeperPerson.userId));
  const members = [
    { person: keeperPerson, roles: ['researcher'] as Role[] },
    ...(Object.keys(studyRolesOfPeople) as (keyof typeof studyRolesOfPeople)[]).map((r) => ({
      person: organisation.people[r],
      roles: studyRolesOfPeople[r],
    })),
  ];
  const studyId = await insertStudy(db, organisation.id, members);
  const sign = (userId: string) =>
    signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId,
      organisationId: organisation.id,
    });
  const userId = organisation.people[role].userId;
  return {
    organisation,
    keeper: await sign(keeperPerson.userId),
    person: await sign(userId),
    userId,
    studyId,
  };
}

/** A concrete path for a rule: the setting's study where the rule names one, else fresh UUIDs. */
const pathFor = (rule: AccessRule, studyId: string) =>
  rule.path.replace(/:(\w+)/g, (_m, name: string) => (name === 'studyId' ? studyId : randomUUID()));

function call(agent: SignedInAgent, rule: AccessRule, studyId: string) {
  const path = pathFor(rule, studyId);
  if (rule.method === 'GET') return agent.get(path);
  const method = rule.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
  return agent[method](path, {});
}

const rolesOf = (rule: AccessRule): readonly Role[] =>
  Array.isArray(rule.access) ? (rule.access as readonly Role[]) : [];

/** What a call answered, when it was not what the case expects. */
interface Mismatch {
  route: string;
  expected: string;
  got: string;
}

async function checkRoutes(
  agent: SignedInAgent,
  studyId: string,
  expectations: readonly Expectation[],
): Promise<Mismatch[]> {
  const mismatches: Mismatch[] = [];
  for (const { rule, expect: expected } of expectations) {
    const response = await call(agent, rule, studyId);
    const body = response.body as { error?: { code?: string; message?: string } };
    const ok =
      expected === 'forbidden'
        ? response.status === 403 && body.error?.code === 'forbidden'
        : expected === 'no-study'
          ? response.status === 404 && body.error?.message === 'That study was not found.'
          : response.status === 401 && body.error?.code === 'session-ended';
    if (!ok)
      mismatches.push({
        route: `${rule.method} ${rule.path}`,
        expected,
        got: `${response.status} ${JSON.stringify(body.error ?? {})}`,
      });
  }
  return mismatches;
}

type Expectation = { rule: AccessRule; expect: 'forbidden' | 'no-study' | 'session-ended' };

/** Routes the role opened, and what each must answer once the person holds only `now`. */
function afterDemotion(role: Role, now: readonly Role[]): Expectation[] {
  return accessPolicy.flatMap((rule): Expectation[] => {
    const allowed = rolesOf(rule);
    if (!allowed.includes(role)) return [];
    if (!allowed.some((r) => now.includes(r))) return [{ rule, expect: 'forbidden' as const }];
    // Still open to a remaining role at organisation level: inside the study, the study role
    // that went with the old organisation role must be gone too.
    if (rule.scope === 'study') return [{ rule, expect: 'no-study' as const }];
    return [];
  });
}

const demotions: readonly [Role, Role[]][] = [
  ['admin', ['enumerator']],
  ['supervisor', ['enumerator']],
  ['researcher', ['enumerator']],
  ['enumerator', ['client']],
  ['client', ['enumerator']],
];

describe('demoting a member of each role', () => {
  it.each(demotions)(
    'a former %s now holding %j loses every route of the old role, study routes included',
    async (role, now) => {
      const s = await setting(role);
      // Before: the person reaches what the role gives them.
      const before = role === 'admin' ? '/api/members' : `/api/studies/${s.studyId}`;
      expect((await s.person.get(before)).status).toBe(200);

      const demoted = await s.keeper.put(`/api/members/${s.userId}/roles`, { roles: now });
      expect(demoted.status).toBe(204);

      const [row] = await db
        .select({ roles: studyMembers.roles })
        .from(studyMembers)
        .where(and(eq(studyMembers.studyId, s.studyId), eq(studyMembers.userId, s.userId)));
      // Each person held one study role, the one their old organisation role allowed: it goes.
      expect(row).toBeUndefined();
      expect(await checkRoutes(s.person, s.studyId, afterDemotion(role, now))).toEqual([]);
    },
  );

  it('keeps the study roles the remaining organisation roles still allow', async () => {
    const s = await setting('supervisor');
    await db
      .update(memberships)
      .set({ roles: ['supervisor', 'enumerator'] })
      .where(eq(memberships.userId, s.userId));
    await db
      .update(studyMembers)
      .set({ roles: ['supervisor', 'enumerator'] })
      .where(eq(studyMembers.userId, s.userId));
    const demoted = await s.keeper.put(`/api/members/${s.userId}/roles`, { roles: ['enumerator'] });
    expect(demoted.status).toBe(204);
    const [row] = await db
      .select({ roles: studyMembers.roles })
      .from(studyMembers)
      .where(eq(studyMembers.userId, s.userId));
    expect(row?.roles).toEqual(['enumerator']);
    expect((await s.person.get(`/api/studies/${s.studyId}`)).status).toBe(200);
    expect((await s.person.get(`/api/studies/${s.studyId}/review`)).status).toBe(403);
  });

  it('refuses to demote the last researcher of a study with 409 naming the study', async () => {
    const s = await setting('researcher');
    await db
      .delete(studyMembers)
      .where(and(eq(studyMembers.studyId, s.studyId), eq(studyMembers.roles, ['researcher'])));
    await db
      .insert(studyMembers)
      .values({ studyId: s.studyId, userId: s.userId, roles: ['researcher'] });
    const response = await s.keeper.put(`/api/members/${s.userId}/roles`, { roles: ['client'] });
    expect(response.status).toBe(409);
    expect(response.body).toMatchObject({ error: { code: 'last-researcher' } });
    const [kept] = await db.select().from(memberships).where(eq(memberships.userId, s.userId));
    expect(kept.roles).toEqual(['researcher']);
  });
});

/** Study rows left from before the rule (written straight into the table) grant nothing. */
const staleRows: readonly [Role, Role][] = [
  ['client', 'enumerator'],
  ['researcher', 'enumerator'],
  ['supervisor', 'client'],
  ['enumerator', 'client'],
];

describe('a stale study role the organisation no longer gives', () => {
  it.each(staleRows)(
    'a %s study row of someone now only %s opens no study route',
    async (role, now) => {
      const s = await setting(role);
      // Changed behind the API's back: the study row still says the old role.
      await db
        .update(memberships)
        .set({ roles: [now] })
        .where(eq(memberships.userId, s.userId));
      const expectations = afterDemotion(role, [now]);
      expect(expectations.some((e) => e.expect === 'no-study')).toBe(true);
      expect(await checkRoutes(s.person, s.studyId, expectations)).toEqual([]);
      const listed = (await s.person.get('/api/studies')).body as { id: string }[];
      expect(listed.map((study) => study.id)).not.toContain(s.studyId);
    },
  );
});

const studyRoles = ['researcher', 'supervisor', 'enumerator', 'client'] as const;

describe('taking a member of each study role off the study', () => {
  it.each(studyRoles)('a %s taken off answers 404 on every study route', async (role) => {
    const s = await setting(role);
    expect((await s.person.get(`/api/studies/${s.studyId}`)).status).toBe(200);
    const removed = await s.keeper.delete(`/api/studies/${s.studyId}/members/${s.userId}`);
    expect(removed.status).toBe(204);
    const expectations = accessPolicy
      .filter((rule) => rule.scope === 'study' && rolesOf(rule).includes(role))
      .map((rule) => ({ rule, expect: 'no-study' as const }));
    expect(await checkRoutes(s.person, s.studyId, expectations)).toEqual([]);
  });
});

const everyRole = ['admin', 'supervisor', 'researcher', 'enumerator', 'client'] as const;

describe('deactivating a member of each role', () => {
  it.each(everyRole)(
    'a deactivated %s is refused on every route, keeps their history and can be reactivated',
    async (role) => {
      const s = await setting(role);
      const response = await s.keeper.post(`/api/members/${s.userId}/deactivate`);
      expect(response.status).toBe(204);

      const signedIn = accessPolicy
        .filter((rule) => rule.access !== 'public' && rule.access !== 'token')
        .map((rule) => ({ rule, expect: 'session-ended' as const }));
      expect(await checkRoutes(s.person, s.studyId, signedIn)).toEqual([]);
      const ended = await s.person.get('/api/session');
      expect((ended.body as { error: { message: string } }).error.message).toMatch(/deactivated/);

      // A session made afterwards (as a sign-in would) gets nothing either.
      const again = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
        userId: s.userId,
        organisationId: s.organisation.id,
      });
      expect((await again.get('/api/session')).status).toBe(401);

      // History kept: the membership stays, marked; the study roles are gone.
      const [membership] = await db
        .select()
        .from(memberships)
        .where(eq(memberships.userId, s.userId));
      expect(membership.roles).toEqual([role]);
      expect(membership.deactivatedAt).toBeInstanceOf(Date);
      const rows = await db.select().from(studyMembers).where(eq(studyMembers.userId, s.userId));
      expect(rows).toEqual([]);
      const listed = (await s.keeper.get('/api/members')).body as {
        userId: string;
        deactivatedAt: string | null;
      }[];
      expect(listed.find((m) => m.userId === s.userId)?.deactivatedAt).not.toBeNull();

      const reactivated = await s.keeper.post(`/api/members/${s.userId}/reactivate`);
      expect(reactivated.status).toBe(204);
      const back = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
        userId: s.userId,
        organisationId: s.organisation.id,
      });
      expect((await back.get('/api/session')).body).toMatchObject({ roles: [role] });
      // Study roles are not given back by reactivation.
      if (role !== 'admin') expect((await back.get(`/api/studies/${s.studyId}`)).status).toBe(404);
    },
  );

  it('refuses to deactivate the last administrator, or oneself', async () => {
    const organisation = await createTestOrganisation(db, 'Lifecycle last admin');
    const admin = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: organisation.people.admin.userId,
      organisationId: organisation.id,
    });
    const self = await admin.post(`/api/members/${organisation.people.admin.userId}/deactivate`);
    expect(self.status).toBe(409);
    expect((await admin.get('/api/members')).status).toBe(200);
  });
});

describe('signing out everywhere', () => {
  it('ends every other session of the person, which then says why', async () => {
    const s = await setting('enumerator');
    const phone = await signedInAgent(app, db, deps.config.SESSION_SECRET, {
      userId: s.userId,
      organisationId: s.organisation.id,
    });
    const response = await s.person.post('/api/session/sign-out-everywhere');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ endedSessions: 1 });
    const refused = await phone.get('/api/field/assignments');
    expect(refused.status).toBe(401);
    expect(refused.body).toMatchObject({ error: { code: 'session-ended' } });
    // Someone else's sessions are untouched.
    expect((await s.keeper.get('/api/members')).status).toBe(200);
  });
});
