import { TestBed } from '@angular/core/testing';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import { Session } from '../../../core/session';
import { FieldStore } from '../data/field-store';
import { accepted, outboxEntry } from '../testing/field-fixtures';
import { FieldSyncApi } from './field-sync-api';
import { OutboxSender } from './outbox-sender';

describe('OutboxSender', () => {
  let store: FieldStore;
  let sender: OutboxSender;
  const batches: FieldInterview[][] = [];
  let answer: (interviews: readonly FieldInterview[]) => SyncBatchResult;

  beforeEach(async () => {
    batches.length = 0;
    answer = (interviews) => ({
      results: interviews.map((interview, index) => accepted(index, interview.id)),
      receivedAt: new Date().toISOString(),
    });
    const userId = crypto.randomUUID();
    TestBed.configureTestingModule({
      providers: [
        { provide: Session, useValue: { info: () => ({ user: { id: userId } }) } },
        {
          provide: FieldSyncApi,
          useValue: {
            sendBatch: (interviews: readonly FieldInterview[]) => {
              batches.push([...interviews]);
              return Promise.resolve(answer(interviews));
            },
          },
        },
      ],
    });
    store = TestBed.inject(FieldStore);
    sender = TestBed.inject(OutboxSender);
    await store.db.open();
  });

  afterEach(async () => store.db.delete());

  it('drains the outbox oldest first, in batches of the given size', async () => {
    const entries = Array.from({ length: 60 }, (_, minute) => outboxEntry(minute));
    await store.db.outbox.bulkPut([...entries].reverse());
    const summary = await sender.drain(25);
    expect(batches.map((batch) => batch.length)).toEqual([25, 25, 10]);
    expect(batches.flat().map((interview) => interview.id)).toEqual(entries.map((e) => e.id));
    expect(summary).toEqual({ batches: 3, accepted: 60, duplicate: 0, rejected: 0 });
    expect(await store.db.outbox.where('state').equals('complete').count()).toBe(60);
  });

  it('marks each interview by the server’s answer, keeping the reasons of a refusal', async () => {
    const [kept, had, refused] = [0, 1, 2].map((minute) => outboxEntry(minute, []));
    const withPhoto = outboxEntry(3, [crypto.randomUUID()]);
    await store.db.outbox.bulkPut([kept, had, refused, withPhoto]);
    answer = () => ({
      receivedAt: new Date().toISOString(),
      results: [
        accepted(0, kept.id),
        { index: 1, id: had.id, outcome: 'duplicate', status: 'flagged' },
        {
          index: 2,
          id: refused.id,
          outcome: 'rejected',
          code: 'invalid-answers',
          message: 'An answer does not fit its block',
          issues: [{ path: 'answers.count.value', message: 'At most 1000' }],
        },
        accepted(3, withPhoto.id),
      ],
    });
    await sender.drain();
    const states = await store.db.outbox.bulkGet([kept.id, had.id, refused.id, withPhoto.id]);
    expect(states.map((entry) => entry?.state)).toEqual([
      'complete',
      'complete',
      'rejected',
      'photos',
    ]);
    expect(states[1]?.serverStatus).toBe('flagged');
    expect(states[2]?.reason).toBe('An answer does not fit its block');
    expect(states[2]?.issues).toEqual([{ path: 'answers.count.value', message: 'At most 1000' }]);
  });

  it('leaves every interview of a failed batch waiting, to be sent again', async () => {
    await store.db.outbox.bulkPut([outboxEntry(0), outboxEntry(1)]);
    answer = () => {
      throw new Error('connection reset');
    };
    await expect(sender.drain()).rejects.toThrow('connection reset');
    expect(await store.db.outbox.where('state').equals('waiting').count()).toBe(2);
  });

  it('keeps waiting an interview the server’s answer leaves out', async () => {
    const [first, second] = [outboxEntry(0), outboxEntry(1)];
    await store.db.outbox.bulkPut([first, second]);
    let calls = 0;
    answer = () => {
      calls++;
      const results = calls === 1 ? [accepted(0, first.id)] : [accepted(0, second.id)];
      return { results, receivedAt: new Date().toISOString() };
    };
    await sender.drain();
    expect(batches.map((batch) => batch.length)).toEqual([2, 1]);
    expect((await store.db.outbox.get(second.id))?.state).toBe('complete');
  });
});
