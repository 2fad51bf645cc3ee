import type { Page } from 'playwright-core';
import { fieldTestBlocks } from './field-study';

const prompt = (id: string) => fieldTestBlocks.find((block) => block.id === id)!.prompt;

/** What the enumerator answers in one run of the field test questionnaire. */
export interface FieldInterviewScript {
  ownsLamp: boolean;
  photo?: Buffer;
  ladder: ('yes' | 'no')[];
  /** Typed in the respondent reference beside consent; the device keeps only its hash. */
  respondentReference?: string;
  onConsentScreen?: () => Promise<void>;
  /** A returned interview: every answer is already there, only Next is pressed. */
  correcting?: boolean;
  onPhotoScreen?: () => Promise<void>;
  beforeFinish?: () => Promise<void>;
  /** Called on the screen after the ownership question; returns the page to carry on with. */
  interruptAfterOwnership?: () => Promise<Page>;
}

async function screen(page: Page, blockId: string): Promise<void> {
  await page.getByRole('heading', { name: prompt(blockId) }).waitFor();
}

async function next(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Next' }).click();
}

/**
 * Runs the field test questionnaire through the interview runner, from the route page's start
 * button (or from the runner already open when correcting), and finishes it.
 */
export async function runFieldInterview(
  start: Page,
  pointName: string | null,
  script: FieldInterviewScript,
): Promise<Page> {
  let page = start;
  const fresh = !script.correcting;
  if (pointName) {
    await page.getByRole('button', { name: new RegExp(`Start interview.*${pointName}`) }).click();
  }
  await screen(page, 'consent');
  if (fresh) await page.getByRole('radio', { name: 'Agrees to take part' }).check();
  if (fresh && script.respondentReference) {
    await page.getByLabel('Respondent reference (optional)').fill(script.respondentReference);
    await page.getByText('Kept as a one-way code.').waitFor();
  }
  await script.onConsentScreen?.();
  await next(page);
  await screen(page, 'owns-lamp');
  if (fresh) {
    const choice = script.ownsLamp ? 'Yes, it owns one' : 'No, it does not';
    await page.getByRole('radio', { name: choice }).check();
  }
  await next(page);
  if (script.interruptAfterOwnership) {
    // The next screen shows only once the answer is stored: close the tab after that.
    await screen(page, script.ownsLamp ? 'lamps' : 'bid');
    page = await script.interruptAfterOwnership();
  }
  if (script.ownsLamp) {
    await screen(page, 'lamps');
    if (fresh) await page.getByRole('spinbutton').fill('2');
    await next(page);
  }
  await screen(page, 'bid');
  if (fresh) await page.getByRole('radio', { name: 'Yes' }).check();
  await next(page);
  await screen(page, 'tag-photo');
  if (script.photo) {
    await page.locator('input[type="file"]').setInputFiles({
      name: 'price-tag.jpg',
      mimeType: 'image/jpeg',
      buffer: script.photo,
    });
    await page.getByRole('img', { name: 'Photo 1' }).waitFor();
  }
  await script.onPhotoScreen?.();
  await next(page);
  await screen(page, 'ladder');
  for (const [i, choice] of script.ladder.entries()) {
    const step = page.locator('.ladder__step').nth(i);
    await step.getByRole('radio', { name: choice === 'yes' ? 'Yes' : 'No' }).check();
  }
  await next(page);
  await page.getByRole('heading', { name: 'End of the questionnaire' }).waitFor();
  await script.beforeFinish?.();
  await page.getByRole('button', { name: 'Finish interview' }).click();
  await page.waitForURL(/\/field\/routes\//);
  return page;
}
