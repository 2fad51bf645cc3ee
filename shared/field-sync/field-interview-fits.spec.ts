import { mulberry32 } from '../estimation/random/mulberry32';
import { mutateAnswer } from '../questionnaire/answer-mutation';
import { fieldInterviewSchema } from './field-interview';
import { fitsFieldInterview } from './field-interview-fits';

const photo = (n: number) => ({
  photoId: `6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e6${n}`,
  sha256: `${n}`.repeat(64),
  byteSize: 120_000 + n,
  contentType: 'image/jpeg',
});

/** Interviews the schema accepts, with and without each optional part (an invented survey). */
const samples: Record<string, unknown>[] = [
  {
    id: '0b7c2d6e-1f3a-4b5c-8d9e-0f1a2b3c4d5e',
    studyId: '1c8d3e7f-2a4b-4c6d-9e0f-1a2b3c4d5e6f',
    questionnaireVersionId: '2d9e4f80-3b5c-4d7e-8f10-2b3c4d5e6f70',
    routeId: '3e0f5a91-4c6d-4e8f-9a21-3c4d5e6f7081',
    pointId: '4f1a6ba2-5d7e-4f90-8b32-4d5e6f708192',
    startedAt: '2027-03-01T09:00:00Z',
    finishedAt: '2027-03-01T09:12:30.250Z',
    answers: { consent: { agreed: true }, wtp: { amountMinor: 35000 } },
    gps: { latitude: -1.28, longitude: 36.82, accuracyM: 12 },
    respondentKey: 'c2VjcmV0LWtleS1oYXNoZWQtb24tZGV2aWNl',
    photos: [photo(1), photo(2)],
  },
  {
    id: '5a2b7cb3-6e8f-4a01-9c43-5e6f708192a3',
    studyId: '1c8d3e7f-2a4b-4c6d-9e0f-1a2b3c4d5e6f',
    questionnaireVersionId: '2d9e4f80-3b5c-4d7e-8f10-2b3c4d5e6f70',
    routeId: '3e0f5a91-4c6d-4e8f-9a21-3c4d5e6f7081',
    pointId: '4f1a6ba2-5d7e-4f90-8b32-4d5e6f708192',
    startedAt: '2027-03-01T12:00:00+03:00',
    finishedAt: '2027-03-01T09:30:00Z',
    answers: {},
    photos: [],
    returnedAt: '2027-03-02T08:00:00Z',
  },
];

describe('fitsFieldInterview, the quick test of a synced interview', () => {
  it('passes the sample interviews, which the schema accepts', () => {
    for (const sample of samples) {
      expect(fieldInterviewSchema.safeParse(sample).success).toBe(true);
      expect(fitsFieldInterview(sample)).toBe(true);
    }
  });

  it('never passes an interview the schema refuses, nor one it would change', () => {
    const random = mulberry32(4242);
    let refused = 0;
    let passed = 0;
    for (let n = 0; n < 6000; n++) {
      let item: unknown = samples[n % samples.length];
      for (let step = 0; step <= n % 3; step++) item = mutateAnswer(item, random);
      const parsed = fieldInterviewSchema.safeParse(item);
      if (fitsFieldInterview(item)) {
        passed++;
        // Shows the offending item when it fails: accepted, and exactly as it was sent.
        expect({ item, accepted: parsed.success }).toEqual({ item, accepted: true });
        expect(parsed.data).toEqual(item);
      }
      if (!parsed.success) refused++;
    }
    // The mutations must reach both sides, or the checks above prove nothing.
    expect(refused).toBeGreaterThan(3000);
    expect(passed).toBeGreaterThan(200);
  });

  it.each<[string, (item: Record<string, unknown>) => unknown]>([
    ['an end before the start', (i) => ({ ...i, finishedAt: '2027-03-01T08:00:00Z' })],
    ['the same photo twice', (i) => ({ ...i, photos: [photo(1), photo(1)] })],
    ['an unknown field', (i) => ({ ...i, enumeratorId: i['id'] })],
    ['a date without its zone', (i) => ({ ...i, startedAt: '2027-03-01T09:00:00' })],
    ['no GPS accuracy', (i) => ({ ...i, gps: { latitude: 1, longitude: 2 } })],
    ['a name as respondent key', (i) => ({ ...i, respondentKey: 'Amina of the north shore' })],
  ])('leaves %s to the schema, which refuses it', (_, change) => {
    const item = change(samples[0]);
    expect(fitsFieldInterview(item)).toBe(false);
    expect(fieldInterviewSchema.safeParse(item).success).toBe(false);
  });
});
