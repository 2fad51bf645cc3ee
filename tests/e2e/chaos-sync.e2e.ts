/**
 * Chaos sync: a device holding many finished interviews, some with a photo, syncs through the
 * real field app while the network drops at random moments, answers are lost after the server
 * acted on them, and the server is killed with SIGKILL and restarted several times. Afterwards
 * every interview and every photo is stored exactly once and nothing is left to send.
 *
 * By default 200 interviews with 20 photos, to fit `npm test`; `CHAOS_SYNC_INTERVIEWS=1000`
 * (as `npm run fuzz` sets) runs 1,000 with 100 photos. `CHAOS_SYNC_SEED` repeats a run's
 * choices of when to cut what (the seed is printed on failure).
 */
import { createHash, randomUUID } from 'node:crypto';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { and, count, eq, isNotNull } from 'drizzle-orm';
import type { Page, Route } from 'playwright-core';
import { loadConfig } from '../../server/config';
import { connectDatabase, type Database } from '../../server/db/database';
import {
  interviewPhotos,
  interviews,
  questionnaireVersions,
  questionnaires,
} from '../../server/db/schema';
import { createObjectStorage, type ObjectStorage } from '../../server/storage/object-storage';
import { builtAppDir } from '../../tools/stack/app-build';
import { freePort } from '../../tools/stack/free-port';
import { killHard, startCompiledServer, type RunningServer } from '../support/compiled-server';
import { appUrl, launchBrowser, type BrowserSession } from './support/browser';
import { fieldTestBlocks, insertFieldTestStudy, type FieldTestStudy } from './support/field-study';
import { generatedJpeg } from './support/generated-jpeg';
import { waitForOfflineReady } from './support/service-worker';
import { signIn } from './support/sign-in';

const interviewCount = Number(process.env['CHAOS_SYNC_INTERVIEWS'] ?? 200);
/** One interview in ten carries a photo. */
const photoEvery = 10;
const serverKills = 4;
const seed = Number(process.env['CHAOS_SYNC_SEED'] ?? Date.now() % 2 ** 31);
/** Long enough for the larger run on a busy two-core machine; the small one needs far less. */
const budgetMs = Math.max(300_000, interviewCount * 600);

