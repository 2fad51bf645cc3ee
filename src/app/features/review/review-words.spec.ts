import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { flagDetail, pendingWords } from './review-words';

const ladder = { ...starterBlock('price-ladder', 'lamp-ladder'), prompt: 'Would you buy it?' };
const thresholds = starterBlock('price-thresholds', 'lamp-thresholds');

describe('flagDetail', () => {
  it('names thresholds out of order by the words the respondent heard, never field names', () => {
    const text = flagDetail(
      {
        kind: 'thresholds-out-of-order',
        blockId: 'lamp-thresholds',
        violations: [
          { lower: 'tooCheapMinor', higher: 'cheapMinor' },
          { lower: 'expensiveMinor', higher: 'tooExpensiveMinor' },
        ],
      },
      [ladder, thresholds],
    );
    expect(text).toBe(
      'Price thresholds out of order in “Think about the price of the product.”: ' +
        '“too cheap” above “a bargain”, “expensive” above “too expensive”',
    );
    expect(text).not.toMatch(/Minor|lamp-thresholds/);
  });

  it('names a straight-lined ladder by its question', () => {
    const flag: QualityFlag = {
      kind: 'straight-lining',
      blockId: 'lamp-ladder',
      steps: 5,
      response: 'yes',
    };
    expect(flagDetail(flag, [ladder])).toBe(
      'Same answer at every price: "yes" at all 5 prices of “Would you buy it?”',
    );
  });

  it('names a block by its kind when the questionnaire is not at hand, as in the queue', () => {
    const flag: QualityFlag = {
      kind: 'straight-lining',
      blockId: 'lamp-ladder',
      steps: 5,
      response: 'no',
    };
    expect(flagDetail(flag)).toBe(
      'Same answer at every price: "no" at all 5 prices of the price ladder',
    );
  });

  it('cuts a long question to one line', () => {
    const long = { ...ladder, prompt: `Would you buy ${'this lamp '.repeat(20)}?` };
    const flag: QualityFlag = {
      kind: 'straight-lining',
      blockId: 'lamp-ladder',
      steps: 4,
      response: 'no',
    };
    const text = flagDetail(flag, [long]);
    expect(text).toMatch(/…”$/);
    expect(text.length).toBeLessThan(120);
  });
});

describe('pendingWords', () => {
  it('says what waits, and how much of it was flagged', () => {
    expect(pendingWords(0, 0)).toBe('Nothing waits for a decision.');
    expect(pendingWords(1, 0)).toBe('1 interview waits for a decision.');
    expect(pendingWords(312, 40)).toBe('312 interviews wait for a decision, 40 flagged.');
  });
});
