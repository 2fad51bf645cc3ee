import { createHash } from 'node:crypto';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { eq, inArray } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { loadConfig } from '../../server/config';
import { connectDatabase, type Database } from '../../server/db/database';
import { interviewPhotos, interviews } from '../../server/db/schema';
import { createObjectStorage, type ObjectStorage } from '../../server/storage/object-storage';
import { expectNoSeriousViolations } from './support/accessibility';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { insertFieldTestStudy, type FieldTestStudy } from './support/field-study';
import { runFieldInterview } from './support/field-runner';
import { generatedJpeg } from './support/generated-jpeg';
import { pollUntil } from './support/poll';
import { screenshot } from './support/screenshots';
import { waitForOfflineReady } from './support/service-worker';
import { signIn } from './support/sign-in';

const reedbank = { latitude: 1.2346, longitude: 30.9877, accuracy: 8 };
const quayside = { latitude: 1.2386, longitude: 30.9917, accuracy: 10 };
/** About 2.4 km from both points: the server flags such an interview as recorded far away. */
const farAway = { latitude: 1.25, longitude: 31.005, accuracy: 12 };
/** A phone number as an enumerator might type it; only its hash should reach the server. */
const phoneAsTyped = '+254 (712) 345-678';

describe('field work with no network', () => {
  let db: Database;
  let storage: ObjectStorage;
  let study: FieldTestStudy;
  let device: BrowserSession;
  let page: Page;
  const sentBatches: string[] = [];

  beforeAll(async () => {
    db = connectDatabase(process.env['DATABASE_URL'] ?? '', 2);
    storage = createObjectStorage(loadConfig());
    study = await insertFieldTestStudy(db);
    device = await launchBrowser({ geolocation: reedbank, permissions: ['geolocation'] });
    page = await device.context.newPage();
    device.context.on('request', (request) => {
      if (request.method() === 'POST' && request.url().endsWith('/api/field/sync')) {
        sentBatches.push(request.postData() ?? '');
      }
    });
  });

  afterAll(async () => {
    await device?.close();
    await db?.$client.end();
  });

  const storedInterviews = () =>
    db.select().from(interviews).where(eq(interviews.studyId, study.studyId));
  /** The device's rule, computed apart with Node's SHA-256: study id, ':', normalised reference. */
  const phoneKey = () =>
    createHash('sha256').update(`${study.studyId}:254712345678`, 'utf8').digest('base64url');

  it('keeps the assignments on the device after one online sign-in', async () => {
    await signIn(page, 'enumerator@tidewater.test');
    await page.goto(appUrl('/field/routes'));
    await page.getByRole('heading', { name: study.routeName }).waitFor();
    await waitForOfflineReady(page);
  });

  it('opens from the service worker offline and runs interviews with photos', async () => {
    await device.context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { name: 'My routes' }).waitFor();
    await page.getByRole('link', { name: `Open ${study.routeName}` }).click();
    await page.getByRole('heading', { name: study.routeName }).waitFor();
    await screenshot(page, 'field-route-360');

    const photos = [await generatedJpeg(page, 30), await generatedJpeg(page, 200, true)];
    await runFieldInterview(page, 'Reedbank kiosk', {
      ownsLamp: true,
      photo: photos[0],
      ladder: ['yes', 'yes', 'no'],
      beforeFinish: async () => {
        await screenshot(page, 'field-runner-end-360');
      },
      onPhotoScreen: async () => {
        await screenshot(page, 'field-runner-photo-360');
        await expectNoSeriousViolations(page, 'the interview runner (photo screen)');
      },
    });
    await device.context.setGeolocation(quayside);
    await runFieldInterview(page, 'Quayside shop', {
      ownsLamp: false,
      photo: photos[1],
      ladder: ['no', 'no', 'no'],
    });
  });

  it('resumes a closed tab at the same question, offline', async () => {
    await device.context.setGeolocation(farAway);
    const photo = await generatedJpeg(page, 120);
    await runFieldInterview(page, 'Reedbank kiosk', {
      ownsLamp: true,
      photo,
      ladder: ['yes', 'no', 'no'],
      respondentReference: phoneAsTyped,
      onConsentScreen: async () => {
        await screenshot(page, 'field-runner-consent-360');
        await expectNoSeriousViolations(page, 'the consent screen with the respondent reference');
      },
      interruptAfterOwnership: async () => {
        const interviewUrl = page.url();
        await page.close();
        page = await device.context.newPage();
        await page.goto(appUrl('/field/routes'));
        await page.getByRole('link', { name: 'Continue the interview' }).click();
        await page.waitForURL(interviewUrl);
        await page.getByRole('heading', { name: 'How many solar lamps does it own?' }).waitFor();
        return page;
      },
    });
  });

  it('still holds every finished interview after the page is closed and reopened', async () => {
    await page.close();
    page = await device.context.newPage();
    await page.goto(appUrl('/field/sync'));
    await page.getByTestId('waiting-interviews').filter({ hasText: '3' }).waitFor();
    await page.getByTestId('waiting-photos').filter({ hasText: '3' }).waitFor();
    await screenshot(page, 'field-sync-offline-360');
    await expectNoSeriousViolations(page, 'the sync page');
    expect(await storedInterviews()).toHaveLength(0);
  });

  it('syncs every interview and photo once the network is back', async () => {
    await device.context.setOffline(false);
    await page.getByRole('button', { name: 'Sync now' }).click();
    await page.getByTestId('waiting-interviews').filter({ hasText: '0' }).waitFor();
    await page.getByTestId('waiting-photos').filter({ hasText: '0' }).waitFor({ timeout: 60_000 });
    await screenshot(page, 'field-sync-done-360');

    const rows = await storedInterviews();
    expect(rows).toHaveLength(3);
    expect(rows.every((row) => row.enumeratorId === study.enumeratorId)).toBe(true);
    expect(rows.every((row) => row.completeAt !== null)).toBe(true);
    const recordedFar = rows.filter((row) =>
      (row.flags as { kind: string }[]).some((flag) => flag.kind === 'gps-far'),
    );
    expect(recordedFar).toHaveLength(1);
    expect(recordedFar[0].status).toBe('flagged');
    // Typed before the tab was closed, kept through the resume as its hash alone.
    expect(recordedFar[0].respondentKey).toBe(phoneKey());
    expect(rows.filter((row) => row.respondentKey !== null)).toHaveLength(1);
    for (const typed of ['(712)', '345-678', '254712345678']) {
      expect(sentBatches.join('')).not.toContain(typed);
    }

    const photos = await db
      .select()
      .from(interviewPhotos)
      .where(
        inArray(
          interviewPhotos.interviewId,
          rows.map((row) => row.id),
        ),
      );
    expect(photos).toHaveLength(3);
    for (const photo of photos) {
      const object = await storage.client.send(
        new GetObjectCommand({ Bucket: storage.bucket, Key: photo.objectKey ?? '' }),
      );
      const bytes = Buffer.from(await object.Body!.transformToByteArray());
      expect(createHash('sha256').update(bytes).digest('hex')).toBe(photo.sha256);
      expect(bytes.length).toBe(photo.byteSize);
      expect(bytes.subarray(0, 3)).toEqual(Buffer.from([0xff, 0xd8, 0xff]));
    }
  }, 180_000);

  it('changes nothing when the same batch is sent again', async () => {
    expect(sentBatches.length).toBeGreaterThan(0);
    const answers = await page.evaluate(async (body) => {
      const session = (await (await fetch('/api/session')).json()) as { csrfToken: string };
      const response = await fetch('/api/field/sync', {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-csrf-token': session.csrfToken },
        body,
      });
      return (await response.json()) as { results: { outcome: string }[] };
    }, sentBatches[0]);
    expect(answers.results.length).toBeGreaterThan(0);
    expect(answers.results.every((result) => result.outcome === 'duplicate')).toBe(true);
    expect(await storedInterviews()).toHaveLength(3);
  });

  it('shows the device an interview a supervisor returned, to correct and send again', async () => {
    const supervisor = await launchBrowser();
    try {
      const review = await supervisor.context.newPage();
      await signIn(review, 'supervisor@tidewater.test');
      await review.goto(appUrl(`/review/${study.studyId}`));
      await review.getByRole('heading', { name: 'Review queue' }).waitFor();
      // The flag filter lists the same words as an option, so look among the cards.
      await review
        .getByRole('listitem')
        .filter({ hasText: 'Recorded away from the point' })
        .first()
        .waitFor();
      await screenshot(review, 'review-queue-360');
      await expectNoSeriousViolations(review, 'the review queue');
      await review
        .getByRole('listitem')
        .filter({ hasText: 'Recorded away from the point' })
        .getByRole('link', { name: /^Open the interview/ })
        .click();
      await review.getByRole('heading', { name: 'Quality flags' }).waitFor();
      await review.getByText(/Recorded away from the point: 2\.\d km away/).waitFor();
      await review.getByRole('img', { name: /recorded .* from the assigned point/ }).waitFor();
      // The photo itself loads from the object store through its short-lived link.
      await review.waitForFunction(() =>
        [...document.images].some(
          (image) => image.alt === 'Photo 1 of the interview' && image.naturalWidth > 0,
        ),
      );
      await screenshot(review, 'review-interview-360');
      await expectNoSeriousViolations(review, 'the interview review page');
      await review
        .getByLabel('Note for the enumerator')
        .fill('Recorded 2 km from the kiosk. Check where you were and record the interview again.');
      await review.getByRole('button', { name: 'Return to the enumerator' }).click();
      await review.getByText('Returned to the enumerator with your note.').waitFor();
    } finally {
      await supervisor.close();
    }
    expect((await storedInterviews()).filter((row) => row.status === 'returned')).toHaveLength(1);

    await page.getByRole('button', { name: 'Sync now' }).click();
    await page.getByRole('heading', { name: 'Returned for correction (1)' }).waitFor();
    await page.getByText('Recorded 2 km from the kiosk.').waitFor();
    await screenshot(page, 'field-sync-returned-360');

    await page.getByRole('button', { name: 'Correct and send again' }).click();
    await runFieldInterview(page, null, { correcting: true, ownsLamp: true, ladder: [] });
    await page.goto(appUrl('/field/sync'));
    await page.getByRole('button', { name: 'Sync now' }).click();
    await page.getByTestId('waiting-interviews').filter({ hasText: '0' }).waitFor();
    const statuses = await pollUntil(
      async () => (await storedInterviews()).map((row) => row.status),
      (all) => !all.includes('returned'),
    );
    expect(statuses).not.toContain('returned');
    expect(statuses).toHaveLength(3);
    const keys = (await storedInterviews()).map((row) => row.respondentKey);
    expect(keys.filter((key) => key !== null)).toEqual([phoneKey()]);
  }, 180_000);
});
