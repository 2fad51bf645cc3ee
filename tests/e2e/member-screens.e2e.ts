import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { hashToken, newToken } from '../../server/auth/bearer-token';
import { connectDatabase, type Database } from '../../server/db/database';
import { apiTokens, fieldDevices, memberships, users } from '../../server/db/schema';
import { expectNoSeriousViolations } from './support/accessibility';
import { appUrl, launchBrowser, phoneViewport, type BrowserSession } from './support/browser';
import { insertFieldTestStudy, type FieldTestStudy } from './support/field-study';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// The member screens in a real browser, on a phone and at a desk: deactivating and reactivating
// a member, the role dialog's warning, the organisation's tokens, a study's devices, and
// signing out on every device.
let db: Database;

beforeAll(() => {
  db = connectDatabase(process.env['DATABASE_URL'] ?? '', 2);
});

afterAll(async () => {
  await db.$client.end();
});

const widths = [
  ['phone', phoneViewport],
  ['desk', { width: 1280, height: 860 }],
] as const;

interface Setting {
  study: FieldTestStudy;
  person: { id: string; name: string };
  tokenName: string;
  deviceLabel: string;
}

/** A member to deactivate, a client's token and an enumerator's device, all fresh. */
async function setting(): Promise<Setting> {
  const study = await insertFieldTestStudy(db);
  const [{ organisationId }] = await db
    .select({ organisationId: memberships.organisationId })
    .from(memberships)
    .where(eq(memberships.userId, study.enumeratorId));
  const suffix = randomUUID().slice(0, 6);
  const name = `Wren Tallowby ${suffix}`;
  const [person] = await db
    .insert(users)
    .values({ email: `wren.${suffix}@tidewater.test`, name })
    .returning({ id: users.id });
  await db.insert(memberships).values({ organisationId, userId: person.id, roles: ['enumerator'] });
  const [client] = await db
    .select({ id: users.id })
    .from(users)
    .where(eq(users.email, 'client@tidewater.test'));
  const tokenName = `Tariff workbook ${suffix}`;
  // The demo enumerator's devices of earlier runs show too: this one has a name of its own.
  const deviceLabel = `Phone of the lake-shore team ${suffix}`;
  const token = newToken();
  await db.insert(apiTokens).values({
    userId: client.id,
    organisationId,
    name: tokenName,
    tokenHash: hashToken(token),
    prefix: token.slice(0, 10),
    expiresAt: new Date(Date.now() + 30 * 86_400_000),
  });
  await db.insert(fieldDevices).values({
    sessionId: `e2e-${randomUUID()}`,
    userId: study.enumeratorId,
    organisationId,
    label: deviceLabel,
    lastSyncSent: 5,
    lastSyncAccepted: 5,
    queuedAtLastSync: 7,
  });
  return { study, person: { id: person.id, name }, tokenName, deviceLabel };
}

const memberRow = (page: Page, name: string) => page.getByRole('row').filter({ hasText: name });

