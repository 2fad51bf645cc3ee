import type { Page } from 'playwright-core';
import { demoPeople } from '../../server/demo/demo-people';
import { expectNoSeriousViolations } from './support/accessibility';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshots';
import { waitForOfflineReady } from './support/service-worker';
import { navigationOffers, signIn, signOut } from './support/sign-in';

// The foundation in a real browser: sign-in per role, role navigation, offline shell, accessibility.
let browser: BrowserSession;
let page: Page;

beforeEach(async () => {
  // A desk-sized window, so the navigation sits beside the page rather than in a closed drawer.
  browser = await launchBrowser({ viewport: { width: 1280, height: 860 } });
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
});

afterEach(async () => {
  await browser.close();
});

const adminOnly = ['Members', 'System health'];
const admin = demoPeople.find((person) => person.roles.includes('admin'))!;

describe('signing in from the browser', () => {
  it.each(demoPeople.map((person) => [person.roles.join(', '), person.email] as const))(
    'signs the %s in, shows that role’s navigation and signs out',
    async (roleList, email) => {
      await signIn(page, email);

      expect(await navigationOffers(page, 'Home')).toBe(true);
      const isAdmin = roleList.split(', ').includes('admin');
      for (const label of adminOnly) {
        const offered = await navigationOffers(page, label);
        expect({ label, offered }).toEqual({ label, offered: isAdmin });
      }
      await screenshot(page, `foundation-home-${roleList.replace(/\W+/g, '-')}`);

      await signOut(page);
      expect(new URL(page.url()).pathname).toBe('/welcome');
      expect((await page.request.get(appUrl('/api/session'))).status()).toBe(401);
    },
  );
});

describe('working offline', () => {
  it('renders the app shell from the service worker after going offline', async () => {
    await page.goto(appUrl('/'));
    await page.getByRole('link', { name: 'Sign in' }).waitFor();
    await waitForOfflineReady(page);

    await browser.context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Fieldcurve' }).waitFor();
    // The page came from the worker's cache: the app itself says its server is out of reach.
    await page.getByRole('status').getByText('cannot reach its server').waitFor();
    expect(await page.evaluate(() => navigator.serviceWorker.controller !== null)).toBe(true);
    await screenshot(page, 'foundation-offline-landing');
  });
});

describe('accessibility (axe-core, serious and critical rules)', () => {
  it('finds no serious violation on the signed-out landing page', async () => {
    await page.goto(appUrl('/'));
    await page.getByRole('link', { name: 'Sign in' }).waitFor();
    await screenshot(page, 'foundation-landing');
    await expectNoSeriousViolations(page, 'the signed-out landing page');
  });

  it('finds no serious violation on the members page', async () => {
    await signIn(page, admin.email);
    const navigation = page.getByRole('navigation', { name: 'Sections' });
    await navigation.getByRole('link', { name: 'Members' }).click();
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();
    await page.getByRole('cell', { name: admin.email }).first().waitFor();
    await screenshot(page, 'foundation-members');
    await expectNoSeriousViolations(page, 'the members page');
  });
});
