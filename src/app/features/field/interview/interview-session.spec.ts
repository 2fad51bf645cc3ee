import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { FieldStore } from '../data/field-store';
import { fieldVersion } from '../testing/field-fixtures';
import { startInterviewSession } from '../testing/interview-session-harness';
import type { InterviewSession } from './interview-session';

const blocks = [starterBlock('consent', 'consent'), starterBlock('number', 'count')] as Block[];
const assignments = {
  enumerator: { userId: crypto.randomUUID(), name: 'Enumerator' },
  studies: [],
  routes: [],
  questionnaireVersions: [fieldVersion(blocks)],
  generatedAt: '2027-03-01T08:00:00Z',
} satisfies FieldAssignments;

/**
 * SHA-256 of `${studyId}:254712345678` in base64url, computed with Node's
 * crypto.createHash('sha256') and checked with openssl (see respondent-key.spec.ts).
 */
const keyOfPhone = '76u6MifHS-JlJ3XZqpv4eqjw7nbM4qlkekumQi98GpE';

describe('InterviewSession and the respondent reference', () => {
  let session: InterviewSession;
  let store: FieldStore;
  let draftId: string;

  beforeEach(async () => {
    ({ session, store, draftId } = await startInterviewSession(assignments));
  });

  afterEach(async () => store.db.delete());

  it('stores the hashed reference and never the typed text', async () => {
    await session.noteRespondentReference('+254 712');
    await session.noteRespondentReference('+254 712 345 678');
    const stored = await store.db.drafts.get(draftId);
    expect(stored?.respondentKey).toBe(keyOfPhone);
    expect(session.hasRespondentKey()).toBe(true);
    const everything = JSON.stringify(await store.db.drafts.toArray());
    for (const typed of ['+254', '712 345', '254712345678']) {
      expect(everything).not.toContain(typed);
    }
  });

  it('holds the interview on consent while the reference is too short, naming it', async () => {
    await session.change({ agreed: true });
    await session.noteRespondentReference('+254 712 345 678');
    await session.noteRespondentReference('B7');
    expect((await store.db.drafts.get(draftId))?.respondentKey).toBeNull();
    expect(await session.next()).toBe('invalid');
    expect(session.issues()).toEqual([
      {
        path: 'respondentReference',
        message: 'Respondent reference: type at least 4 letters or digits, or leave it empty',
      },
    ]);
    await session.noteRespondentReference('');
    expect(await session.next()).toBe('moved');
    expect(session.step()).toBe(1);
  });

  it('lets a declined consent end the interview whatever the reference', async () => {
    await session.change({ agreed: false });
    await session.noteRespondentReference('B7');
    expect(await session.next()).toBe('refused');
    expect(await store.db.drafts.count()).toBe(0);
  });

  it('sends the key with the finished interview', async () => {
    await session.change({ agreed: true });
    void session.noteRespondentReference('254-712-345-678');
    expect(await session.next()).toBe('moved');
    await session.change({ value: 2 });
    expect(await session.next()).toBe('moved');
    const entry = await session.finish();
    expect(entry.interview.respondentKey).toBe(keyOfPhone);
    expect(await store.db.outbox.get(draftId)).toMatchObject({
      interview: { respondentKey: keyOfPhone },
    });
  });
});
