import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';
import type { FitSummary } from '@shared/analysis/fit-resource';
import { demoPeople } from '../../server/demo/demo-people';
import { lanternStudy } from '../../server/demo/lantern/lantern-study';
import { firstLink, waitForMessageTo } from '../support/mail-sink-client';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { appUrl, launchBrowser, phoneViewport, type BrowserSession } from './support/browser';
import { chooseOption } from './support/material-select';
import { pollUntil } from './support/poll';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// The analysis loop on the demo lantern study: a researcher filters and weights the interviews,
// fits two methods, compares them, simulates a tax and publishes; the study's client gets the
// e-mail, opens the schedule and downloads it in every format.
const researcher = demoPeople.find((person) => person.roles.includes('researcher'))!;
const client = demoPeople.find((person) => person.roles.includes('client'))!;
const desk = { width: 1280, height: 900 };

let browser: BrowserSession;
let page: Page;
let studyId = '';

beforeAll(async () => {
  browser = await launchBrowser({ viewport: desk, acceptDownloads: true });
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
});

afterAll(async () => {
  await browser.close();
});

const tab = (name: string) =>
  page.getByRole('tablist', { name: 'Analysis steps' }).getByRole('tab', { name });

/** A page in both sizes the product is shown at: desk and phone. */
async function screenshotBothSizes(name: string): Promise<void> {
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize(phoneViewport);
  await page.waitForTimeout(400); // charts redraw on resize
  await screenshot(page, `${name}-360`);
  await page.setViewportSize(desk);
  await page.waitForTimeout(400);
}

async function finishedFits(): Promise<FitSummary[]> {
  const response = await page.request.get(appUrl(`/api/studies/${studyId}/fits`));
  const fits = (await response.json()) as FitSummary[];
  return fits.filter((fit) => fit.status === 'done' || fit.status === 'failed');
}

async function runFitAndWait(expectedFinished: number, counted: string): Promise<void> {
  await page.getByRole('button', { name: 'Run the fit' }).click();
  const fits = await pollUntil(finishedFits, (list) => list.length >= expectedFinished, 60_000);
  expect(fits.map((fit) => fit.status)).toEqual(new Array(fits.length).fill('done'));
  await page
    .getByRole('status')
    .getByText(new RegExp(`Fit finished on \\d+ ${counted}\\.`))
    .waitFor();
}

describe('the researcher’s analysis workspace', () => {
  it('opens the demo study from the Analysis section', async () => {
    await signIn(page, researcher.email);
    await page
      .getByRole('navigation', { name: 'Sections' })
      .getByRole('link', { name: 'Analysis' })
      .click();
    await page.getByRole('heading', { level: 1, name: 'Analysis' }).waitFor();
    await page
      .getByRole('listitem')
      .filter({ hasText: lanternStudy.name })
      .getByRole('link', { name: 'Open workspace' })
      .click();
    await page.getByRole('heading', { level: 1, name: lanternStudy.name }).waitFor();
    studyId = /\/analysis\/([0-9a-f-]{36})\//.exec(page.url())![1];
  });

  it('filters, weights to region shares and fits observed prices, then the price ladder', async () => {
    await page.getByLabel('First day').fill('2026-11-02');
    await page.getByLabel('Last day').fill('2026-11-28');
    await page.getByRole('radio', { name: 'Leave out' }).check();

    await page.getByRole('switch', { name: 'Weight to population margins' }).click();
    await page.getByRole('button', { name: 'Add a margin' }).click();
    await page.getByRole('menuitem', { name: 'Region' }).click();
    const shares = { 'North shore': '45', 'South shore': '35', 'Hill villages': '20' };
    for (const [region, share] of Object.entries(shares)) {
      await page.getByLabel(`Population share of ${region}, percent`).fill(share);
    }
    await page.getByText('Region: 100 %').waitFor();

    await page.getByLabel('From', { exact: true }).fill('800');
    await page.getByLabel('To', { exact: true }).fill('2600');
    await page.getByLabel('Prices', { exact: true }).fill('7');
    await runFitAndWait(1, 'shelf observations');
    // The weighted fit reports what the raking cost in precision.
    await page.getByText('Design effect (estimate)').waitFor();
    await screenshotBothSizes('analysis-setup');
    await expectNoSeriousViolations(page, 'the analysis set-up');

    await chooseOption(page, page, 'Method', /^Price ladder/);
    await runFitAndWait(2, 'respondents');
  });

  it('shows the results: coefficients, the curve with its band, and figures with intervals', async () => {
    await tab('Results').click();
    await page.getByRole('heading', { name: 'Coefficients' }).waitFor();
    await page
      .getByRole('columnheader', { name: /95 % interval/ })
      .first()
      .waitFor();
    await page.locator('app-demand-chart canvas').waitFor();
    await page.getByText('Revenue-maximising price', { exact: true }).waitFor();
    expect(await page.locator('.estimate__tag').count()).toBeGreaterThan(2);
    await page.waitForTimeout(500);
    await screenshotBothSizes('analysis-workspace');
    await expectNoSeriousViolations(page, 'the analysis results');
  });

  it('compares the two methods on one chart', async () => {
    await tab('Compare').click();
    await page.getByRole('heading', { name: 'Demand curves side by side' }).waitFor();
    const chosen = page.getByRole('checkbox', { checked: true });
    await pollUntil(
      () => chosen.count(),
      (n) => n === 2,
      10_000,
    );
    await page.locator('app-comparison-chart canvas').waitFor();
    await page.waitForTimeout(500);
    await screenshot(page, 'analysis-compare-1280');
  });

  it('simulates a tax and shows who bears it and the deadweight loss', async () => {
    await tab('Price policy').click();
    await page.getByRole('radio', { name: 'Tax per unit' }).check();
    await page.getByRole('spinbutton', { name: /^Tax per unit/ }).fill('150');
    await page.getByLabel('Supply elasticity').fill('1.2');
    const outcome = page.locator('.outcome');
    for (const label of [
      /^New price buyers pay$/,
      /^Tax revenue/,
      /^Borne by buyers$/,
      /^Deadweight loss/,
    ]) {
      await outcome.locator('dt').filter({ hasText: label }).waitFor();
    }
    await page.locator('app-policy-chart canvas').waitFor();
    await page.waitForTimeout(500);
    await screenshotBothSizes('analysis-simulator');
    await expectNoSeriousViolations(page, 'the price-policy simulator');
  });

  it('publishes the ladder fit for the study’s clients', async () => {
    await tab('Publish').click();
    await page.getByLabel('Title').fill('Solar lantern demand, November round');
    await page.getByRole('button', { name: 'Publish to clients' }).click();
    await page.getByText(/Version \d+ published; \d+ clients? told by e-mail/).waitFor();
    await page
      .getByRole('list', { name: 'Published versions' })
      .getByText('current')
      .first()
      .waitFor();
  });
});

