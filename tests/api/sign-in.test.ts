import { randomUUID } from 'node:crypto';
import { sessionInfoSchema, type SessionInfo } from '@shared/auth/session';
import { demoOrganisationName, demoPassword, demoPeople } from '../../server/demo/demo-people';
import { firstLink, waitForMessageTo } from '../support/mail-sink-client';
import {
  apiCall,
  BrowserlessBrowser,
  signInThroughProvider,
  type Visit,
} from '../support/browserless-sign-in';
import { unconfirmedAccount } from '../../tools/stack/identity-provider/unconfirmed-account';

// The whole OpenID Connect round trip over HTTP against the running server and local provider.
const appUrl = process.env['TEST_APP_URL']!;
const issuer = process.env['OIDC_ISSUER']!;
const sessionUrl = `${appUrl}/api/session`;
const isCallback = (url: URL) => url.href.startsWith(`${appUrl}/auth/callback`);
const researcher = demoPeople.find((person) => person.roles.includes('researcher'))!;
const admin = demoPeople.find((person) => person.roles.includes('admin'))!;

async function sessionOf(browser: BrowserlessBrowser): Promise<SessionInfo> {
  const session = await apiCall(browser, sessionUrl);
  expect(session.status).toBe(200);
  return sessionInfoSchema.parse(session.body);
}

async function stopAtCallback(
  email: string,
): Promise<{ browser: BrowserlessBrowser; callback: string }> {
  const browser = new BrowserlessBrowser();
  await signInThroughProvider(browser, appUrl, email, demoPassword, isCallback);
  expect(browser.stoppedAt).toBeDefined();
  return { browser, callback: browser.stoppedAt! };
}

const heading = (page: Visit) => /<h1>([^<]*)<\/h1>/.exec(page.body)?.[1];

describe('signing in through the identity provider', () => {
  it.each(demoPeople.map((person) => [person.email, person.roles] as const))(
    'signs %s in and GET /api/session returns the roles %j',
    async (email, roles) => {
      const browser = new BrowserlessBrowser();
      const landing = await signInThroughProvider(browser, appUrl, email, demoPassword);

      expect(landing.url).toBe(`${appUrl}/`);
      expect(browser.trail.some((url) => url.startsWith(`${issuer}/interaction/`))).toBe(true);
      const session = await sessionOf(browser);
      expect(session.user.email).toBe(email);
      expect(session.organisation.name).toBe(demoOrganisationName);
      expect(session.roles).toEqual(roles);
    },
  );

  it('shows the provider’s refusal for a wrong password and opens no app session', async () => {
    const browser = new BrowserlessBrowser();
    const page = await signInThroughProvider(browser, appUrl, researcher.email, 'not-the-password');

    expect(page.status).toBe(401);
    expect(page.url.startsWith(`${issuer}/interaction/`)).toBe(true);
    expect(page.body).toContain('That e-mail and password do not match an account.');
    expect((await apiCall(browser, sessionUrl)).status).toBe(401);
  });

  it('refuses an address the provider has not confirmed, with a page saying so, and opens no session', async () => {
    const browser = new BrowserlessBrowser();
    const page = await signInThroughProvider(
      browser,
      appUrl,
      unconfirmedAccount.email,
      unconfirmedAccount.password,
    );
    expect(page.status).toBe(403);
    expect(heading(page)).toBe('Confirm your e-mail address first');
    expect(page.body).toContain(unconfirmedAccount.email);
    expect((await apiCall(browser, sessionUrl)).status).toBe(401);
  });

  it('refuses a callback URL used a second time, even with the cookies it first came with', async () => {
    const { browser, callback } = await stopAtCallback(researcher.email);
    const copiedCookies = browser.clone();

    const first = await browser.open(callback);
    expect(first.url).toBe(`${appUrl}/`);
    expect((await sessionOf(browser)).user.email).toBe(researcher.email);

    const replay = await copiedCookies.open(callback);
    expect(replay.status).toBe(400);
    expect(heading(replay)).toBe('This sign-in has expired');
    expect((await apiCall(copiedCookies, sessionUrl)).status).toBe(401);

    const again = await browser.open(callback);
    expect(again.status).toBe(400);
  });

  it('refuses a callback whose state is not the one the sign-in started with', async () => {
    const { browser, callback } = await stopAtCallback(researcher.email);
    const forged = new URL(callback);
    forged.searchParams.set('state', 'a-state-this-browser-never-sent');

    const page = await browser.open(forged.href);
    expect(page.status).toBe(400);
    expect(heading(page)).toBe('Sign-in could not be completed');
    expect((await apiCall(browser, sessionUrl)).status).toBe(401);
  });

  it('signs out with the CSRF token, after which the session answers 401', async () => {
    const browser = new BrowserlessBrowser();
    await signInThroughProvider(browser, appUrl, researcher.email, demoPassword);
    const { csrfToken } = await sessionOf(browser);
    const copiedCookies = browser.clone();

    const withoutToken = await apiCall(browser, `${appUrl}/auth/sign-out`, { method: 'POST' });
    expect(withoutToken.status).toBe(403);
    expect((await apiCall(browser, sessionUrl)).status).toBe(200);

    const signOut = await apiCall(browser, `${appUrl}/auth/sign-out`, {
      method: 'POST',
      csrfToken,
    });
    expect(signOut.status).toBe(204);
    expect((await apiCall(browser, sessionUrl)).status).toBe(401);
    // The session ended on the server, not only in this browser's cookie jar.
    expect((await apiCall(copiedCookies, sessionUrl)).status).toBe(401);
  });
});

describe('accepting an invitation', () => {
  it('lets an invited person create a sign-in and arrive with the invited roles, once', async () => {
    const adminBrowser = new BrowserlessBrowser();
    await signInThroughProvider(adminBrowser, appUrl, admin.email, demoPassword);
    const { csrfToken } = await sessionOf(adminBrowser);
    const email = `invited.${randomUUID().slice(0, 8)}@example.test`;
    const invited = await apiCall(adminBrowser, `${appUrl}/api/invitations`, {
      method: 'POST',
      csrfToken,
      json: { email, name: 'Lenka Marwood', roles: ['researcher', 'enumerator'] },
    });
    expect(invited.status).toBe(201);

    const link = firstLink(await waitForMessageTo(email));
    expect(link.startsWith(`${appUrl}/auth/invitation/`)).toBe(true);
    const invitee = new BrowserlessBrowser();
    const signInPage = await invitee.open(link);
    expect(signInPage.url.startsWith(`${issuer}/interaction/`)).toBe(true);
    expect(signInPage.body).toContain(`value="${email}"`);

    const createHref = /href="([^"]*\/create-account)"/.exec(signInPage.body)?.[1];
    const createPage = await invitee.open(new URL(createHref!, signInPage.url).href);
    expect(createPage.body).toContain('<title>Create your sign-in');
    expect(createPage.body).toContain(`value="${email}"`);

    const landing = await invitee.submitForm(createPage, {
      name: 'Lenka Marwood',
      email,
      password: 'harbour-lantern-42',
    });
    expect(landing.url).toBe(`${appUrl}/`);
    const session = await sessionOf(invitee);
    expect(session.user.email).toBe(email);
    expect(session.organisation.name).toBe(demoOrganisationName);
    expect([...session.roles].sort()).toEqual(['enumerator', 'researcher']);

    const reused = await new BrowserlessBrowser().open(link);
    expect(reused.status).toBe(410);
    expect((await invitee.open(link)).status).toBe(410);
  });
});
