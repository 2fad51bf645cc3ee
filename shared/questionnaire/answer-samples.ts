import type { Block } from './block';
import { starterBlock } from './block-starters';

/** A block and answers its schema accepts (invented, for specs). */
export interface AnswerSample {
  block: Block;
  valid: readonly unknown[];
}

const photoA = '6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61';
const photoB = 'b7d47abd-8879-401c-82c3-5d473a2b9bc9';
const photoC = '00000000-0000-0000-0000-000000000000';

const block = (kind: Block['kind'], id: string, settings: object = {}): Block =>
  ({ ...starterBlock(kind, id), ...settings }) as Block;

/**
 * Every kind of block in each of its settings that changes what an answer may hold, each with
 * answers it accepts, edge values included (for specs).
 */
export function answerSamples(): AnswerSample[] {
  const thresholds = { tooCheapMinor: 50, cheapMinor: 100, expensiveMinor: 300 };
  const shelf = { priceMinor: 250, packSize: 0.5, quantity: 0 };
  return [
    { block: block('consent', 'consent'), valid: [{ agreed: true }, { agreed: false }] },
    {
      block: block('price-ladder', 'ladder'),
      valid: [
        // A "no" at the lowest price settles every higher one.
        { steps: [{ priceMinor: 100, response: 'no' }] },
        {
          steps: [
            { priceMinor: 300, response: 'no' },
            { priceMinor: 150, response: 'yes' },
            { priceMinor: 200, response: 'yes' },
            { priceMinor: 250, response: 'no' },
          ],
        },
      ],
    },
    {
      block: block('price-ladder', 'intent', { scale: 'intent-5' }),
      valid: [
        {
          steps: [
            { priceMinor: 100, response: 5 },
            { priceMinor: 150, response: 3 },
            { priceMinor: 200, response: 1 },
          ],
        },
      ],
    },
    {
      block: block('price-thresholds', 'psm', { maxPriceMinor: 500 }),
      valid: [
        { ...thresholds, tooExpensiveMinor: 500 },
        { tooCheapMinor: 500, cheapMinor: 0, expensiveMinor: 300, tooExpensiveMinor: 100 },
      ],
    },
    {
      block: block('price-thresholds', 'psm-likely', { askLikelihood: true }),
      valid: [
        { ...thresholds, tooExpensiveMinor: 600, likelihoodCheap: 5, likelihoodExpensive: 1 },
      ],
    },
    {
      block: block('wtp-open', 'wtp', { minMinor: 100, maxMinor: 5000 }),
      valid: [{ amountMinor: 100 }, { amountMinor: 5000 }, { amountMinor: 1500 }],
    },
    {
      block: block('payment-card', 'card'),
      valid: [{ highestYesMinor: 50 }, { highestYesMinor: 800 }, { highestYesMinor: null }],
    },
    {
      block: block('dichotomous-choice', 'bid'),
      valid: [
        { bidMinor: 100, firstResponse: 'yes' },
        { bidMinor: 300, firstResponse: 'no' },
      ],
    },
    {
      block: block('dichotomous-choice', 'bid-twice', {
        bounds: 'double',
        bidDesign: {
          levels: [
            { bidMinor: 200, afterYesMinor: 300, afterNoMinor: 100 },
            { bidMinor: 400, afterYesMinor: 600, afterNoMinor: 200 },
          ],
        },
      }),
      valid: [
        { bidMinor: 200, firstResponse: 'yes', followUpMinor: 300, secondResponse: 'no' },
        { bidMinor: 400, firstResponse: 'no', followUpMinor: 200, secondResponse: 'yes' },
      ],
    },
    {
      block: block('shelf-observation', 'shelf'),
      valid: [shelf, { ...shelf, photoId: photoA }],
    },
    {
      block: block('shelf-observation', 'shelf-tag', { photo: 'required' }),
      valid: [{ priceMinor: 1, packSize: 1e-3, quantity: 12, photoId: photoB }],
    },
    {
      block: block('shelf-observation', 'stock', {
        measure: 'stock-on-hand',
        periodDays: undefined,
        photo: 'none',
      }),
      valid: [{ ...shelf, quantity: 40 }],
    },
    {
      block: block('purchase-recall', 'recall'),
      valid: [{ units: 3, pricePaidMinor: 150 }, { units: 0 }, { units: 1000, pricePaidMinor: 1 }],
    },
    {
      block: block('purchase-recall', 'recall-units', { askPricePaid: false, maxUnits: 10 }),
      valid: [{ units: 10 }, { units: 0 }],
    },
    { block: block('household-size', 'size'), valid: [{ people: 1 }, { people: 30 }] },
    {
      block: block('income-band', 'income'),
      valid: [{ band: 'low' }, { band: 'high' }, { band: null }],
    },
    {
      block: block('income-band', 'income-told', { allowDecline: false }),
      valid: [{ band: 'middle' }],
    },
    {
      block: block('location', 'where'),
      valid: [
        {
          latitude: -0.1,
          longitude: 34.7,
          accuracyMetres: 12.5,
          capturedAt: '2027-03-01T09:00:00Z',
        },
        {
          latitude: 90,
          longitude: -180,
          accuracyMetres: 0,
          capturedAt: '2027-03-01T12:00:00.25+03:00',
        },
      ],
    },
    { block: block('photo', 'tag'), valid: [{ photoIds: [photoC] }] },
    {
      block: block('photo', 'shelves', { maxPhotos: 3 }),
      valid: [{ photoIds: [photoA, photoB, photoC] }],
    },
    { block: block('single-choice', 'owns'), valid: [{ value: 'yes' }, { value: 'no' }] },
    {
      block: block('multiple-choice', 'uses'),
      valid: [{ values: ['first'] }, { values: ['third', 'first', 'second'] }],
    },
    {
      block: block('multiple-choice', 'uses-two', { minChosen: 2, maxChosen: 2 }),
      valid: [{ values: ['second', 'first'] }],
    },
    { block: block('number', 'count'), valid: [{ value: 0 }, { value: 1000 }, { value: 7 }] },
    {
      block: block('number', 'share', { wholeNumber: false, min: -5.5, max: 10.25 }),
      valid: [{ value: -5.5 }, { value: 10.25 }, { value: 3.75 }],
    },
    {
      block: block('number', 'any', { wholeNumber: false, min: undefined, max: undefined }),
      valid: [{ value: -1e9 }, { value: 0.001 }],
    },
    {
      block: block('text', 'remarks', { maxLength: 12 }),
      valid: [{ value: 'Bought one' }, { value: '   twelve chars   ' }, { value: 'x'.repeat(12) }],
    },
  ];
}
