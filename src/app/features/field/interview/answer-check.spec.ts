import { amountWordsFor } from '@shared/money/amount-words';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { answerIssues, screenIssues } from './answer-check';

// Intl puts a no-break space after the symbol; the expected texts use a plain one.
const kes = (minor: number) => amountWordsFor('KES', 'en-KE')(minor).replace(/\s/g, ' ');
const block = (kind: Block['kind'], settings: object = {}) =>
  ({ ...starterBlock(kind, kind), ...settings }) as Block;
const messages = (issues: { message: string }[]) => issues.map((issue) => issue.message);

describe('answerIssues', () => {
  it('names each threshold and likelihood left out, and writes the cap in the currency', () => {
    const thresholds = block('price-thresholds', { askLikelihood: true, maxPriceMinor: 2000000 });
    const answer = { tooCheapMinor: 10000, cheapMinor: 20000, tooExpensiveMinor: 2500000 };
    expect(messages(answerIssues(thresholds, answer, kes))).toEqual([
      'Expensive price: type the amount',
      'Too expensive price: must be at most Ksh 20,000.00',
      'Choose how likely they would buy it at the bargain price',
      'Choose how likely they would buy it at the expensive price',
    ]);
  });

  it('refuses an absurd shelf price and a missing tag photo in the enumerator’s words', () => {
    const shelf = block('shelf-observation', { photo: 'required' });
    const answer = { priceMinor: 9999999999900, packSize: 1, quantity: 3 };
    expect(messages(answerIssues(shelf, answer, kes))).toEqual([
      'Shelf price: must be at most Ksh 1,000,000.00',
      'Take the photo of the price tag',
    ]);
  });

  it('names the first price of a ladder left unasked', () => {
    const ladder = block('price-ladder', { pricesMinor: [80000, 110000, 140000] });
    const answer = { steps: [{ priceMinor: 80000, response: 'yes' }] };
    expect(messages(answerIssues(ladder, answer, kes))).toEqual([
      'Ask every price on the ladder: Ksh 1,100.00 and 1 more have no answer',
    ]);
  });

  it('says what a required block with no answer needs, by its kind', () => {
    expect(messages(answerIssues(block('location'), undefined, kes))).toEqual([
      'Find the position, then keep it',
    ]);
    expect(messages(answerIssues(block('wtp-open'), undefined, kes))).toEqual([
      'Most they would pay: type the amount',
    ]);
    expect(answerIssues(block('wtp-open', { required: false }), undefined, kes)).toEqual([]);
  });

  it('never shows raw validation text for a part left out', () => {
    const everyKind: Block['kind'][] = ['price-thresholds', 'shelf-observation', 'wtp-open'];
    for (const kind of everyKind) {
      for (const issue of answerIssues(block(kind, { askLikelihood: true }), {}, kes)) {
        expect(issue.message).not.toMatch(/Invalid input|minor units|expected/);
      }
    }
  });
});

describe('screenIssues', () => {
  const typing = new Map([['amountMinor', 'Most they would pay: "-5" is not an amount']]);

  it('shows an unreadable amount’s own message instead of the word that it is missing', () => {
    const missing = [{ path: '', message: 'Most they would pay: type the amount' }];
    expect(screenIssues(missing, typing)).toEqual([
      { path: 'amountMinor', message: 'Most they would pay: "-5" is not an amount' },
    ]);
  });

  it('keeps the issues of the other parts', () => {
    const issues = [
      { path: 'amountMinor', message: 'Most they would pay: type the amount' },
      {
        path: 'likelihoodCheap',
        message: 'Choose how likely they would buy it at the bargain price',
      },
    ];
    expect(messages(screenIssues(issues, typing))).toEqual([
      'Most they would pay: "-5" is not an amount',
      'Choose how likely they would buy it at the bargain price',
    ]);
    expect(screenIssues(issues, new Map())).toEqual(issues);
  });
});
