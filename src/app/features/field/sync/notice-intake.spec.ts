import type { FieldNotice } from '@shared/field-sync/field-notice';
import { FieldDb } from '../data/field-db';
import { outboxEntry, pointId, routeId, studyId, versionId } from '../testing/field-fixtures';
import { applyNotices } from './notice-intake';

function noticeFor(interviewId: string, status: 'returned' | 'rejected'): FieldNotice {
  return {
    interviewId,
    status,
    note: 'The photo shows the wrong product; photograph the lamp’s tag.',
    reviewedAt: '2027-03-02T10:00:00.000Z',
    reviewerName: 'A supervisor',
    studyId,
    studyName: 'Lamp prices',
    routeId,
    pointId,
    pointName: 'Reedbank kiosk',
    questionnaireVersionId: versionId,
    startedAt: '2027-03-01T09:00:00.000Z',
    finishedAt: '2027-03-01T09:10:00.000Z',
    answers: { consent: { agreed: true } },
    gps: null,
    respondentKey: null,
    photos: [],
  };
}

describe('applyNotices', () => {
  let db: FieldDb;

  beforeEach(async () => {
    db = new FieldDb(crypto.randomUUID());
    await db.open();
  });

  afterEach(async () => db.delete());

  it('marks a sent interview as returned, with the supervisor’s note', async () => {
    const entry = { ...outboxEntry(0), state: 'complete' as const };
    await db.outbox.put(entry);
    await applyNotices(db, [noticeFor(entry.id, 'returned')]);
    const marked = await db.outbox.get(entry.id);
    expect(marked?.state).toBe('returned');
    expect(marked?.reason).toMatch(/wrong product/);
  });

  it('leaves alone an interview already corrected in answer to that return', async () => {
    const entry = outboxEntry(0);
    const corrected = {
      ...entry,
      interview: { ...entry.interview, returnedAt: '2027-03-02T10:00:00.000Z' },
    };
    await db.outbox.put(corrected);
    await applyNotices(db, [noticeFor(entry.id, 'returned')]);
    expect((await db.outbox.get(entry.id))?.state).toBe('waiting');
  });

  it('adds a returned interview sent from another device, so it can be corrected here', async () => {
    const id = crypto.randomUUID();
    await applyNotices(db, [noticeFor(id, 'returned')]);
    const added = await db.outbox.get(id);
    expect(added?.state).toBe('returned');
    expect(added?.interview.answers).toEqual({ consent: { agreed: true } });
    expect(await db.notices.count()).toBe(1);
  });
});
