import { randomUUID } from 'node:crypto';
import { GetObjectCommand, HeadObjectCommand } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { photoUploadStateSchema } from '@shared/field-sync/photo-manifest';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import { interviewPhotos, interviews, photoUploadChunks } from '../../server/db/schema';
import {
  createFieldSetup,
  fakeJpeg,
  fieldInterview,
  sha256Hex,
  withPhotos,
  type FieldSetup,
} from '../support/field-setup';
import type { SignedInAgent } from '../support/signed-in-agent';
import { createTestApp } from '../support/test-app';

const testApp = createTestApp();
const { db, storage } = testApp.deps;
let setup: FieldSetup;

beforeAll(async () => {
  setup = await createFieldSetup(testApp, 'Field photos');
});

afterAll(async () => {
  await db.$client.end();
});

const photoPath = (photoId: string) => `/api/field/photos/${photoId}`;

/** Syncs one interview declaring these photos; answers the interview id and the photo ids. */
async function interviewWithPhotos(photos: Buffer[], agent = setup.agents.enumerator) {
  const { interview, photoIds } = withPhotos(fieldInterview(setup), photos);
  const response = await agent.post('/api/field/sync', { interviews: [interview] });
  expect((response.body as SyncBatchResult).results[0]).toMatchObject({ outcome: 'accepted' });
  return { interviewId: interview.id, photoIds };
}

function putChunk(
  photoId: string,
  offset: number,
  bytes: Buffer,
  agent: SignedInAgent = setup.agents.enumerator,
) {
  return agent
    .put(`${photoPath(photoId)}?offset=${offset}`)
    .set('Content-Type', 'application/octet-stream')
    .send(bytes);
}

async function storedObject(key: string): Promise<Buffer> {
  const object = await storage.client.send(
    new GetObjectCommand({ Bucket: storage.bucket, Key: key }),
  );
  return Buffer.from(await object.Body!.transformToByteArray());
}

async function photoRow(photoId: string) {
  const [row] = await db.select().from(interviewPhotos).where(eq(interviewPhotos.id, photoId));
  return row;
}

async function interviewRow(interviewId: string) {
  const [row] = await db.select().from(interviews).where(eq(interviews.id, interviewId));
  return row;
}

describe('a resumable upload cut in the middle', () => {
  const first = fakeJpeg(300_000);
  const second = fakeJpeg(5_000);
  let interviewId: string;
  let photoIds: string[];

  beforeAll(async () => {
    ({ interviewId, photoIds } = await interviewWithPhotos([first, second]));
  });

  it('starts with nothing received and the interview not complete', async () => {
    const response = await setup.agents.enumerator.get(photoPath(photoIds[0]));
    expect(response.status).toBe(200);
    expect(response.headers['x-received-bytes']).toBe('0');
    expect(response.body).toMatchObject({
      interviewId,
      byteSize: first.length,
      receivedBytes: 0,
      stored: false,
    });
    expect((await interviewRow(interviewId)).completeAt).toBeNull();
  });

  it('keeps the first chunk, tells HEAD how far it got, and resumes from there', async () => {
    const cut = 128 * 1024;
    expect((await putChunk(photoIds[0], 0, first.subarray(0, cut))).status).toBe(200);
    // The connection drops here; the device asks where to resume (HEAD: headers only).
    const head = await request(testApp.app)
      .head(photoPath(photoIds[0]))
      .set('Cookie', setup.agents.enumerator.cookie);
    expect(head.status).toBe(200);
    const resumeAt = Number(head.headers['x-received-bytes']);
    expect(resumeAt).toBe(cut);

    const done = await putChunk(photoIds[0], resumeAt, first.subarray(resumeAt));
    expect(done.status).toBe(200);
    expect(photoUploadStateSchema.parse(done.body)).toMatchObject({
      receivedBytes: first.length,
      stored: true,
    });
  });

  it('holds the exact bytes in the object store, under the study and interview', async () => {
    const row = await photoRow(photoIds[0]);
    expect(row.objectKey).toBe(
      `studies/${setup.studyId}/interviews/${interviewId}/${photoIds[0]}.jpg`,
    );
    const bytes = await storedObject(row.objectKey!);
    expect(sha256Hex(bytes)).toBe(sha256Hex(first));
    expect(bytes.length).toBe(first.length);
    expect(
      await db.select().from(photoUploadChunks).where(eq(photoUploadChunks.photoId, photoIds[0])),
    ).toHaveLength(0);
  });

  it('marks the interview complete only when its last photo is stored', async () => {
    expect((await interviewRow(interviewId)).completeAt).toBeNull();
    expect((await putChunk(photoIds[1], 0, second)).body).toMatchObject({ stored: true });
    expect((await interviewRow(interviewId)).completeAt).toBeInstanceOf(Date);
  });

  it('answers a stored photo sent again with its state, changing nothing', async () => {
    const before = await photoRow(photoIds[0]);
    const again = await putChunk(photoIds[0], 0, first);
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ stored: true, receivedBytes: first.length });
    expect((await photoRow(photoIds[0])).storedAt).toEqual(before.storedAt);
  });
});

