import { randomUUID } from 'node:crypto';
import type { Locator, Page } from 'playwright-core';
import { blockKindLabels, blockKinds } from '@shared/questionnaire/block-kind';
import type { QuestionnaireVersion } from '@shared/questionnaire/questionnaire-resource';
import { demoPeople } from '../../server/demo/demo-people';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { chooseOption } from './support/material-select';
import { screenshot as fullPageScreenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// A researcher on a phone-sized screen: a study, a questionnaire with every kind of block, the
// live preview, validation tied to blocks, publishing, and axe-core on each screen.
let browser: BrowserSession;
let page: Page;
const researcher = demoPeople.find((person) => person.roles.includes('researcher'))!;
const studyName = `Lamp study ${randomUUID().slice(0, 6)}`;

beforeAll(async () => {
  browser = await launchBrowser();
  page = browser.context.pages()[0] ?? (await browser.context.newPage());
  await signIn(page, researcher.email);
});

afterAll(async () => {
  await browser.close();
});

/** A full-page screenshot from the top: the shell scrolls an inner container, not the page. */
async function screenshot(target: Page, name: string): Promise<void> {
  await target.evaluate(() => {
    for (const element of Array.from(document.querySelectorAll('*'))) {
      if (element.scrollTop > 0) element.scrollTop = 0;
    }
  });
  await fullPageScreenshot(target, name);
}

const heading = (name: string | RegExp) => page.getByRole('heading', { level: 1, name });
const preview = () => page.getByRole('region', { name: 'What the enumerator sees' });
const blockCard = (index: number): Locator =>
  page.getByRole('list', { name: 'Blocks of the questionnaire' }).locator(':scope > li').nth(index);

async function createStudy(): Promise<void> {
  await page.goto(appUrl('/studies'));
  await heading('Studies').waitFor();
  await screenshot(page, 'studies-list-360');
  await expectNoSeriousViolations(page, 'the study list');
  await page.getByRole('link', { name: 'New study' }).click();
  await heading('New study').waitFor();
  await page.getByLabel('Study name').fill(studyName);
  await page.getByLabel('Product', { exact: true }).fill('Solar lantern');
  await chooseOption(page, page, 'Currency', /^KES ·/);
  await page.getByLabel('Locale').fill('en-KE');
  await page.getByLabel('Market').fill('Households in two invented lakeside towns');
  await page.getByLabel('Lowest price').fill('500');
  await page.getByLabel('Highest price').fill('4,000.50');
  await page.getByLabel('Target sample').fill('300');
  await page.getByText(/Shown as .*4,000\.50/).waitFor();
  await screenshot(page, 'study-form-360');
  await expectNoSeriousViolations(page, 'the study form');
  await page.getByRole('button', { name: 'Create study' }).click();
  await heading(studyName).waitFor();
}

/** Adds the demo supervisor to the study, with the one study role they hold. */
async function addSupervisor(): Promise<void> {
  const supervisor = demoPeople.find((person) => person.roles.includes('supervisor'))!;
  const people = page
    .getByRole('heading', { name: 'People on this study' })
    .locator('xpath=ancestor::mat-card');
  await people.getByText(researcher.name).waitFor();
  await chooseOption(page, people, 'Person', new RegExp(`^${supervisor.name}`));
  expect(await people.getByRole('checkbox', { name: 'Supervisor' }).isChecked()).toBe(true);
  await people.getByRole('button', { name: 'Add to study' }).click();
  await people.getByRole('listitem').filter({ hasText: supervisor.email }).waitFor();
}

async function createQuestionnaire(): Promise<void> {
  await addSupervisor();
  await page.getByLabel('Title').fill('Household lantern survey');
  await screenshot(page, 'study-page-360');
  await expectNoSeriousViolations(page, 'the study page');
  await page.getByRole('button', { name: 'Create questionnaire' }).click();
  await heading('Household lantern survey').waitFor();
  await page.getByText('Version 1 · draft').waitFor();
}

/** Adds every kind but consent (already there) from the palette, each after the one before. */
async function addEveryKind(): Promise<void> {
  const palette = page.getByRole('region', { name: 'Add a block' });
  for (const kind of blockKinds.filter((k) => k !== 'consent')) {
    await palette.getByRole('button', { name: blockKindLabels[kind], exact: true }).click();
  }
  expect(
    await page
      .getByRole('list', { name: 'Blocks of the questionnaire' })
      .locator(':scope > li')
      .count(),
  ).toBe(16);
}

async function openBlock(index: number): Promise<Locator> {
  const card = blockCard(index);
  const toggle = card.locator('.block__toggle');
  if ((await toggle.getAttribute('aria-expanded')) !== 'true') await toggle.click();
  return card;
}

describe('the questionnaire editor', () => {
  it('builds, previews and publishes a questionnaire with every kind of block', async () => {
    await createStudy();
    await createQuestionnaire();
    await addEveryKind();

    // A ladder price out of order is named with its block, and the draft cannot be saved.
    const ladder = await openBlock(1);
    await ladder.getByLabel('Price 2', { exact: true }).fill('0.50');
    const problems = page.getByRole('region', { name: /problems? to fix/ });
    await problems
      .getByText('Each price must be higher than the one before: price 2 is not')
      .waitFor();
    expect(await page.getByRole('button', { name: 'Publish' }).isDisabled()).toBe(true);
    await screenshot(page, 'editor-problem-360');
    // The ladder starts from the study's range (Ksh 500 to 4,000.50), so price 1 is 500.
    await ladder.getByLabel('Price 2', { exact: true }).fill('1000');
    await problems.waitFor({ state: 'detached' });

    // Double bounds bring follow-up bids to every bid.
    const bids = await openBlock(5);
    await chooseOption(page, bids, 'Bounds', /^Double-bounded/);
    await bids.getByLabel('After a yes (higher)').first().waitFor();

    // The text block is asked only when the single choice was answered "yes".
    const text = await openBlock(15);
    await text.getByRole('checkbox', { name: 'Ask only if an earlier answer…' }).check();
    await chooseOption(page, text, 'Earlier block', /^single-choice ·/);
    await chooseOption(page, text, 'Test', /^is$/);
    await chooseOption(page, text, 'Answer', /^Yes$/);

    // The preview shows every block as the enumerator sees it; the condition works live.
    const shown = preview();
    await shown.getByText('1 block is not asked with these answers.').waitFor();
    expect(await shown.locator('app-block-view').count()).toBe(15);
    // Nothing is answered before the researcher answers it.
    expect(await shown.getByLabel('None of these amounts').isChecked()).toBe(false);
    expect(await shown.getByLabel(/^Most they would pay/).inputValue()).toBe('');
    await shown.getByRole('radiogroup', { name: 'Choose one.' }).getByLabel('Yes').check();
    await shown.locator('[data-block-id="text"] app-block-view').waitFor();
    expect(await shown.locator('app-block-view').count()).toBe(16);
    await screenshot(page, 'editor-draft-360');
    await expectNoSeriousViolations(page, 'the questionnaire editor');

    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByRole('status').getByText('Draft version 1 saved.').waitFor();
    await page.getByRole('button', { name: 'Publish' }).click();
    await page
      .getByRole('status')
      .getByText('Version 1 is published; it can no longer change.')
      .waitFor();
    await page.getByRole('button', { name: 'Start a new draft' }).waitFor();
    await screenshot(page, 'editor-published-360');
    await expectNoSeriousViolations(page, 'the published questionnaire');

    const [, studyId, , questionnaireId] = new URL(page.url()).pathname.split('/').slice(1);
    const stored = await page.request.get(
      appUrl(`/api/studies/${studyId}/questionnaires/${questionnaireId}/versions/1`),
    );
    const version = (await stored.json()) as QuestionnaireVersion;
    expect(version.status).toBe('published');
    expect(version.definition.blocks.map((b) => b.kind)).toEqual([...blockKinds]);
    expect(version.definition.blocks[15].showIf).toEqual({
      blockId: 'single-choice',
      test: 'equals',
      value: 'yes',
    });
  });
});
