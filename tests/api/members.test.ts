import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { and, eq } from 'drizzle-orm';
import type { Member } from '@shared/members/member';
import type { Invitation } from '@shared/members/invitation';
import { apiErrorSchema } from '@shared/http/api-error';
import { invitations, memberships } from '../../server/db/schema';
import {
  hashInvitationToken,
  invitationLifetimeMs,
  newInvitationToken,
} from '../../server/members/invitation-token';
import { firstLink, sinkMessages, waitForMessageTo } from '../support/mail-sink-client';
import { signedInAgent, type SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';
import { createTestOrganisation, type TestOrganisation } from '../support/test-organisation';

const { app, deps } = createTestApp();
let home: TestOrganisation;
let elsewhere: TestOrganisation;
let admin: SignedInAgent;
let researcher: SignedInAgent;

beforeAll(async () => {
  home = await createTestOrganisation(deps.db, 'Members home');
  elsewhere = await createTestOrganisation(deps.db, 'Members elsewhere');
  admin = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
    userId: home.people.admin.userId,
    organisationId: home.id,
  });
  researcher = await signedInAgent(app, deps.db, deps.config.SESSION_SECRET, {
    userId: home.people.researcher.userId,
    organisationId: home.id,
  });
});

afterAll(async () => {
  await deps.db.$client.end();
});

async function storedRoles(organisationId: string, userId: string) {
  const [row] = await deps.db
    .select({ roles: memberships.roles })
    .from(memberships)
    .where(and(eq(memberships.organisationId, organisationId), eq(memberships.userId, userId)));
  return row?.roles;
}

/** The field paths a 400 answer names, read through the shared error schema. */
const issuePaths = (body: unknown) =>
  (apiErrorSchema.parse(body).error.issues ?? []).map((issue) => issue.path);

describe('the member list', () => {
  it("shows an admin their own organisation's members and no one else's", async () => {
    const response = await admin.get('/api/members');
    expect(response.status).toBe(200);
    const emails = (response.body as Member[]).map((member) => member.email).sort();
    expect(emails).toEqual(
      Object.values(home.people)
        .map((person) => person.email)
        .sort(),
    );
    for (const outsider of Object.values(elsewhere.people))
      expect(emails).not.toContain(outsider.email);
  });
});

describe('changing roles', () => {
  it('replaces a member’s roles and the list shows them', async () => {
    const supervisor = home.people.supervisor;
    const response = await admin.put(`/api/members/${supervisor.userId}/roles`, {
      roles: ['supervisor', 'researcher'],
    });
    expect(response.status).toBe(204);
    expect(await storedRoles(home.id, supervisor.userId)).toEqual(['supervisor', 'researcher']);
    const listed = ((await admin.get('/api/members')).body as Member[]).find(
      (m) => m.userId === supervisor.userId,
    );
    expect(listed?.roles).toEqual(['supervisor', 'researcher']);
  });

  it('refuses an unknown role name with 400 naming roles.0', async () => {
    const client = home.people.client;
    const response = await admin.put(`/api/members/${client.userId}/roles`, {
      roles: ['overseer'],
    });
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ error: { code: 'invalid-input' } });
    expect(issuePaths(response.body)).toContain('roles.0');
    expect(await storedRoles(home.id, client.userId)).toEqual(['client']);
  });

  it('refuses an empty role list with 400 naming roles', async () => {
    const client = home.people.client;
    const response = await admin.put(`/api/members/${client.userId}/roles`, { roles: [] });
    expect(response.status).toBe(400);
    expect(issuePaths(response.body)).toContain('roles');
    expect(await storedRoles(home.id, client.userId)).toEqual(['client']);
  });

  it('refuses a member id that is not a UUID with 400 naming userId', async () => {
    const response = await admin.put('/api/members/not-a-uuid/roles', { roles: ['client'] });
    expect(response.status).toBe(400);
    expect(issuePaths(response.body)).toContain('userId');
  });

  it('keeps the last admin: dropping their admin role answers 409', async () => {
    const self = home.people.admin;
    const response = await admin.put(`/api/members/${self.userId}/roles`, {
      roles: ['researcher'],
    });
    expect(response.status).toBe(409);
    expect(response.body).toMatchObject({ error: { code: 'last-admin' } });
    expect(await storedRoles(home.id, self.userId)).toEqual(['admin']);
  });

  it('answers 404 for a member of another organisation and leaves their roles alone', async () => {
    const outsider = elsewhere.people.enumerator;
    const response = await admin.put(`/api/members/${outsider.userId}/roles`, { roles: ['admin'] });
    expect(response.status).toBe(404);
    expect(await storedRoles(elsewhere.id, outsider.userId)).toEqual(['enumerator']);
  });
});