describe('chunks out of step', () => {
  it('skips bytes it already holds when a chunk is sent twice', async () => {
    const bytes = fakeJpeg(10_000);
    const { photoIds } = await interviewWithPhotos([bytes]);
    await putChunk(photoIds[0], 0, bytes.subarray(0, 6000));
    const overlap = await putChunk(photoIds[0], 4000, bytes.subarray(4000, 8000));
    expect(overlap.body).toMatchObject({ receivedBytes: 8000 });
    const rest = await putChunk(photoIds[0], 8000, bytes.subarray(8000));
    expect(rest.body).toMatchObject({ stored: true });
    expect(sha256Hex(await storedObject((await photoRow(photoIds[0])).objectKey!))).toBe(
      sha256Hex(bytes),
    );
  });

  it('refuses a chunk that would leave a gap, naming the offset to resume from', async () => {
    const bytes = fakeJpeg(10_000);
    const { photoIds } = await interviewWithPhotos([bytes]);
    await putChunk(photoIds[0], 0, bytes.subarray(0, 1000));
    const gap = await putChunk(photoIds[0], 5000, bytes.subarray(5000));
    expect(gap.status).toBe(409);
    expect(gap.body.error).toMatchObject({ code: 'upload-gap' });
    expect(gap.body.error.message).toMatch(/offset 1000/);
    expect((await photoRow(photoIds[0])).receivedBytes).toBe(1000);
  });

  it('takes the offset from a Content-Range header too', async () => {
    const bytes = fakeJpeg(2000);
    const { photoIds } = await interviewWithPhotos([bytes]);
    const response = await setup.agents.enumerator
      .put(photoPath(photoIds[0]))
      .set('Content-Type', 'application/octet-stream')
      .set('Content-Range', `bytes 0-1999/2000`)
      .send(bytes);
    expect(response.body).toMatchObject({ stored: true });
  });
});

describe('uploads that are refused', () => {
  it('refuses bytes whose SHA-256 differs from the declared one (422), discarding them', async () => {
    const declared = fakeJpeg(4000);
    const { photoIds } = await interviewWithPhotos([declared]);
    const other = fakeJpeg(4000);
    const response = await putChunk(photoIds[0], 0, other);
    expect(response.status).toBe(422);
    expect(response.body.error.code).toBe('photo-hash-mismatch');
    const row = await photoRow(photoIds[0]);
    expect([row.receivedBytes, row.storedAt, row.objectKey]).toEqual([0, null, null]);
    expect(
      await db.select().from(photoUploadChunks).where(eq(photoUploadChunks.photoId, photoIds[0])),
    ).toHaveLength(0);
    // The right bytes afterwards are taken.
    expect((await putChunk(photoIds[0], 0, declared)).body).toMatchObject({ stored: true });
  });

  it('refuses bytes that are not an image (415) even when the hash matches, storing nothing', async () => {
    const pdf = Buffer.from(
      '%PDF-1.7\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n%%EOF\n',
      'latin1',
    );
    const { photoIds, interviewId } = await interviewWithPhotos([pdf]);
    const response = await putChunk(photoIds[0], 0, pdf);
    expect(response.status).toBe(415);
    expect(response.body.error).toMatchObject({ code: 'not-an-image' });
    expect(response.body.error.message).toMatch(/application\/pdf/);
    const row = await photoRow(photoIds[0]);
    expect([row.receivedBytes, row.storedAt]).toEqual([0, null]);
    const guessedKey = `studies/${setup.studyId}/interviews/${interviewId}/${photoIds[0]}.jpg`;
    await expect(
      storage.client.send(new HeadObjectCommand({ Bucket: storage.bucket, Key: guessedKey })),
    ).rejects.toThrow();
  });

  it('refuses more bytes than declared with 413, keeping what came before', async () => {
    const bytes = fakeJpeg(3000);
    const { photoIds } = await interviewWithPhotos([bytes]);
    await putChunk(photoIds[0], 0, bytes.subarray(0, 1000));
    const response = await putChunk(
      photoIds[0],
      1000,
      Buffer.concat([bytes.subarray(1000), Buffer.alloc(10)]),
    );
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('photo-too-large');
    expect((await photoRow(photoIds[0])).receivedBytes).toBe(1000);
  });

  it('refuses a body over the 2 MiB cap with 413', async () => {
    const bytes = fakeJpeg(4000);
    const { photoIds } = await interviewWithPhotos([bytes]);
    const response = await putChunk(photoIds[0], 0, Buffer.alloc(2 * 1024 * 1024 + 1));
    expect(response.status).toBe(413);
    expect((await photoRow(photoIds[0])).receivedBytes).toBe(0);
  });

  it('answers 404 for a photo no interview declared, and for another enumerator’s photo', async () => {
    expect((await putChunk(randomUUID(), 0, fakeJpeg(100))).status).toBe(404);
    const bytes = fakeJpeg(100);
    const { photoIds } = await interviewWithPhotos([bytes]);
    expect((await putChunk(photoIds[0], 0, bytes, setup.agents.second)).status).toBe(404);
    expect((await setup.agents.second.get(photoPath(photoIds[0]))).status).toBe(404);
    expect((await photoRow(photoIds[0])).receivedBytes).toBe(0);
  });

  it('refuses a supervisor (uploads are the enumerator’s)', async () => {
    const response = await putChunk(randomUUID(), 0, fakeJpeg(100), setup.agents.supervisor);
    expect(response.status).toBe(403);
  });
});
