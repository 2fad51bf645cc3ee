import type { FieldAssignments, FieldStudy } from '@shared/field-sync/field-assignments';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { TypingProblems } from '../../field-blocks/typing-problems';
import type { FieldStore } from '../data/field-store';
import { fieldVersion, studyId } from '../testing/field-fixtures';
import { startInterviewSession } from '../testing/interview-session-harness';
import type { InterviewSession } from './interview-session';

const blocks = [
  starterBlock('consent', 'consent'),
  { ...starterBlock('wtp-open', 'most'), minMinor: 0, maxMinor: 2000000 },
  starterBlock('location', 'where'),
] as Block[];
const study: FieldStudy = {
  id: studyId,
  name: 'Lamp study',
  productName: 'Lamp',
  secondProductName: null,
  currency: 'KES',
  locale: 'en-KE',
  market: 'Hill villages',
  priceMinMinor: 50000,
  priceMaxMinor: 300000,
  status: 'in_field',
};
const assignments = {
  enumerator: { userId: crypto.randomUUID(), name: 'Enumerator' },
  studies: [study],
  routes: [],
  questionnaireVersions: [fieldVersion(blocks)],
  generatedAt: '2027-03-01T08:00:00Z',
} satisfies FieldAssignments;
const fix = { latitude: 1, longitude: 2, accuracyMetres: 12, capturedAt: '2027-03-01T09:00:00Z' };
const plain = (text: string) => text.replace(/\s/g, ' ');

describe('InterviewSession and the problems it shows', () => {
  let session: InterviewSession;
  let store: FieldStore;
  let typing: TypingProblems;

  beforeEach(async () => {
    ({ session, store, typing } = await startInterviewSession(assignments));
    await session.change({ agreed: true });
    expect(await session.next()).toBe('moved');
  });

  afterEach(async () => store.db.delete());

  const shown = () => session.issues().map((issue) => plain(issue.message));

  it('writes a limit crossed in the study’s currency', async () => {
    await session.change({ amountMinor: 2000001 });
    expect(await session.next()).toBe('invalid');
    expect(shown()).toEqual(['Most they would pay: must be at most Ksh 20,000.00']);
  });

  it('shows only the typing mistake for an amount it cannot read', async () => {
    typing.note('amountMinor', 'Most they would pay: "-5" is not an amount; type digits');
    await session.change(undefined);
    expect(await session.next()).toBe('invalid');
    expect(shown()).toEqual(['Most they would pay: "-5" is not an amount; type digits']);
  });

  it('takes a problem away as soon as the answer is put right', async () => {
    await session.change({ amountMinor: 1500 });
    expect(await session.next()).toBe('moved');
    expect(await session.next()).toBe('invalid');
    expect(shown()).toEqual(['Find the position, then keep it']);
    await session.change(fix);
    expect(session.issues()).toEqual([]);
  });

  it('keeps a problem not yet put right while the answer changes', async () => {
    await session.change({ amountMinor: 2000001 });
    expect(await session.next()).toBe('invalid');
    await session.change({ amountMinor: 2500000 });
    expect(shown()).toEqual(['Most they would pay: must be at most Ksh 20,000.00']);
    await session.change({ amountMinor: 2000000 });
    expect(session.issues()).toEqual([]);
  });

  it('writes amounts in the study’s currency among the problems left at the end', async () => {
    await session.change({ amountMinor: 2000001 });
    await session.goTo(blocks.length);
    expect(session.finalProblems().map((problem) => plain(problem.message))).toEqual([
      'Most they would pay: must be at most Ksh 20,000.00',
      'This block needs an answer',
    ]);
  });
});