describe.each(widths)('member screens on a %s', (label, viewport) => {
  let browser: BrowserSession;
  let page: Page;
  let s: Setting;

  beforeAll(async () => {
    s = await setting();
  });

  beforeEach(async () => {
    browser = await launchBrowser({ viewport });
    page = browser.context.pages()[0] ?? (await browser.context.newPage());
  });

  afterEach(async () => {
    await browser.close();
  });

  it('deactivates and reactivates a member after saying what happens, and warns before a demotion', async () => {
    await signIn(page, 'admin@tidewater.test');
    await page.goto(appUrl('/members'));
    await page.getByRole('heading', { level: 1, name: 'Members' }).waitFor();

    await page.getByRole('button', { name: `Change the roles of ${s.person.name}` }).click();
    const roles = page.getByRole('dialog');
    await roles.getByRole('checkbox', { name: 'Client' }).check();
    await roles.getByRole('checkbox', { name: 'Enumerator' }).uncheck();
    await roles.getByText('They stop being enumerator in every study too').waitFor();
    await screenshot(page, `member-screens-${label}-role-warning`);
    await roles.getByRole('button', { name: 'Cancel' }).click();
    await roles.waitFor({ state: 'detached' });

    await page.getByRole('button', { name: `Deactivate ${s.person.name}` }).click();
    const confirm = page.getByRole('dialog');
    await confirm.getByText('signed out on every device').waitFor();
    await confirm.getByText('Everything they recorded stays').waitFor();
    await screenshot(page, `member-screens-${label}-deactivate`);
    await expectNoSeriousViolations(page, 'the deactivation dialog');
    await confirm.getByRole('button', { name: 'Deactivate' }).click();
    await memberRow(page, s.person.name).getByText('Deactivated').first().waitFor();
    const [stored] = await db.select().from(memberships).where(eq(memberships.userId, s.person.id));
    expect(stored.deactivatedAt).toBeInstanceOf(Date);
    await screenshot(page, `member-screens-${label}-members`);

    await page.getByRole('button', { name: `Reactivate ${s.person.name}` }).click();
    await page.getByRole('dialog').getByText('can sign in again').waitFor();
    await page.getByRole('dialog').getByRole('button', { name: 'Reactivate' }).click();
    await page.getByRole('button', { name: `Deactivate ${s.person.name}` }).waitFor();
    const [back] = await db.select().from(memberships).where(eq(memberships.userId, s.person.id));
    expect(back.deactivatedAt).toBeNull();
  });

  it('lists the organisation’s tokens and revokes one after asking', async () => {
    await signIn(page, 'admin@tidewater.test');
    await page.goto(appUrl('/members/tokens'));
    await page.getByRole('heading', { level: 1, name: 'Access tokens' }).waitFor();
    const item = page.getByRole('listitem').filter({ hasText: s.tokenName });
    await item.getByText('active').waitFor();
    await item.getByRole('button', { name: 'Revoke…' }).click();
    await item.getByText('gets 401 from its next call on').waitFor();
    await screenshot(page, `member-screens-${label}-tokens`);
    await expectNoSeriousViolations(page, 'the tokens page');
    await item.getByRole('button', { name: 'Revoke token' }).click();
    await item.getByText('revoked by an administrator').waitFor();
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.name, s.tokenName));
    expect(row.revokedReason).toBe('admin');
  });

  it('shows a study’s devices with what they still hold, and signs one out', async () => {
    await signIn(page, 'supervisor@tidewater.test');
    await page.goto(appUrl(`/devices/${s.study.studyId}`));
    await page.getByRole('heading', { level: 1, name: /^Devices of Lamp prices/ }).waitFor();
    const card = page.getByRole('listitem').filter({ hasText: s.deviceLabel });
    expect((await card.getByTestId('queued').textContent())?.trim()).toBe('7');
    await card.getByRole('button', { name: 'Sign out…' }).click();
    await card.getByText('It reported 7 interviews not yet sent').waitFor();
    await screenshot(page, `member-screens-${label}-devices`);
    await expectNoSeriousViolations(page, 'the devices page');
    await card.getByRole('button', { name: 'Sign device out' }).click();
    await card.getByText('Signed out', { exact: true }).waitFor();
  });

  it('signs out on every device from the account menu', async () => {
    await signIn(page, 'researcher@tidewater.test');
    const other = await launchBrowser({ viewport });
    try {
      const otherPage = other.context.pages()[0] ?? (await other.context.newPage());
      await signIn(otherPage, 'researcher@tidewater.test');
      await page.getByRole('button', { name: /^Account of / }).click();
      await page.getByRole('menuitem', { name: 'Sign out on every device' }).click();
      await page.getByRole('link', { name: 'Sign in' }).waitFor();
      const response = await otherPage.request.get(appUrl('/api/session'));
      expect(response.status()).toBe(401);
      expect(((await response.json()) as { error: { message: string } }).error.message).toMatch(
        /signed out on every device/,
      );
    } finally {
      await other.close();
    }
  });
});
