import { mulberry32 } from '../estimation/random/mulberry32';
import { answerFitsFor } from './answer-fits';
import { mutateAnswer } from './answer-mutation';
import { answerSamples } from './answer-samples';
import { answerSchemaFor } from './answer-schema';
import { blockKinds } from './block-kind';

const samples = answerSamples();
const named = samples.map((sample) => [sample.block.id, sample] as const);

describe('answerFitsFor, the quick test of one answer', () => {
  it('has samples for every kind of block', () => {
    expect(new Set(samples.map((s) => s.block.kind))).toEqual(new Set(blockKinds));
  });

  it.each(named)('passes every sample answer of "%s" that its schema accepts', (_, sample) => {
    const fits = answerFitsFor(sample.block);
    const schema = answerSchemaFor(sample.block);
    for (const answer of sample.valid) {
      expect(schema.safeParse(answer).success).toBe(true);
      expect(fits(answer)).toBe(true);
    }
  });

  it.each(named)('never passes an answer of "%s" that its schema refuses', (_, sample) => {
    const fits = answerFitsFor(sample.block);
    const schema = answerSchemaFor(sample.block);
    const random = mulberry32(sample.block.id.length * 7919);
    let refused = 0;
    let passed = 0;
    for (let n = 0; n < 3000; n++) {
      let answer = sample.valid[n % sample.valid.length];
      for (let step = 0; step <= n % 3; step++) answer = mutateAnswer(answer, random);
      const accepted = schema.safeParse(answer).success;
      if (fits(answer)) {
        passed++;
        // Shows the offending answer when it fails.
        expect({ answer, accepted }).toEqual({ answer, accepted: true });
      }
      if (!accepted) refused++;
    }
    // The mutations must reach both sides, or the check above proves nothing.
    expect(refused).toBeGreaterThan(1000);
    expect(passed).toBeGreaterThan(0);
  });

  it.each<[string, unknown]>([
    ['consent', { agreed: 'yes' }],
    ['ladder', { steps: [] }],
    ['ladder', { steps: [{ priceMinor: 125, response: 'yes' }] }],
    [
      'ladder',
      {
        steps: [
          { priceMinor: 100, response: 'yes' },
          { priceMinor: 100, response: 'no' },
        ],
      },
    ],
    ['intent', { steps: [{ priceMinor: 100, response: 6 }] }],
    ['psm', { tooCheapMinor: 50, cheapMinor: 100, expensiveMinor: 300, tooExpensiveMinor: 501 }],
    ['psm', { tooCheapMinor: 50, cheapMinor: 100, expensiveMinor: 300 }],
    [
      'psm',
      {
        tooCheapMinor: 50,
        cheapMinor: 100,
        expensiveMinor: 300,
        tooExpensiveMinor: 400,
        likelihoodCheap: 3,
      },
    ],
    ['wtp', { amountMinor: 99 }],
    ['wtp', { amountMinor: 150.5 }],
    ['card', { highestYesMinor: 150 }],
    ['card', {}],
    ['bid', { bidMinor: 250, firstResponse: 'yes' }],
    [
      'bid-twice',
      { bidMinor: 200, firstResponse: 'yes', followUpMinor: 100, secondResponse: 'no' },
    ],
    ['bid-twice', { bidMinor: 200, firstResponse: 'yes' }],
    ['shelf', { priceMinor: 250, packSize: 0, quantity: 1 }],
    ['shelf', { priceMinor: 250, packSize: 1, quantity: 1, photoId: 'tag.jpg' }],
    ['shelf-tag', { priceMinor: 250, packSize: 1, quantity: 1 }],
    ['stock', { priceMinor: 250, packSize: 1, quantity: 1, photoId: undefined }],
    ['recall', { units: 2 }],
    ['recall', { units: 0, pricePaidMinor: 100 }],
    ['recall-units', { units: 11 }],
    ['size', { people: 0 }],
    ['size', { people: 2.5 }],
    ['income', { band: 'unknown' }],
    ['income-told', { band: null }],
    [
      'where',
      { latitude: 91, longitude: 0, accuracyMetres: 5, capturedAt: '2027-03-01T09:00:00Z' },
    ],
    ['where', { latitude: 1, longitude: 0, accuracyMetres: 5, capturedAt: '2027-03-01T09:00:00' }],
    ['tag', { photoIds: [] }],
    [
      'tag',
      {
        photoIds: ['6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61', 'b7d47abd-8879-401c-82c3-5d473a2b9bc9'],
      },
    ],
    ['owns', { value: 'maybe' }],
    ['uses', { values: ['first', 'first'] }],
    ['uses-two', { values: ['first'] }],
    ['count', { value: 1001 }],
    ['count', { value: 1.5 }],
    ['share', { value: Infinity }],
    ['any', { value: NaN }],
    ['remarks', { value: '   ' }],
    ['remarks', { value: 'thirteen char' }],
    ['owns', [{ value: 'yes' }]],
    ['owns', null],
  ])('refuses, as the schema does, this answer to "%s": %j', (id, answer) => {
    const { block } = samples.find((sample) => sample.block.id === id)!;
    expect(answerSchemaFor(block).safeParse(answer).success).toBe(false);
    expect(answerFitsFor(block)(answer)).toBe(false);
  });

  it('refuses, as a strict schema does, an answer with an inherited enumerable key', () => {
    const owns = samples.find((sample) => sample.block.id === 'owns')!.block;
    const answer: unknown = Object.assign(Object.create({ inherited: true }) as object, {
      value: 'yes',
    });
    expect(answerSchemaFor(owns).safeParse(answer).success).toBe(false);
    expect(answerFitsFor(owns)(answer)).toBe(false);
  });
});
