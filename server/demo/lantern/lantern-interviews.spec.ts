import { qualityThresholds } from '@shared/field-sync/quality/quality-thresholds';
import { tooShortFlag } from '@shared/field-sync/quality/too-short-flag';
import { lanternInterviews } from './lantern-interviews';

const interviews = lanternInterviews();
const pace = (i: (typeof interviews)[number]) =>
  tooShortFlag(
    i.startedAt.toISOString(),
    i.finishedAt.toISOString(),
    Object.keys(i.answers).length,
  );

describe('the demo interviews’ "too short" flags', () => {
  it('carry the live limit per answered block, not a number of their own', () => {
    const flagged = interviews.filter((i) => i.flags.length > 0);
    expect(flagged).toHaveLength(9);
    for (const i of flagged) {
      expect(i.flags).toEqual([
        expect.objectContaining({
          kind: 'too-short',
          minSecondsPerBlock: qualityThresholds.minSecondsPerAnsweredBlock,
        }),
      ]);
    }
  });

  it('are exactly the interviews the live check finds too short', () => {
    for (const i of interviews) expect(pace(i)).toEqual(i.flags[0] ?? null);
  });
});