/** mulberry32: a small seeded generator, so a failing run's choices can be repeated. */
function seededRandom(start: number): () => number {
  let state = start >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const sleep = (ms: number) => new Promise((done) => setTimeout(done, ms));

interface QueuedPhoto {
  id: string;
  interviewId: string;
  base64: string;
  sha256: string;
  byteSize: number;
}

describe('chaos sync in the browser', () => {
  const random = seededRandom(seed);
  const between = (low: number, high: number) => low + Math.floor(random() * (high - low));
  let db: Database;
  let storage: ObjectStorage;
  let study: FieldTestStudy;
  let versionId: string;
  let device: BrowserSession;
  let page: Page;
  let port: number;
  let server: RunningServer | null = null;
  const serverEnv = { STATIC_DIR: builtAppDir };
  const expectedPhotos: { id: string; sha256: string; byteSize: number }[] = [];

  beforeAll(async () => {
    db = connectDatabase(process.env['DATABASE_URL'] ?? '', 2);
    storage = createObjectStorage(loadConfig());
    study = await insertFieldTestStudy(db);
    // Most interviews here carry no photo: a second published version makes its photo optional.
    const [questionnaire] = await db
      .select({ id: questionnaires.id })
      .from(questionnaires)
      .where(eq(questionnaires.studyId, study.studyId));
    const [version] = await db
      .insert(questionnaireVersions)
      .values({
        questionnaireId: questionnaire.id,
        version: 2,
        status: 'published',
        definition: {
          blocks: fieldTestBlocks.map((block) =>
            block.kind === 'photo' ? { ...block, required: false } : block,
          ),
        },
        publishedAt: new Date(),
      })
      .returning({ id: questionnaireVersions.id });
    versionId = version.id;
    port = await freePort();
    server = await startCompiledServer(serverEnv, port);
    device = await launchBrowser();
    page = await device.context.newPage();
  });

  afterAll(async () => {
    await device?.close();
    if (server) await killHard(server);
    await db?.$client.end();
  });

  const deviceUrl = (path: string) => new URL(path, `http://127.0.0.1:${port}`).toString();

  const storedCounts = async () => {
    const [interviewRows] = await db
      .select({ n: count() })
      .from(interviews)
      .where(eq(interviews.studyId, study.studyId));
    const [photoRows] = await db
      .select({ n: count() })
      .from(interviewPhotos)
      .innerJoin(interviews, eq(interviews.id, interviewPhotos.interviewId))
      .where(and(eq(interviews.studyId, study.studyId), isNotNull(interviewPhotos.storedAt)));
    return { interviews: interviewRows.n, photos: photoRows.n };
  };

  /** What the device still holds, read straight from its IndexedDB. */
  const deviceQueue = () =>
    page.evaluate(async (name) => {
      const idb = await new Promise<IDBDatabase>((done, fail) => {
        const request = indexedDB.open(name);
        request.onsuccess = () => done(request.result);
        request.onerror = () => fail(request.error ?? new Error('IndexedDB refused the request'));
      });
      const all = <T>(store: string) =>
        new Promise<T[]>((done, fail) => {
          const request = idb.transaction(store).objectStore(store).getAll();
          request.onsuccess = () => done(request.result as T[]);
          request.onerror = () => fail(request.error ?? new Error('IndexedDB refused the request'));
        });
      const outbox = await all<{ state: string }>('outbox');
      const photos = await all<{ id: string }>('photos');
      idb.close();
      const states: Record<string, number> = {};
      for (const entry of outbox) states[entry.state] = (states[entry.state] ?? 0) + 1;
      return { states, photos: photos.length };
    }, `fieldcurve-field-${study.enumeratorId}`);

  const pressSyncNow = () =>
    page
      .getByRole('button', { name: 'Sync now' })
      .click({ timeout: 2_000 })
      .catch(() => undefined);

  it('fills the device’s outbox with queued interviews and photos', async () => {
    // The session cookie belongs to the host, so the sign-in at the stack's app carries over
    // to this server on another port of the same host (same database, same session secret).
    await signIn(page, 'enumerator@tidewater.test');
    expect(new URL(appUrl()).hostname).toBe('127.0.0.1');
    await page.goto(deviceUrl('/field/sync'));
    await waitForOfflineReady(page);
    await page.getByTestId('waiting-interviews').filter({ hasText: '0' }).waitFor();
    // Nothing may leave the device while the outbox is being filled.
    await device.context.setOffline(true);

    const photos: QueuedPhoto[] = [];
    const entries = [];
    const firstStart = Date.now() - interviewCount * 5 * 60_000;
    for (let i = 0; i < interviewCount; i++) {
      const id = randomUUID();
      const startedAt = new Date(firstStart + i * 5 * 60_000).toISOString();
      const finishedAt = new Date(firstStart + i * 5 * 60_000 + 4 * 60_000).toISOString();
      const answers: Record<string, unknown> = {
        consent: { agreed: true },
        'owns-lamp': { value: 'no' },
        bid: { bidMinor: [50000, 75000, 100000][i % 3], firstResponse: i % 2 ? 'yes' : 'no' },
        ladder: {
          steps: [
            { priceMinor: 40000, response: 'yes' },
            { priceMinor: 60000, response: 'yes' },
            { priceMinor: 80000, response: 'no' },
          ],
        },
      };
      const manifest = [];
      if (i % photoEvery === 0) {
        const bytes = await generatedJpeg(page, (i * 7) % 360);
        const photo: QueuedPhoto = {
          id: randomUUID(),
          interviewId: id,
          base64: bytes.toString('base64'),
          sha256: createHash('sha256').update(bytes).digest('hex'),
          byteSize: bytes.length,
        };
        photos.push(photo);
        answers['tag-photo'] = { photoIds: [photo.id] };
        manifest.push({
          photoId: photo.id,
          sha256: photo.sha256,
          byteSize: photo.byteSize,
          contentType: 'image/jpeg',
        });
      }
      const pointId = study.pointIds[i % study.pointIds.length];
      // The app's OutboxEntry, as `InterviewDrafts.finish` writes it.
      entries.push({
        id,
        interview: {
          id,
          studyId: study.studyId,
          questionnaireVersionId: versionId,
          routeId: study.routeId,
          pointId,
          startedAt,
          finishedAt,
          answers,
          photos: manifest,
          gps: { latitude: 1.2346, longitude: 30.9877, accuracyM: 8 },
        },
        pointId,
        routeId: study.routeId,
        state: 'waiting',
        queuedAt: finishedAt,
        answeredAt: null,
        serverStatus: null,
        reason: null,
        issues: [],
      });
    }

    await page.evaluate(
      async ({ name, entries, photos }) => {
        const idb = await new Promise<IDBDatabase>((done, fail) => {
          const request = indexedDB.open(name);
          request.onsuccess = () => done(request.result);
          request.onerror = () => fail(request.error ?? new Error('IndexedDB refused the request'));
        });
        const transaction = idb.transaction(['outbox', 'photos'], 'readwrite');
        for (const entry of entries) transaction.objectStore('outbox').put(entry);
        for (const photo of photos) {
          const binary = atob(photo.base64);
          const bytes = new Uint8Array(binary.length);
          for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
          // The app's StoredPhoto, as `PhotoCapture` writes it.
          transaction.objectStore('photos').put({
            id: photo.id,
            interviewId: photo.interviewId,
            blob: new Blob([bytes], { type: 'image/jpeg' }),
            sha256: photo.sha256,
            byteSize: photo.byteSize,
            contentType: 'image/jpeg',
            takenAt: new Date().toISOString(),
            uploadedBytes: 0,
            storedAt: null,
          });
        }
        await new Promise<void>((done, fail) => {
          transaction.oncomplete = () => done();
          transaction.onerror = () =>
            fail(transaction.error ?? new Error('IndexedDB refused the transaction'));
        });
        idb.close();
      },
      { name: `fieldcurve-field-${study.enumeratorId}`, entries, photos },
    );

    expect(await deviceQueue()).toEqual({
      states: { waiting: interviewCount },
      photos: interviewCount / photoEvery,
    });
    expect(await storedCounts()).toEqual({ interviews: 0, photos: 0 });
    expectedPhotos.push(...photos.map(({ id, sha256, byteSize }) => ({ id, sha256, byteSize })));
  }, 180_000);

  it(
    'stores every interview and photo exactly once through cuts and server kills',
    async () => {
      const started = Date.now();
      const happened = { kills: 0, offline: 0, lossy: 0, lostAnswers: 0, refused: 0 };
      let lossy = false;
      // A lossy spell refuses some requests outright and lets others reach the server but drops
      // the answer, so the device cannot know whether its batch or chunk was stored.
      await device.context.route('**/api/field/**', async (route: Route) => {
        if (!lossy || random() < 0.4) return route.continue().catch(() => undefined);
        if (random() < 0.5) {
          happened.refused++;
          return route.abort('connectionreset').catch(() => undefined);
        }
        happened.lostAnswers++;
        await route.fetch().catch(() => undefined);
        return route.abort('connectionreset').catch(() => undefined);
      });

      const synced = async () => {
        const stored = await storedCounts();
        if (stored.interviews !== interviewCount || stored.photos !== expectedPhotos.length) {
          return false;
        }
        const queue = await deviceQueue();
        return queue.photos === 0 && queue.states['complete'] === interviewCount;
      };

      await device.context.setOffline(false);
      await pressSyncNow();
      try {
        // Chaos until every kill has happened; then calm, with "Sync now" pressed now and then
        // as an enumerator would, until the device and the server agree.
        while (happened.kills < serverKills) {
          const pick = random();
          if (pick < 0.35) {
            await sleep(between(100, 1_500));
            await killHard(server!);
            server = null;
            happened.kills++;
            await sleep(between(200, 2_000));
            server = await startCompiledServer(serverEnv, port);
          } else if (pick < 0.65) {
            await sleep(between(100, 1_000));
            await device.context.setOffline(true);
            happened.offline++;
            await sleep(between(200, 2_000));
            await device.context.setOffline(false);
          } else {
            lossy = true;
            happened.lossy++;
            await sleep(between(500, 2_500));
            lossy = false;
          }
          await pressSyncNow();
        }
        while (!(await synced())) {
          if (Date.now() - started > budgetMs) {
            throw new Error(
              `not synced within ${budgetMs / 1000} s: server ${JSON.stringify(await storedCounts())}, ` +
                `device ${JSON.stringify(await deviceQueue())}`,
            );
          }
          await pressSyncNow();
          await sleep(2_000);
        }
      } catch (error) {
        throw new Error(
          `chaos seed ${seed} (${JSON.stringify(happened)}): ${(error as Error).message}`,
        );
      } finally {
        await device.context.unroute('**/api/field/**');
      }
      console.log(
        `chaos sync: ${interviewCount} interviews, ${expectedPhotos.length} photos, ` +
          `seed ${seed}, ${JSON.stringify(happened)}, ${Math.round((Date.now() - started) / 1000)} s`,
      );

      expect(happened.kills).toBe(serverKills);
      expect(await storedCounts()).toEqual({
        interviews: interviewCount,
        photos: expectedPhotos.length,
      });
      // Exactly once: no second photo row for any photo, and each stored photo is the device's bytes.
      const rows = await db
        .select()
        .from(interviewPhotos)
        .innerJoin(interviews, eq(interviews.id, interviewPhotos.interviewId))
        .where(eq(interviews.studyId, study.studyId));
      expect(rows).toHaveLength(expectedPhotos.length);
      const byId = new Map(rows.map(({ interview_photos: photo }) => [photo.id, photo]));
      for (const expected of expectedPhotos) {
        const row = byId.get(expected.id);
        expect(row?.sha256).toBe(expected.sha256);
        expect(row?.receivedBytes).toBe(expected.byteSize);
        const object = await storage.client.send(
          new GetObjectCommand({ Bucket: storage.bucket, Key: row?.objectKey ?? '' }),
        );
        const bytes = Buffer.from(await object.Body!.transformToByteArray());
        expect(createHash('sha256').update(bytes).digest('hex')).toBe(expected.sha256);
      }
      expect(await deviceQueue()).toEqual({ states: { complete: interviewCount }, photos: 0 });
      await page.getByTestId('waiting-interviews').filter({ hasText: '0' }).waitFor();
      await page.getByTestId('waiting-photos').filter({ hasText: '0' }).waitFor();
    },
    budgetMs + 60_000,
  );
});
