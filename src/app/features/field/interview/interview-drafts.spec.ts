import { TestBed } from '@angular/core/testing';
import { assignBid } from '@shared/questionnaire/bid-assignment';
import type { Block, BlockOfKind } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { Session } from '../../../core/session';
import { GpsReader } from '../capture/gps-reader';
import { FieldDb } from '../data/field-db';
import { FieldStore } from '../data/field-store';
import { fieldVersion, pointId, routeId, studyId, versionId } from '../testing/field-fixtures';
import { InterviewDrafts } from './interview-drafts';

const place = { studyId, routeId, pointId, questionnaireVersionId: versionId };
const blocks = [
  starterBlock('consent', 'consent'),
  starterBlock('dichotomous-choice', 'bid'),
  starterBlock('number', 'count'),
] as Block[];
const version = fieldVersion(blocks);
const fix = { latitude: -1.2921, longitude: 36.8219, accuracyMetres: 12, capturedAt: '' };

describe('InterviewDrafts', () => {
  let userId: string;
  let drafts: InterviewDrafts;
  let store: FieldStore;

  beforeEach(async () => {
    userId = crypto.randomUUID();
    TestBed.configureTestingModule({
      providers: [
        { provide: Session, useValue: { info: () => ({ user: { id: userId } }) } },
        { provide: GpsReader, useValue: { readOnce: () => Promise.resolve({ ok: true, fix }) } },
      ],
    });
    drafts = TestBed.inject(InterviewDrafts);
    store = TestBed.inject(FieldStore);
    await store.db.open();
  });

  afterEach(async () => store.db.delete());

  it('resumes at the same question with the answers given, after the tab was closed', async () => {
    const draft = await drafts.start(place);
    await drafts.saveAnswer(draft.id, 'consent', { agreed: true }, 1);
    await drafts.saveAnswer(draft.id, 'bid', { bidMinor: 200, firstResponse: 'no' }, 2);
    store.db.close();
    // A new page load: a fresh connection to the same database.
    const reopened = new FieldDb(userId);
    const resumed = await reopened.drafts.get(draft.id);
    reopened.close();
    expect(resumed?.step).toBe(2);
    expect(resumed?.answers).toEqual({
      consent: { agreed: true },
      bid: { bidMinor: 200, firstResponse: 'no' },
    });
  });

  it('resumes with the respondent key, and finishes with it in the outbox', async () => {
    const key = 'AjTJgt69nqxTRPTEPVYld2BNyBC9vAdiv96hqFIfKuE';
    const draft = await drafts.start(place);
    expect(draft.respondentKey).toBeNull();
    await drafts.saveRespondentKey(draft.id, key);
    await drafts.saveAnswer(draft.id, 'consent', { agreed: true }, 1);
    store.db.close();
    const reopened = new FieldDb(userId);
    expect((await reopened.drafts.get(draft.id))?.respondentKey).toBe(key);
    reopened.close();
    await store.db.open();
    await drafts.saveAnswer(draft.id, 'bid', { bidMinor: 100, firstResponse: 'yes' }, 2);
    await drafts.saveAnswer(draft.id, 'count', { value: 3 }, 3);
    const entry = await drafts.finish(draft.id, version);
    expect(entry.interview.respondentKey).toBe(key);
    const corrected = await drafts.reopen(entry, version, '2027-03-02T10:00:00Z');
    expect(corrected.respondentKey).toBe(key);
  });

  it('removes the respondent key when the reference is cleared', async () => {
    const draft = await drafts.start(place);
    await drafts.saveRespondentKey(draft.id, 'AjTJgt69nqxTRPTEPVYld2BNyBC9vAdiv96hqFIfKuE');
    await drafts.saveRespondentKey(draft.id, null);
    expect((await drafts.get(draft.id))?.respondentKey).toBeNull();
    await expect(drafts.saveRespondentKey(crypto.randomUUID(), null)).rejects.toThrow(
      'no longer on the device',
    );
  });

  it('keeps the position the device found in the background', async () => {
    const draft = await drafts.start(place);
    await vi.waitFor(async () => expect((await drafts.get(draft.id))?.gps).not.toBeNull());
    expect((await drafts.get(draft.id))?.gps).toEqual({
      latitude: -1.2921,
      longitude: 36.8219,
      accuracyM: 12,
    });
  });

  it('draws each bid once per interview, rotating through the design at the point', async () => {
    const block = blocks[1] as BlockOfKind<'dichotomous-choice'>;
    const first = await drafts.start(place);
    const second = await drafts.start(place);
    const bidOfFirst = await drafts.bidFor(first.id, block);
    expect(await drafts.bidFor(first.id, block)).toEqual(bidOfFirst);
    expect(bidOfFirst).toEqual(assignBid(block.bidDesign, pointId, 0));
    expect(await drafts.bidFor(second.id, block)).toEqual(assignBid(block.bidDesign, pointId, 1));
  });

  it('keeps nothing of a refusal but the count at the point', async () => {
    const draft = await drafts.start(place);
    await drafts.saveAnswer(draft.id, 'consent', { agreed: false }, 0);
    await drafts.refuse(draft.id);
    expect(await store.db.drafts.count()).toBe(0);
    expect(await store.db.outbox.count()).toBe(0);
    expect((await store.db.tallies.get(pointId))?.refusals).toBe(1);
  });

  it('moves a finished interview into the outbox as the server expects it', async () => {
    const draft = await drafts.start(place);
    await drafts.saveAnswer(draft.id, 'consent', { agreed: true }, 1);
    await drafts.saveAnswer(draft.id, 'bid', { bidMinor: 100, firstResponse: 'yes' }, 2);
    await drafts.saveAnswer(draft.id, 'count', { value: 3 }, 3);
    const entry = await drafts.finish(draft.id, version);
    expect(await store.db.drafts.count()).toBe(0);
    expect(entry.state).toBe('waiting');
    expect(entry.interview).toMatchObject({
      id: draft.id,
      ...place,
      photos: [],
      answers: { consent: { agreed: true }, count: { value: 3 } },
    });
    expect(entry.interview.answers['bid']).toEqual({ bidMinor: 100, firstResponse: 'yes' });
  });
});