describe('invitations', () => {
  const invitationsTo = (email: string) =>
    deps.db.select().from(invitations).where(eq(invitations.email, email));

  it('refuses a malformed e-mail with 400 naming email and stores nothing', async () => {
    const email = `not-an-address-${randomUUID().slice(0, 8)}`;
    const response = await admin.post('/api/invitations', {
      email,
      name: 'Nadia Fenwold',
      roles: ['client'],
    });
    expect(response.status).toBe(400);
    expect(issuePaths(response.body)).toContain('email');
    expect(await invitationsTo(email)).toHaveLength(0);
    expect(await invitationsTo(email.toLowerCase())).toHaveLength(0);
  });

  it('stores a good invitation and mails its one-time link to the invited address', async () => {
    const email = `invitee.${randomUUID().slice(0, 8)}@example.test`;
    const response = await admin.post('/api/invitations', {
      email,
      name: 'Oren Castlemire',
      roles: ['researcher', 'client'],
    });
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({
      email,
      status: 'pending',
      roles: ['researcher', 'client'],
    });

    const message = await waitForMessageTo(email);
    expect(message.subject).toContain(home.name);
    const link = firstLink(message);
    const appUrl = deps.config.APP_URL.replace(/\/$/, '');
    const match = new RegExp(`^${escapeRegExp(appUrl)}/auth/invitation/([A-Za-z0-9_-]{43})$`).exec(
      link,
    );
    expect(match).not.toBeNull();

    const [stored] = await invitationsTo(email);
    expect(stored?.organisationId).toBe(home.id);
    // Only the token's hash is kept; the link carries the token itself.
    expect(stored?.tokenHash).toBe(hashInvitationToken(match![1]));
    const listed = (await admin.get('/api/invitations')).body as Invitation[];
    expect(listed.map((invitation) => invitation.email)).toContain(email);
  });
});

const newAddress = (label: string) => `${label}.${randomUUID().slice(0, 8)}@example.test`;

/** Invites an address through the API and returns the stored invitation and its link's token. */
async function invite(email: string, roles = ['client']) {
  const response = await admin.post('/api/invitations', { email, name: 'Ilse Marchetti', roles });
  expect(response.status).toBe(201);
  const link = firstLink(await waitForMessageTo(email));
  return { invitation: response.body as Invitation, token: link.split('/').at(-1)! };
}

const openLink = (token: string) => request(app).get(`/auth/invitation/${token}`);
const mailsTo = async (email: string) =>
  (await sinkMessages()).filter((message) => message.to.includes(email));

