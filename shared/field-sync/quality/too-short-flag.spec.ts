import { tooShortFlag } from './too-short-flag';

const start = '2027-03-01T09:00:00Z';

describe('tooShortFlag (limit: 5 s per answered block, Fieldcurve common practice)', () => {
  it('flags 12 blocks answered in 30 s (2.5 s each)', () => {
    expect(tooShortFlag(start, '2027-03-01T09:00:30Z', 12)).toEqual({
      kind: 'too-short',
      durationSeconds: 30,
      answeredBlocks: 12,
      secondsPerBlock: 2.5,
      minSecondsPerBlock: 5,
    });
  });

  it('does not flag exactly 5 s per block, nor a slower interview', () => {
    expect(tooShortFlag(start, '2027-03-01T09:01:00Z', 12)).toBeNull();
    expect(tooShortFlag(start, '2027-03-01T09:10:00Z', 12)).toBeNull();
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
