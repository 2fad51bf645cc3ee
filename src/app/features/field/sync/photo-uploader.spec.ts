import { HttpErrorResponse } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import type { PhotoUploadState } from '@shared/field-sync/photo-manifest';
import { Session } from '../../../core/session';
import type { StoredPhoto } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { outboxEntry } from '../testing/field-fixtures';
import { FieldSyncApi } from './field-sync-api';
import { PhotoUploader } from './photo-uploader';

/** A failed request as HttpClient reports it (an HttpErrorResponse, not an Error). */
const refusal = (status: number) =>
  Promise.reject(new HttpErrorResponse({ status }) as unknown as Error);

/** A server that counts the bytes it was sent, and can drop the connection once. */
class FakePhotoServer {
  readonly received = new Map<string, number[]>();
  readonly offsetsSent: number[] = [];
  cutAtCall: number | null = null;
  private calls = 0;

  constructor(private readonly sizes: Map<string, number>) {}

  held(id: string): number {
    return (this.received.get(id) ?? []).reduce((sum, part) => sum + part, 0);
  }

  state(id: string): PhotoUploadState {
    const held = this.held(id);
    const size = this.sizes.get(id) ?? 0;
    const stored = held === size;
    return {
      photoId: id,
      interviewId: id,
      byteSize: size,
      receivedBytes: held,
      stored,
      storedAt: stored ? '2027-03-01T10:00:00.000Z' : null,
    };
  }

  readonly api = {
    photoOffset: (id: string) => Promise.resolve(this.held(id)),
    photoState: (id: string) => Promise.resolve(this.state(id)),
    putChunk: (id: string, offset: number, chunk: Blob) => {
      this.calls++;
      this.offsetsSent.push(offset);
      if (this.calls === this.cutAtCall) return refusal(0);
      if (offset !== this.held(id)) return refusal(409);
      this.received.set(id, [...(this.received.get(id) ?? []), chunk.size]);
      return Promise.resolve(this.state(id));
    },
  };
}

describe('PhotoUploader', () => {
  let store: FieldStore;
  let uploader: PhotoUploader;
  let server: FakePhotoServer;
  const photoId = crypto.randomUUID();
  const size = 10_000;

  beforeEach(async () => {
    const userId = crypto.randomUUID();
    server = new FakePhotoServer(new Map([[photoId, size]]));
    TestBed.configureTestingModule({
      providers: [
        { provide: Session, useValue: { info: () => ({ user: { id: userId } }) } },
        { provide: FieldSyncApi, useValue: server.api },
      ],
    });
    store = TestBed.inject(FieldStore);
    uploader = TestBed.inject(PhotoUploader);
    const entry = { ...outboxEntry(0, [photoId]), state: 'photos' as const };
    const photo: StoredPhoto = {
      id: photoId,
      interviewId: entry.id,
      blob: new Blob([new Uint8Array(size).map((_, i) => i % 251)], { type: 'image/jpeg' }),
      sha256: 'a'.repeat(64),
      byteSize: size,
      contentType: 'image/jpeg',
      takenAt: '2027-03-01T09:00:00.000Z',
      uploadedBytes: 0,
      storedAt: null,
    };
    await store.db.outbox.put(entry);
    await store.db.photos.put(photo);
    // jsdom's Blob does not survive IndexedDB's structured clone here (a browser's does): hand
    // the stored row back with the original bytes.
    const read = store.db.photos.get.bind(store.db.photos) as (id: string) => Promise<StoredPhoto>;
    vi.spyOn(store.db.photos, 'get').mockImplementation((async (id: string) => {
      const row = await read(id);
      return row && { ...row, blob: photo.blob };
    }) as never);
  });

  afterEach(async () => store.db.delete());

  it('sends a photo in chunks and completes its interview, freeing the device', async () => {
    expect(await uploader.uploadPending(4096)).toBe(1);
    expect(server.offsetsSent).toEqual([0, 4096, 8192]);
    expect(server.held(photoId)).toBe(size);
    expect((await store.db.outbox.toArray())[0].state).toBe('complete');
    expect(await store.db.photos.count()).toBe(0);
  });

  it('resumes where the server stopped after the connection was cut', async () => {
    server.cutAtCall = 2;
    await expect(uploader.uploadPending(4096)).rejects.toBeInstanceOf(HttpErrorResponse);
    expect((await store.db.photos.get(photoId))?.uploadedBytes).toBe(4096);
    expect(await uploader.uploadPending(4096)).toBe(1);
    // The cut chunk is sent again from the offset the server reported, nothing twice.
    expect(server.offsetsSent).toEqual([0, 4096, 4096, 8192]);
    expect(server.held(photoId)).toBe(size);
  });
});
