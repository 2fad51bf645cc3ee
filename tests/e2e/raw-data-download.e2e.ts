import { readFile } from 'node:fs/promises';
import { parse } from 'csv-parse/sync';
import { sql } from 'drizzle-orm';
import type { Download, Page } from 'playwright-core';
import { connectDatabase, type Database } from '../../server/db/database';
import { demoPeople } from '../../server/demo/demo-people';
import { lanternStudy } from '../../server/demo/lantern/lantern-study';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { appUrl, launchBrowser, phoneViewport, type BrowserSession } from './support/browser';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// A researcher downloads the demo study's raw interviews and their dictionary from the study
// page; a client of the same study is never offered them.
const researcher = demoPeople.find((person) => person.roles.includes('researcher'))!;
const client = demoPeople.find((person) => person.roles.includes('client'))!;
const desk = { width: 1280, height: 900 };

let browser: BrowserSession;
let page: Page;
let db: Database;
let studyPath = '';
let csvHeader: string[] = [];

beforeAll(async () => {
  db = connectDatabase(process.env['DATABASE_URL'] ?? '', 2);
  browser = await launchBrowser({ viewport: desk, acceptDownloads: true });
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
});

afterAll(async () => {
  await browser.close();
  await db.$client.end();
});

async function openStudy(): Promise<void> {
  await page
    .getByRole('navigation', { name: 'Sections' })
    .getByRole('link', { name: 'Studies' })
    .click();
  await page.getByRole('link', { name: lanternStudy.name }).first().click();
  await page.getByRole('heading', { level: 1, name: lanternStudy.name }).waitFor();
}

async function downloaded(link: string): Promise<{ download: Download; text: string }> {
  const card = page.getByRole('heading', { name: 'Raw data' }).locator('xpath=ancestor::mat-card');
  const [download] = await Promise.all([
    page.waitForEvent('download'),
    card.getByRole('link', { name: link }).click(),
  ]);
  const path = await download.path();
  return { download, text: await readFile(path, 'utf8') };
}

describe('raw data from the study page', () => {
  it('offers a researcher the raw-data card with what the file holds', async () => {
    await signIn(page, researcher.email);
    await openStudy();
    studyPath = new URL(page.url()).pathname;
    await page.getByRole('heading', { name: 'Raw data' }).waitFor();
    await page.getByText(/photo links that stop working after 24 hours/).waitFor();
    await page.getByText(/only as the study’s ethics rules allow/).waitFor();
    await page.getByRole('heading', { name: 'Raw data' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'raw-data-card-1280');
    await page.setViewportSize(phoneViewport);
    await page.waitForTimeout(300);
    await screenshot(page, 'raw-data-card-360');
    await expectNoSeriousViolations(page, 'the study page with its raw-data card');
    await page.setViewportSize(desk);
    await page.waitForTimeout(300);
  });

  it('downloads one CSV row per interview of the study, every review state', async () => {
    const { download, text } = await downloaded('Download interviews (CSV)');
    expect(download.suggestedFilename()).toMatch(/-interviews\.csv$/);
    const rows = parse(text, { relax_column_count: false, bom: true });
    const header = rows[0];
    expect(header).toEqual(expect.arrayContaining(['interview_id', 'review_state']));
    // The count comes from PostgreSQL, not from the export.
    const counted = await db.execute<{ n: number }>(
      sql`SELECT count(*)::int AS n FROM interviews
          WHERE study_id = (SELECT id FROM studies WHERE name = ${lanternStudy.name} LIMIT 1)`,
    );
    expect(counted.rows[0].n).toBeGreaterThan(0);
    expect(rows.length - 1).toBe(counted.rows[0].n);
    csvHeader = header;
  });

  it('downloads a dictionary that names every column of the file, in order', async () => {
    const { text } = await downloaded('Download data dictionary (JSON)');
    const dictionary = JSON.parse(text) as {
      study: { name: string };
      columns: { name: string }[];
    };
    expect(dictionary.study.name).toBe(lanternStudy.name);
    expect(dictionary.columns.map((column) => column.name)).toEqual(csvHeader);
  });

  it('offers no link while no review state is chosen', async () => {
    const card = page
      .getByRole('heading', { name: 'Raw data' })
      .locator('xpath=ancestor::mat-card');
    for (const state of ['Received', 'Flagged', 'Accepted', 'Returned', 'Rejected']) {
      await card.getByRole('checkbox', { name: state }).uncheck();
    }
    await card.getByRole('alert').filter({ hasText: 'Choose at least one review state' }).waitFor();
    expect(await card.getByRole('link', { name: /Download/ }).count()).toBe(0);
  });

  it('shows a client of the study no raw-data card, and the server refuses the file', async () => {
    // A browser of the client's own, so nothing of the researcher's session carries over.
    const other = await launchBrowser({ viewport: desk });
    page = other.context.pages()[0] ?? (await other.context.newPage());
    await browser.close();
    browser = other;
    await signIn(page, client.email);
    await page.goto(appUrl(studyPath));
    await page.getByRole('heading', { level: 1, name: lanternStudy.name }).waitFor();
    expect(await page.getByRole('heading', { name: 'Raw data' }).count()).toBe(0);
    const studyId = studyPath.split('/').filter(Boolean).pop()!;
    const response = await page.request.get(
      appUrl(`/api/studies/${studyId}/raw-data/interviews.csv`),
    );
    expect(response.status()).toBe(403);
  });
});