describe('the client’s portal', () => {
  it('gets the e-mail, opens the schedule and downloads CSV, XLSX and PDF', async () => {
    const message = await waitForMessageTo(client.email, 15_000);
    expect(message.subject).toContain('New demand schedule');
    const link = firstLink(message);
    expect(new URL(link).pathname).toMatch(/^\/reports\/[0-9a-f-]{36}\/schedules\/[0-9a-f-]{36}$/);

    await browser.close();
    browser = await launchBrowser({ viewport: desk, acceptDownloads: true });
    page = browser.context.pages()[0] ?? (await browser.context.newPage());
    await signIn(page, client.email);
    await page.goto(link);
    await page
      .getByRole('heading', { level: 1, name: 'Solar lantern demand, November round' })
      .waitFor();
    await page
      .getByRole('complementary', { name: 'Caution' })
      .getByText(/estimate/)
      .waitFor();
    await page.locator('app-demand-chart canvas').waitFor();
    await page
      .getByRole('columnheader', { name: /Buying share/ })
      .first()
      .waitFor();

    const expected = {
      pdf: (bytes: Buffer) => bytes.subarray(0, 5).toString('latin1') === '%PDF-',
      xlsx: (bytes: Buffer) => bytes.subarray(0, 2).toString('latin1') === 'PK',
      csv: (bytes: Buffer) =>
        /price/i.test(bytes.toString('utf8')) && bytes.toString('utf8').includes(','),
    };
    for (const [format, looksRight] of Object.entries(expected)) {
      const [download] = await Promise.all([
        page.waitForEvent('download'),
        page.locator(`a[data-format="${format}"]`).click(),
      ]);
      expect(download.suggestedFilename().endsWith(`.${format}`)).toBe(true);
      const bytes = readFileSync(await download.path());
      expect({ format, size: bytes.length > 0, type: looksRight(bytes) }).toEqual({
        format,
        size: true,
        type: true,
      });
    }
    await page.waitForTimeout(500);
    await screenshotBothSizes('portal-schedule');
    await expectNoSeriousViolations(page, 'the client’s schedule page');

    await page
      .getByRole('navigation', { name: 'Sections' })
      .getByRole('link', { name: 'Reports' })
      .click();
    await page.getByRole('heading', { level: 1, name: 'Reports' }).waitFor();
    await page.getByRole('link', { name: 'Open schedule' }).first().waitFor();
    await screenshot(page, 'portal-reports-1280');
    await expectNoSeriousViolations(page, 'the client’s reports list');
  });

  it('issues an API token shown once, which opens the read API until it is revoked', async () => {
    await page.getByRole('link', { name: 'Manage API access' }).click();
    await page.getByRole('heading', { level: 1, name: 'API access' }).waitFor();
    await page.getByLabel('What will use it').fill('Price planner workbook');
    await page.getByRole('button', { name: 'Issue token' }).click();
    const token = (await page.getByTestId('issued-token').textContent())!.trim();
    expect(token.length).toBeGreaterThan(20);
    await page.getByRole('link', { name: 'OpenAPI document' }).waitFor();
    await screenshot(page, 'portal-tokens-1280');
    await expectNoSeriousViolations(page, 'the API access page');

    const readApi = () =>
      fetch(appUrl('/api/v1/schedules'), { headers: { authorization: `Bearer ${token}` } });
    const open = await readApi();
    expect(open.status).toBe(200);
    expect(((await open.json()) as unknown[]).length).toBeGreaterThan(0);

    await page.getByRole('button', { name: 'Revoke the token Price planner workbook' }).click();
    const revoked = page.getByRole('listitem').filter({ hasText: 'Price planner workbook' });
    await revoked.getByText(/revoked by its owner/).waitFor();
    expect(await revoked.innerText()).toMatch(/revoked by its owner \d+ \w+ \d{4}, \d\d:\d\d/);
    expect((await readApi()).status).toBe(401);
  });
});
