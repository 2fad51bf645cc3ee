import { starterBlock } from '../../questionnaire/block-starters';
import { interviewQualityFlags, type QualityInput } from './interview-quality-flags';

const definition = {
  blocks: [
    starterBlock('consent', 'consent'),
    starterBlock('price-ladder', 'ladder'),
    starterBlock('price-thresholds', 'psm'),
  ],
};
const point = { latitude: -0.1, longitude: 34.7 };
const honest: QualityInput = {
  definition,
  answers: {
    consent: { agreed: true },
    ladder: {
      steps: [
        { priceMinor: 100, response: 'yes' },
        { priceMinor: 150, response: 'no' },
      ],
    },
    psm: { tooCheapMinor: 50, cheapMinor: 100, expensiveMinor: 300, tooExpensiveMinor: 500 },
  },
  startedAt: '2027-03-01T09:00:00Z',
  finishedAt: '2027-03-01T09:06:00Z',
  gps: { ...point, accuracyM: 8 },
  point,
  sameRespondentIds: [],
};

describe('interviewQualityFlags', () => {
  it('gives no flag to an honest interview', () => {
    expect(interviewQualityFlags(honest)).toEqual([]);
  });

  it('gives every flag, in a fixed order, to an interview that breaks every rule', () => {
    const flags = interviewQualityFlags({
      ...honest,
      answers: {
        ...honest.answers,
        ladder: {
          steps: [100, 150, 200, 250].map((priceMinor) => ({ priceMinor, response: 'no' })),
        },
        psm: { tooCheapMinor: 500, cheapMinor: 100, expensiveMinor: 300, tooExpensiveMinor: 400 },
      },
      finishedAt: '2027-03-01T09:00:05Z',
      gps: { latitude: 0, longitude: 34.7, accuracyM: 8 },
      sameRespondentIds: ['6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61'],
    });
    expect(flags.map((flag) => flag.kind)).toEqual([
      'too-short',
      'straight-lining',
      'gps-far',
      'thresholds-out-of-order',
      'duplicate-respondent',
    ]);
  });

  it('counts only answered blocks for the pace: 3 blocks in 12 s is too short', () => {
    const flags = interviewQualityFlags({ ...honest, finishedAt: '2027-03-01T09:00:12Z' });
    expect(flags).toEqual([
      expect.objectContaining({ kind: 'too-short', answeredBlocks: 3, secondsPerBlock: 4 }),
    ]);
  });
});
