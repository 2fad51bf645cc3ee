import { answerSchemaFor } from './answer-schema';
import { everyKindQuestionnaire } from './every-kind-questionnaire';

const photo = '0b8f3a4e-6c1d-4e2f-9a7b-5c3d2e1f0a9b';
const goodAnswers: Record<string, unknown> = {
  consent: { agreed: true },
  'price-ladder': {
    steps: [
      { priceMinor: 150, response: 'yes' },
      { priceMinor: 200, response: 'no' },
    ],
  },
  'price-thresholds': {
    tooCheapMinor: 50,
    cheapMinor: 100,
    expensiveMinor: 200,
    tooExpensiveMinor: 300,
  },
  'wtp-open': { amountMinor: 250 },
  'payment-card': { highestYesMinor: 400 },
  'dichotomous-choice': { bidMinor: 200, firstResponse: 'no' },
  'shelf-observation': { priceMinor: 250, packSize: 1, quantity: 4, photoId: photo },
  'purchase-recall': { units: 2, pricePaidMinor: 120 },
  'household-size': { people: 5 },
  'income-band': { band: 'middle' },
  location: { latitude: 10, longitude: 20, accuracyMetres: 8, capturedAt: '2026-12-01T10:00:00Z' },
  photo: { photoIds: [photo] },
  'single-choice': { value: 'yes' },
  'multiple-choice': { values: ['first', 'second'] },
  number: { value: 7 },
  text: { value: 'Nothing more' },
};

describe('answerSchemaFor', () => {
  it.each(everyKindQuestionnaire().blocks.map((b) => [b.kind, b] as const))(
    'accepts a fitting %s answer and refuses an empty object',
    (kind, block) => {
      const schema = answerSchemaFor(block);
      expect(schema.safeParse(goodAnswers[kind]).error?.issues ?? []).toEqual([]);
      expect(schema.safeParse({}).success).toBe(false);
    },
  );
});