describe('invitations that are not needed', () => {
  const invitationsTo = (email: string) =>
    deps.db.select().from(invitations).where(eq(invitations.email, email));

  it('refuses a second open invitation to the same address with 409 naming email', async () => {
    const email = newAddress('twice');
    await invite(email);
    const again = await admin.post('/api/invitations', {
      email: email.toUpperCase(),
      name: 'Ilse Marchetti',
      roles: ['researcher'],
    });
    expect(again.status).toBe(409);
    expect(again.body).toMatchObject({ error: { code: 'already-invited' } });
    expect(issuePaths(again.body)).toEqual(['email']);
    expect(await invitationsTo(email)).toHaveLength(1);
    expect(await mailsTo(email)).toHaveLength(1);
  });

  it('refuses to invite a member, pointing to their roles, and mails nothing', async () => {
    const member = home.people.researcher;
    const response = await admin.post('/api/invitations', {
      email: member.email,
      name: member.name,
      roles: ['supervisor'],
    });
    expect(response.status).toBe(409);
    expect(response.body).toMatchObject({ error: { code: 'already-member' } });
    expect(apiErrorSchema.parse(response.body).error.message).toContain('Change their roles');
    expect(issuePaths(response.body)).toEqual(['email']);
    expect(await invitationsTo(member.email)).toHaveLength(0);
    expect(await mailsTo(member.email)).toHaveLength(0);
  });

  it('lets a member of another organisation be invited here', async () => {
    const outsider = elsewhere.people.client;
    const response = await admin.post('/api/invitations', {
      email: outsider.email,
      name: outsider.name,
      roles: ['client'],
    });
    expect(response.status).toBe(201);
  });

  it('stops a link made before the address joined through another link', async () => {
    // Two links to one address could exist before duplicates were refused; once the person is
    // a member, the other link must not add its roles too.
    const member = home.people.supervisor;
    const { token, tokenHash } = newInvitationToken();
    await deps.db.insert(invitations).values({
      organisationId: home.id,
      email: member.email,
      name: member.name,
      roles: ['admin'],
      tokenHash,
      expiresAt: new Date(Date.now() + invitationLifetimeMs),
    });
    expect((await openLink(token)).status).toBe(410);
  });
});

describe('withdrawing an invitation', () => {
  it('removes a waiting invitation, and its link stops working', async () => {
    const email = newAddress('withdrawn');
    const { invitation, token } = await invite(email);
    expect([302, 303]).toContain((await openLink(token)).status);

    const response = await admin.delete(`/api/invitations/${invitation.id}`);
    expect(response.status).toBe(204);
    const listed = (await admin.get('/api/invitations')).body as Invitation[];
    expect(listed.map((i) => i.id)).not.toContain(invitation.id);
    expect((await openLink(token)).status).toBe(410);
  });

  it('lets the admin send a new invitation once the old one is withdrawn', async () => {
    const email = newAddress('resent');
    const { invitation } = await invite(email);
    expect((await admin.delete(`/api/invitations/${invitation.id}`)).status).toBe(204);
    const again = await admin.post('/api/invitations', {
      email,
      name: 'Ilse Marchetti',
      roles: ['supervisor'],
    });
    expect(again.status).toBe(201);
  });

  it('refuses a non-admin with 403 and keeps the invitation', async () => {
    const email = newAddress('kept');
    const { invitation } = await invite(email);
    const response = await researcher.delete(`/api/invitations/${invitation.id}`);
    expect(response.status).toBe(403);
    const stored = await deps.db
      .select()
      .from(invitations)
      .where(eq(invitations.id, invitation.id));
    expect(stored).toHaveLength(1);
  });

  it('refuses an id that is not a UUID with 400 naming invitationId', async () => {
    const response = await admin.delete('/api/invitations/not-a-uuid');
    expect(response.status).toBe(400);
    expect(issuePaths(response.body)).toContain('invitationId');
  });

  it('answers 404 for another organisation’s invitation and leaves it alone', async () => {
    const { tokenHash } = newInvitationToken();
    const [theirs] = await deps.db
      .insert(invitations)
      .values({
        organisationId: elsewhere.id,
        email: newAddress('theirs'),
        name: 'Pell Ostrander',
        roles: ['client'],
        tokenHash,
        expiresAt: new Date(Date.now() + invitationLifetimeMs),
      })
      .returning();
    const response = await admin.delete(`/api/invitations/${theirs.id}`);
    expect(response.status).toBe(404);
    const stored = await deps.db.select().from(invitations).where(eq(invitations.id, theirs.id));
    expect(stored).toHaveLength(1);
  });

  it('keeps an accepted invitation with 409, pointing to the roles instead', async () => {
    const email = newAddress('accepted');
    const { invitation } = await invite(email);
    await deps.db
      .update(invitations)
      .set({ acceptedAt: new Date() })
      .where(eq(invitations.id, invitation.id));
    const response = await admin.delete(`/api/invitations/${invitation.id}`);
    expect(response.status).toBe(409);
    expect(response.body).toMatchObject({ error: { code: 'invitation-accepted' } });
    const listed = (await admin.get('/api/invitations')).body as Invitation[];
    expect(listed.find((i) => i.id === invitation.id)?.status).toBe('accepted');
  });
});

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
