import { and, count, eq, sql } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { connectDatabase, type Database } from '../../server/db/database';
import { interviews, questionnaireVersions, questionnaires } from '../../server/db/schema';
import { expectNoSeriousViolations } from './support/accessibility';
import './support/browser-test-timeout';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { insertFieldTestStudy, type FieldTestStudy } from './support/field-study';
import { screenshot } from './support/screenshots';
import { signIn } from './support/sign-in';

// A supervisor works through a study of 130 interviews on a phone: the pending count on the
// study list, pages, a flag filter kept in the address, a search by reference, stepping from one
// interview to the next, and accepting the unflagged ones of a page with one confirmation.
const total = 130;
const flaggedEvery = 10;

let db: Database;
let browser: BrowserSession;
let page: Page;
let study: FieldTestStudy;

async function insertInterviews(): Promise<void> {
  const [version] = await db
    .select({ id: questionnaireVersions.id })
    .from(questionnaireVersions)
    .innerJoin(questionnaires, eq(questionnaires.id, questionnaireVersions.questionnaireId))
    .where(eq(questionnaires.studyId, study.studyId));
  const flag = JSON.stringify([
    {
      kind: 'too-short',
      durationSeconds: 40,
      answeredBlocks: 4,
      secondsPerBlock: 10,
      minSecondsPerBlock: 20,
    },
  ]);
  await db.execute(sql`
    insert into interviews (id, study_id, questionnaire_version_id, route_id, point_id,
      enumerator_id, status, answers, flags, started_at, finished_at, photo_count)
    select gen_random_uuid(), ${study.studyId}, ${version.id}, ${study.routeId},
      (array[${study.pointIds[0]}::uuid, ${study.pointIds[1]}::uuid])[1 + i % 2],
      ${study.enumeratorId},
      (case when i % ${flaggedEvery} = 0 then 'flagged' else 'received' end)::interview_status,
      '{"consent":{"agreed":true}}'::jsonb,
      case when i % ${flaggedEvery} = 0 then ${flag}::jsonb else '[]'::jsonb end,
      now() - make_interval(mins => i * 30 + 8), now() - make_interval(mins => i * 30), 0
    from generate_series(1, ${total}) as i`);
}

async function acceptedCount(): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(interviews)
    .where(and(eq(interviews.studyId, study.studyId), eq(interviews.status, 'accepted')));
  return row.n;
}

beforeAll(async () => {
  db = connectDatabase(process.env['DATABASE_URL']!);
  study = await insertFieldTestStudy(db);
  await insertInterviews();
  browser = await launchBrowser();
  page = await browser.context.newPage();
  await signIn(page, 'supervisor@tidewater.test');
});

afterAll(async () => {
  await browser?.close();
  await db?.$client.end();
});

describe('reviewing a large study', () => {
  it('shows on the study list how many interviews wait for a decision', async () => {
    await page.goto(appUrl('/review'));
    await page
      .getByText(`${total} interviews wait for a decision, ${total / flaggedEvery} flagged.`)
      .waitFor();
  });

  it('pages through the queue, and keeps the page in the address', async () => {
    await page.goto(appUrl(`/review/${study.studyId}`));
    await page.getByText(`${total} interviews`, { exact: true }).waitFor();
    await page.getByText(`1 – 50 of ${total}`).waitFor();
    await screenshot(page, 'review-queue-pages-360');
    await expectNoSeriousViolations(page, 'the paged review queue');
    await page.getByRole('button', { name: 'Next page' }).click();
    await page.getByText(`51 – 100 of ${total}`).waitFor();
    expect(new URL(page.url()).searchParams.get('page')).toBe('2');
  });

  it('filters by flag kind, and the filter survives a reload', async () => {
    await page.getByLabel('Flag').selectOption({ label: 'Quicker than the questions allow' });
    await page.getByText(`${total / flaggedEvery} interviews match`).waitFor();
    expect(new URL(page.url()).searchParams.get('flag')).toBe('too-short');
    expect(new URL(page.url()).searchParams.get('page')).toBeNull();
    await page.reload();
    await page.getByText(`${total / flaggedEvery} interviews match`).waitFor();
    await page.getByRole('button', { name: 'Clear filters' }).click();
    await page.getByText(`${total} interviews`, { exact: true }).waitFor();
  });

  it('finds an interview by the reference a colleague quotes', async () => {
    const [target] = await db
      .select({ id: interviews.id })
      .from(interviews)
      .where(eq(interviews.studyId, study.studyId))
      .limit(1);
    const reference = target.id.slice(0, 8);
    await page.getByLabel('Reference').fill('xyz');
    await page.getByLabel('Reference').press('Enter');
    await page.getByRole('alert').filter({ hasText: 'at least four characters' }).waitFor();
    await page.getByLabel('Reference').fill(reference.toUpperCase());
    await page.getByLabel('Reference').press('Enter');
    await page.getByText(`interview ${reference}`).first().waitFor();
    // Eight hex digits: two of 130 random ids sharing them is a one-in-a-million chance.
    await page.getByText('1 interview matches').waitFor();
    expect(new URL(page.url()).searchParams.get('reference')).toBe(reference.toUpperCase());
    await page.getByRole('button', { name: 'Clear filters' }).click();
    await page.getByText(`${total} interviews`, { exact: true }).waitFor();
  });

  it('steps from one interview to the next without going back to the list', async () => {
    await page.getByLabel('Flag').selectOption({ label: 'Quicker than the questions allow' });
    await page.getByText(`${total / flaggedEvery} interviews match`).waitFor();
    await page
      .getByRole('link', { name: /^Open the interview/ })
      .first()
      .click();
    await page.getByRole('heading', { name: 'Quality flags' }).waitFor();
    const first = page.url();
    await page.getByRole('link', { name: 'Next' }).click();
    await page.waitForURL((url) => url.toString() !== first);
    await page.getByRole('link', { name: 'Previous' }).waitFor();
    expect(new URL(page.url()).searchParams.get('at')).toBe('1');
    await screenshot(page, 'review-interview-next-360');
    await page.getByRole('link', { name: 'Review queue' }).click();
    await page.getByText(`${total / flaggedEvery} interviews match`).waitFor();
    await page.getByRole('button', { name: 'Clear filters' }).click();
    await page.getByText(`${total} interviews`, { exact: true }).waitFor();
  });

  it('accepts the unflagged interviews of a page with one confirmation', async () => {
    // Decisions needed first: the first page holds the 13 flagged and 37 unflagged interviews.
    await page.getByRole('button', { name: 'Select unflagged on this page' }).click();
    await page.getByRole('button', { name: 'Accept 37…' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('heading', { name: 'Accept 37 interviews?' }).waitFor();
    await screenshot(page, 'review-accept-several-360');
    await dialog.getByRole('button', { name: 'Accept 37' }).click();
    await page.getByText('Accepted 37 interviews.').waitFor();
    expect(await acceptedCount()).toBe(37);
  });

  it('reads well at desk width', async () => {
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto(appUrl(`/review/${study.studyId}?sort=newest`));
    await page.getByText(`${total} interviews match`).waitFor();
    await screenshot(page, 'review-queue-desk');
    await expectNoSeriousViolations(page, 'the review queue at desk width');
  });
});
