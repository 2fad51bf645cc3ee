import { randomUUID } from 'node:crypto';
import { count, eq } from 'drizzle-orm';
import type { Locator, Page } from 'playwright-core';
import { connectDatabase, type Database } from '../../server/db/database';
import { demoPeople } from '../../server/demo/demo-people';
import { memberships, samplingPoints, studies, studyMembers, users } from '../../server/db/schema';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { chooseOption } from './support/material-select';
import { pollUntil } from './support/poll';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// A supervisor on a phone-sized screen plans a study's field work: a refused file with its
// problems by line, a good file, two routes with quotas, both assigned; the enumerator's e-mail
// leads to the route; the progress page shows the quotas. axe-core checks every screen.
const person = (role: string) => demoPeople.find((p) => p.roles.includes(role as never))!;
const supervisor = person('supervisor');
const enumerator = person('enumerator');
const researcher = person('researcher');
const suffix = randomUUID().slice(0, 6);
const studyName = `Lantern field plan ${suffix}`;
const firstRoute = `North shore round ${suffix}`;
const secondRoute = `Market lanes ${suffix}`;

const header = 'point_code,point_name,point_kind,latitude,longitude,stratum,notes';
const goodFile = [
  header,
  'NS-01,Blue door shop,shop,-0.0917,34.7680,North shore,Opens at 8',
  'NS-02,Jetty stall,market stall,-0.0921,34.7702,North shore,',
  'NS-03,"Home with a green gate",household,-0.0950,34.7711,North shore,"Ask for the elder"',
  'ML-01,Kiosk by the clock,kiosk,-0.1010,34.7555,Market lanes,',
  'ML-02,Grain stall,market_stall,-0.1013,34.7561,Market lanes,',
].join('\n');
const badFile = [
  header,
  'NS-01,Blue door shop,shop,-0.0917,34.7680,North shore,',
  'NS-02,Jetty stall,market stall,123,34.7702,North shore,',
  'NS-03,Home,tent,-0.0950,34.7711,North shore,',
  'NS-01,Copy of the first,shop,-0.0917,34.7680,,',
].join('\n');

let db: Database;
let browser: BrowserSession;
let page: Page;
let studyId: string;

async function insertStudy(): Promise<string> {
  const people = await db
    .select({ id: users.id, email: users.email, organisationId: memberships.organisationId })
    .from(users)
    .innerJoin(memberships, eq(memberships.userId, users.id));
  const id = (email: string) => people.find((p) => p.email === email)!;
  const [study] = await db
    .insert(studies)
    .values({
      organisationId: id(supervisor.email).organisationId,
      name: studyName,
      productName: 'Solar lantern',
      currency: 'KES',
      locale: 'en-KE',
      market: 'Households and shops of two invented lake-shore towns',
      targetSample: 120,
      priceMinMinor: 50000,
      priceMaxMinor: 400000,
    })
    .returning({ id: studies.id });
  await db.insert(studyMembers).values([
    { studyId: study.id, userId: id(supervisor.email).id, roles: ['supervisor'] },
    { studyId: study.id, userId: id(enumerator.email).id, roles: ['enumerator'] },
    { studyId: study.id, userId: id(researcher.email).id, roles: ['researcher'] },
  ]);
  return study.id;
}

beforeAll(async () => {
  db = connectDatabase(process.env['DATABASE_URL'] ?? '', 2);
  studyId = await insertStudy();
  browser = await launchBrowser();
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
  await signIn(page, supervisor.email);
});

afterAll(async () => {
  await browser?.close();
  await db?.$client.end();
});

const heading = (name: string | RegExp, level = 1) => page.getByRole('heading', { level, name });

async function upload(name: string, text: string): Promise<void> {
  await page.getByLabel(/Choose a CSV file/).setInputFiles({
    name,
    mimeType: 'text/csv',
    buffer: Buffer.from(text),
  });
}

const problemRows = (): Promise<string[][]> =>
  page
    .locator('app-csv-problem-table tbody tr')
    .evaluateAll((rows) =>
      rows.map((row) => [...row.querySelectorAll('td')].map((c) => c.textContent?.trim() ?? '')),
    );

