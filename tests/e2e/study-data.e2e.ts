import type { Page } from 'playwright-core';
import { demoPeople } from '../../server/demo/demo-people';
import { lanternStudy } from '../../server/demo/lantern/lantern-study';
import { csvText, salesHeader, salesRows } from '../support/sales-csv';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { launchBrowser, phoneViewport, type BrowserSession } from './support/browser';
import { chooseOption } from './support/material-select';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// A researcher brings the team's outlet sales into the demo study: the first file has a price
// typed as text, the screen names its line and column, the fixed file imports, and a log-log
// fit with outlet fixed effects, the rival product's price and errors clustered by outlet runs
// in the database and shows its estimates with intervals.
const researcher = demoPeople.find((person) => person.roles.includes('researcher'))!;
const desk = { width: 1280, height: 900 };

let browser: BrowserSession;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser({ viewport: desk });
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
});

afterAll(async () => {
  await browser.close();
});

async function chooseFile(rows: string[][], name: string): Promise<void> {
  await page.locator('input[type=file]').setInputFiles({
    name,
    mimeType: 'text/csv',
    buffer: Buffer.from(csvText(salesHeader, rows)),
  });
  await page.getByRole('heading', { name: 'What each column holds' }).waitFor();
  // The shore is a grouping; the suggestion took it for a number.
  await chooseOption(page, page.getByRole('group', { name: 'Shore' }), 'Role', /^Grouping/);
}

async function bothSizes(name: string): Promise<void> {
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize(phoneViewport);
  await page.waitForTimeout(300);
  await screenshot(page, `${name}-360`);
  await page.setViewportSize(desk);
  await page.waitForTimeout(300);
}

describe('a researcher’s own sales data', () => {
  it('opens the study’s data area from the study page', async () => {
    await signIn(page, researcher.email);
    await page
      .getByRole('navigation', { name: 'Sections' })
      .getByRole('link', { name: 'Studies' })
      .click();
    await page.getByRole('link', { name: lanternStudy.name }).first().click();
    await page.getByRole('link', { name: 'Data', exact: true }).click();
    await page.getByRole('heading', { level: 1, name: 'Study data' }).waitFor();
  });

  it('shows the line and column of a bad price, and stores nothing', async () => {
    const rows = salesRows(600, 23);
    rows[4][2] = 'abc';
    await chooseFile(rows, 'outlet-sales.csv');
    await page.getByRole('button', { name: 'Import every row' }).click();
    const problems = page.getByRole('table', { name: 'Problems found' });
    await problems.waitFor();
    const first = problems.getByRole('row').nth(1);
    expect(await first.getByRole('cell').allTextContents()).toEqual([
      '6',
      'Price',
      '"abc" is not a number (write plain decimals such as 12.5)',
    ]);
    await page.getByText('Nothing was imported.').waitFor();
    await bothSizes('study-data-problem');
  });

  it('imports the corrected file', async () => {
    await chooseFile(salesRows(600, 23), 'outlet-sales-fixed.csv');
    await page.getByRole('table', { name: 'First rows of the file' }).waitFor();
    await page.getByRole('button', { name: 'Import every row' }).click();
    await page.getByText('Imported 600 rows into “outlet-sales-fixed”.').waitFor();
    await page
      .getByRole('listitem')
      .filter({ hasText: 'outlet-sales-fixed' })
      .getByText('600 rows')
      .waitFor();
  });

  it('fits log-log demand with outlet effects, a cross price and clustered errors', async () => {
    await page.getByRole('checkbox', { name: 'rival_price' }).check();
    await page.getByRole('checkbox', { name: 'outlet' }).check();
    await chooseOption(page, page, 'Standard errors', 'Clustered by outlet');
    await page.getByRole('button', { name: 'Fit', exact: true }).click();
    const result = page.getByRole('region', { name: 'Fit result' });
    await result.getByText('These are estimates').waitFor({ timeout: 60_000 });
    const elasticities = result.getByRole('table', { name: 'Elasticities' });
    await elasticities.getByRole('cell', { name: 'cross price' }).waitFor();
    await elasticities.getByRole('cell', { name: 'own price' }).waitFor();
    await result.getByText('errors clustered by outlet, 6 clusters').waitFor();
    await result.getByText(/fixed effects for outlet entered as dummies/).waitFor();
    await bothSizes('study-data-fit');
    await expectNoSeriousViolations(page, 'the study data area');
  });
});
