import { qualityThresholds } from './quality-thresholds';
import { tooShortFlag } from './too-short-flag';

const start = '2027-03-01T09:00:00Z';

describe('tooShortFlag (limit: 20 s per answered block, Fieldcurve common practice)', () => {
  it('uses 20 s per answered block as the live limit', () => {
    expect(qualityThresholds.minSecondsPerAnsweredBlock).toBe(20);
  });

  it('flags 12 blocks answered in 30 s (2.5 s each)', () => {
    expect(tooShortFlag(start, '2027-03-01T09:00:30Z', 12)).toEqual({
      kind: 'too-short',
      durationSeconds: 30,
      answeredBlocks: 12,
      secondsPerBlock: 2.5,
      minSecondsPerBlock: 20,
    });
  });

  it('flags a 7-block household interview done in 55 s, announced as about ten minutes', () => {
    expect(tooShortFlag(start, '2027-03-01T09:00:55Z', 7)).toMatchObject({
      kind: 'too-short',
      durationSeconds: 55,
      answeredBlocks: 7,
    });
  });

  it('does not flag exactly 20 s per block, nor a slower interview', () => {
    expect(tooShortFlag(start, '2027-03-01T09:04:00Z', 12)).toBeNull();
    expect(tooShortFlag(start, '2027-03-01T09:10:00Z', 12)).toBeNull();
  });

  it('tests against a limit it is given, and records that limit', () => {
    expect(tooShortFlag(start, '2027-03-01T09:01:00Z', 12, 5)).toBeNull();
    expect(tooShortFlag(start, '2027-03-01T09:00:30Z', 12, 5)).toMatchObject({
      minSecondsPerBlock: 5,
    });
  });

  it('reads time zones: 10:00+01:00 is 09:00Z', () => {
    expect(tooShortFlag('2027-03-01T10:00:00+01:00', '2027-03-01T09:00:20Z', 10)).toMatchObject({
      durationSeconds: 20,
      secondsPerBlock: 2,
    });
  });

  it('does not flag an interview with no answered block', () => {
    expect(tooShortFlag(start, start, 0)).toBeNull();
  });
});