describe('a supervisor plans field work', () => {
  it('finds the study under Field planning', async () => {
    await page.getByRole('button', { name: 'Navigation' }).click();
    await page.getByRole('link', { name: 'Field planning', exact: true }).click();
    await heading('Field planning').waitFor();
    await page.getByRole('link', { name: `Points and routes of ${studyName}` }).click();
    await heading(studyName).waitFor();
    await page.getByRole('heading', { name: 'Upload sampling points' }).waitFor();
  });

  it('sees every problem of a bad file by line and column, and nothing is stored', async () => {
    await upload('points-draft.csv', badFile);
    await page.getByText('points-draft.csv was not imported').waitFor();
    expect(await problemRows()).toEqual([
      ['3', 'latitude', 'Latitude 123 is outside −90 to 90.'],
      [
        '4',
        'point_kind',
        '"tent" is not a kind; use one of household, shop, market_stall, kiosk, other.',
      ],
      ['5', 'stratum', 'Empty — every point needs a stratum or region.'],
      ['5', 'point_code', 'The code "NS-01" is already used on line 2; codes must be unique.'],
    ]);
    await page.getByRole('heading', { name: 'Points (0)' }).waitFor();
    const [stored] = await db
      .select({ n: count() })
      .from(samplingPoints)
      .where(eq(samplingPoints.studyId, studyId));
    expect(stored.n).toBe(0);
    await screenshot(page, 'field-planning-csv-problems-360');
    await expectNoSeriousViolations(page, 'the refused sampling-point file');
  });

  it('imports a good file and lists the points', async () => {
    await upload('points.csv', goodFile);
    await page.getByText('Imported: 5 new, 0 updated, 0 unchanged.').waitFor();
    await page.getByRole('heading', { name: 'Points (5)' }).waitFor();
    await expect(page.getByRole('cell', { name: 'Home with a green gate' }).count()).resolves.toBe(
      1,
    );
    expect(await page.locator('app-csv-problem-table').count()).toBe(0);
    await screenshot(page, 'field-planning-points-360');
    await expectNoSeriousViolations(page, 'the sampling points');
  });
});

interface SinkMessage {
  to: string[];
  subject: string;
  text: string;
}

async function mailAbout(routeName: string): Promise<SinkMessage> {
  const read = async () => {
    const response = await fetch(`${process.env['MAIL_SINK_URL']}/messages`);
    const messages = (await response.json()) as SinkMessage[];
    return messages.find((m) => m.to.includes(enumerator.email) && m.subject.includes(routeName));
  };
  const found = await pollUntil(read, (message) => message !== undefined, 10_000);
  if (!found) throw new Error(`No e-mail about ${routeName} reached ${enumerator.email}`);
  return found;
}

const stopQuota = (code: string) => page.getByLabel(`Quota at ${code}`);

async function openRoutesTab(): Promise<void> {
  await page.getByRole('tab', { name: 'Routes' }).click();
  await page.getByRole('heading', { name: /^Routes \(\d+\)$/ }).waitFor();
}

async function fillWindow(first: string, last: string): Promise<void> {
  await page.getByPlaceholder('First day').fill(first);
  await page.getByPlaceholder('Last day').fill(last);
  await page.getByPlaceholder('Last day').press('Tab');
}

function routeCard(name: string): Locator {
  return page.locator('mat-card', { has: page.getByRole('heading', { name }) });
}

