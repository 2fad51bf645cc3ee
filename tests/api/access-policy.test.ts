import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { roles, type Role } from '@shared/auth/role';
import { accessPolicy } from '../../server/auth/access-policy';
import type { AccessRule } from '../../server/auth/access-rule';
import { invitations, memberships } from '../../server/db/schema';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
let organisation: TestOrganisation;
const agents = {} as Record<Role, SignedInAgent>;

beforeAll(async () => {
  organisation = await createTestOrganisation(deps.db, 'Access policy');
  for (const role of roles) {
    agents[role] = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
      userId: organisation.people[role].userId,
      organisationId: organisation.id,
    });
  }
});

afterAll(async () => {
  await deps.db.$client.end();
});

/** A concrete path for a rule: every `:param` becomes a fresh UUID. */
const concretePath = (rule: AccessRule) => rule.path.replace(/:\w+/g, () => randomUUID());
const isWrite = (rule: AccessRule) => rule.method !== 'GET';

type WriteMethod = 'post' | 'put' | 'patch' | 'delete';
const writeMethod = (rule: AccessRule) => rule.method.toLowerCase() as WriteMethod;

/** Writes carry an empty JSON body; signed out there is no session, so no CSRF token either. */
function callSignedOut(rule: AccessRule): request.Test {
  const path = concretePath(rule);
  return isWrite(rule) ? request(app)[writeMethod(rule)](path).send({}) : request(app).get(path);
}

function callAs(agent: SignedInAgent, rule: AccessRule): request.Test {
  const path = concretePath(rule);
  return isWrite(rule) ? agent[writeMethod(rule)](path, {}) : agent.get(path);
}

const allows = (rule: AccessRule, role: Role) =>
  rule.access === 'public' || rule.access === 'signed-in' || rule.access.includes(role);

const signedOutCases = accessPolicy.map((rule) => [rule.method, rule.path, rule] as const);
const roleCases = accessPolicy.flatMap((rule) =>
  roles.map((role) => [rule.method, rule.path, role, allows(rule, role), rule] as const),
);

describe('the access policy', () => {
  it('lists at least the foundation routes', () => {
    expect(accessPolicy.length).toBeGreaterThanOrEqual(6);
  });

  it.each(signedOutCases)(
    '%s %s answers a signed-out caller as its rule says',
    async (_m, _p, rule) => {
      const response = await callSignedOut(rule);
      if (rule.access === 'public') {
        expect([401, 403]).not.toContain(response.status);
      } else {
        expect(response.status).toBe(401);
        expect(response.body).toMatchObject({ error: { code: 'not-signed-in' } });
      }
    },
  );

  it.each(roleCases)(
    '%s %s as %s (allowed: %s) is let through or refused',
    async (_m, _p, role, allowed, rule) => {
      const response = await callAs(agents[role], rule);
      if (allowed) {
        expect([401, 403]).not.toContain(response.status);
      } else {
        expect(response.status).toBe(403);
        expect(response.body).toMatchObject({ error: { code: 'forbidden' } });
      }
    },
  );
});

describe('paths and credentials outside the policy', () => {
  it.each(['GET', 'POST'] as const)(
    'answers %s on an /api path not in the policy with 404 JSON',
    async (method) => {
      const test =
        method === 'GET'
          ? agents.admin.get('/api/no-such-route')
          : agents.admin.post('/api/no-such-route', {});
      const response = await test;
      expect(response.status).toBe(404);
      expect(response.headers['content-type']).toMatch(/application\/json/);
      expect(response.body).toMatchObject({ error: { code: 'not-found' } });
    },
  );

  it('answers an unknown /api path signed out with 404 JSON, not the app shell', async () => {
    const response = await request(app).get('/api/members/extra/segments');
    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/application\/json/);
  });

  it('treats a session cookie with one changed signature character as signed out, changing nothing', async () => {
    const admin = agents.admin;
    const enumerator = organisation.people.enumerator;
    const tampered = tamperSignature(admin.cookie);
    expect(tampered).not.toBe(admin.cookie);

    const session = await request(app).get('/api/session').set('Cookie', tampered);
    expect(session.status).toBe(401);
    const change = await request(app)
      .put(`/api/members/${enumerator.userId}/roles`)
      .set('Cookie', tampered)
      .set('x-csrf-token', admin.csrfToken)
      .send({ roles: ['admin'] });
    expect(change.status).toBe(401);

    const [row] = await deps.db
      .select({ roles: memberships.roles })
      .from(memberships)
      .where(
        and(
          eq(memberships.organisationId, organisation.id),
          eq(memberships.userId, enumerator.userId),
        ),
      );
    expect(row?.roles).toEqual(['enumerator']);
    // The untampered cookie still works, so the 401 came from the signature alone.
    expect((await admin.get('/api/session')).status).toBe(200);
  });

  it.each([
    ['without the CSRF header', undefined],
    ['with a CSRF token of the right length but wrong', 'wrong'],
    ['with a CSRF token from another session', 'other-session'],
  ] as const)(
    'refuses a POST %s with 403 csrf-token-invalid and stores nothing',
    async (_label, kind) => {
      const admin = agents.admin;
      const email = `csrf.${randomUUID().slice(0, 8)}@example.test`;
      let test = request(app)
        .post('/api/invitations')
        .set('Cookie', admin.cookie)
        .send({ email, name: 'Csrf Probe', roles: ['client'] });
      if (kind === 'wrong') test = test.set('x-csrf-token', flipFirstCharacter(admin.csrfToken));
      if (kind === 'other-session') test = test.set('x-csrf-token', agents.client.csrfToken);
      const response = await test;

      expect(response.status).toBe(403);
      expect(response.body).toMatchObject({ error: { code: 'csrf-token-invalid' } });
      const stored = await deps.db.select().from(invitations).where(eq(invitations.email, email));
      expect(stored).toHaveLength(0);
    },
  );
});

function flipFirstCharacter(text: string): string {
  return (text[0] === 'A' ? 'B' : 'A') + text.slice(1);
}

/** Changes the first character of the cookie's HMAC signature (the part after the last dot). */
function tamperSignature(cookie: string): string {
  const separator = cookie.indexOf('=');
  const value = decodeURIComponent(cookie.slice(separator + 1));
  const dot = value.lastIndexOf('.');
  const tampered = value.slice(0, dot + 1) + flipFirstCharacter(value.slice(dot + 1));
  return `${cookie.slice(0, separator)}=${encodeURIComponent(tampered)}`;
}