describe('routes and their assignment', () => {
  it('builds a route in order with quotas, refusing a quota of zero, and assigns it', async () => {
    await openRoutesTab();
    await page.getByRole('link', { name: 'New route' }).click();
    await heading('New route', 2).waitFor();
    await page.getByLabel('Route name').fill(firstRoute);
    await fillWindow('4/6/2027', '4/10/2027');
    await chooseOption(page, page, 'Enumerator', enumerator.name);
    for (const name of ['Add NS-01', 'Add NS-03', 'Add NS-02']) {
      await page.getByRole('button', { name: new RegExp(`^${name}`) }).click();
    }
    await stopQuota('NS-01').fill('0');
    await page.getByRole('button', { name: 'Move NS-02 up' }).click();
    await page.getByRole('button', { name: 'Save route' }).click();
    await page.getByText('The quota must be at least 1 interview.').waitFor();
    await stopQuota('NS-01').fill('3');
    await stopQuota('NS-03').fill('2');
    await expect(page.getByText('Stops (3) · 6 interviews').count()).resolves.toBe(1);
    await screenshot(page, 'field-planning-route-builder-360');
    await expectNoSeriousViolations(page, 'the route builder');
    await page.getByRole('button', { name: 'Save route' }).click();
    await routeCard(firstRoute).waitFor();
    const stops = await routeCard(firstRoute).locator('ol li').allTextContents();
    expect(stops.map((s) => s.replace(/\s+/g, ' ').trim())).toEqual([
      'NS-01 Blue door shop × 3',
      'NS-02 Jetty stall × 1',
      'NS-03 Home with a green gate × 2',
    ]);
    await routeCard(firstRoute).getByText(enumerator.name).first().waitFor();
  });

  it('builds a second route and assigns it from the route list', async () => {
    await page.getByRole('link', { name: 'New route' }).click();
    await page.getByLabel('Route name').fill(secondRoute);
    await fillWindow('4/12/2027', '4/12/2027');
    await page.getByLabel('Find by code, name or stratum').fill('market lanes');
    await page.getByRole('button', { name: /^Add ML-01/ }).click();
    await page.getByRole('button', { name: /^Add ML-02/ }).click();
    await stopQuota('ML-01').fill('2');
    await stopQuota('ML-02').fill('2');
    await page.getByRole('button', { name: 'Save route' }).click();
    const card = routeCard(secondRoute);
    await card.getByText('Not assigned yet').waitFor();
    await chooseOption(page, card, `Enumerator for ${secondRoute}`, enumerator.name);
    await card.getByRole('button', { name: `Assign ${secondRoute}` }).click();
    await page.getByText(`${secondRoute} is assigned to ${enumerator.name}`).waitFor();
    await screenshot(page, 'field-planning-routes-360');
    await expectNoSeriousViolations(page, 'the route list');
  });

  it('e-mails the enumerator each route with a link that opens it', async () => {
    const first = await mailAbout(firstRoute);
    expect(first.subject).toBe(`Route "${firstRoute}" is assigned to you`);
    expect(first.text).toContain('Dates: 2027-04-06 to 2027-04-10');
    expect(first.text).toContain('1. NS-01 · Blue door shop (Shop, North shore) — 3 interviews');
    const second = await mailAbout(secondRoute);
    const link = /https?:\/\/\S+/.exec(second.text)?.[0] ?? '';
    expect(link).toMatch(new RegExp(`^${appUrl('/field/routes/')}[0-9a-f-]{36}$`));

    const device = await launchBrowser();
    try {
      const fieldPage = await device.context.newPage();
      await signIn(fieldPage, enumerator.email);
      await fieldPage.goto(link);
      await fieldPage.getByRole('heading', { level: 1, name: secondRoute }).waitFor();
      await fieldPage.getByRole('heading', { name: 'Kiosk by the clock' }).waitFor();
      await screenshot(fieldPage, 'field-planning-mail-link-360');
    } finally {
      await device.close();
    }
  });
});

describe('progress against quota', () => {
  it('shows each route’s quotas in a table and a chart', async () => {
    await page.getByRole('tab', { name: 'Progress' }).click();
    await page.getByRole('heading', { name: 'Progress against quota' }).waitFor();
    const totals = page.getByRole('definition');
    await expect(totals.first().textContent()).resolves.toBe('10');
    const first = page.getByRole('region', { name: firstRoute, exact: true });
    await first.getByText('0 of 6 completed').waitFor();
    const rows = await first
      .locator('tbody tr')
      .evaluateAll((trs) =>
        trs.map((tr) => [...tr.querySelectorAll('th, td')].map((c) => c.textContent?.trim())),
      );
    expect(rows.map((row) => row.slice(1))).toEqual([
      ['3', '0', '0', '0'],
      ['1', '0', '0', '0'],
      ['2', '0', '0', '0'],
    ]);
    await page.locator('.progress__chart').scrollIntoViewIfNeeded();
    await page.locator('app-progress-chart canvas').waitFor();
    await screenshot(page, 'field-planning-progress-360');
    await expectNoSeriousViolations(page, 'the progress page');
  });
});

describe('a researcher of the study', () => {
  it('reads the points, routes and progress but cannot change them', async () => {
    const desk = await launchBrowser();
    try {
      const readerPage = await desk.context.newPage();
      await signIn(readerPage, researcher.email);
      await readerPage.goto(appUrl(`/field-planning/${studyId}/points`));
      await readerPage.getByRole('heading', { name: 'Points (5)' }).waitFor();
      await readerPage.getByText('supervisors change it').waitFor();
      expect(await readerPage.getByText('Upload sampling points').count()).toBe(0);
      await readerPage.getByRole('tab', { name: 'Routes' }).click();
      await readerPage.getByRole('heading', { name: firstRoute }).waitFor();
      expect(await readerPage.getByRole('link', { name: 'New route' }).count()).toBe(0);
      expect(await readerPage.getByRole('combobox').count()).toBe(0);
    } finally {
      await desk.close();
    }
  });
});
