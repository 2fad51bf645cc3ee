import type { LadderAnswer } from './ladder-answers';
import { analysePriceLadder } from './price-ladder';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const ladder = (rows: [string, number, number][]): LadderAnswer[] =>
  rows.map(([respondent, price, buy]) => ({ respondent, price, buy }));

// A small ladder whose answers overlap in price, so the logit exists.
const base = ladder([
  ['a', 10, 1],
  ['a', 20, 1],
  ['a', 30, 0],
  ['b', 10, 1],
  ['b', 20, 0],
  ['b', 30, 0],
  ['c', 10, 0],
  ['c', 20, 1],
  ['c', 30, 0],
  ['d', 10, 1],
  ['d', 20, 1],
  ['d', 30, 1],
]);

describe('analysePriceLadder monotone rule', () => {
  it('carries a "no" upward by default and counts the respondent', () => {
    // Respondent c says no at 10 but yes at 20: under the rule the yes becomes a no (common practice).
    const result = analysePriceLadder({ answers: base });
    expect(result.nonMonotoneRespondents).toBe(1);
    expect(result.changedAnswers).toBe(1);
    expect(result.steps.map((s) => s.share)).toEqual([0.75, 0.5, 0.25]);
  });

  it('can carry a "yes" downward instead', () => {
    const result = analysePriceLadder({ answers: base, monotoneRule: 'carry-yes-downward' });
    expect(result.steps.map((s) => s.share)).toEqual([1, 0.75, 0.25]);
  });

  it('states the rule in plain words, not by its code', () => {
    const text = (rule?: 'carry-yes-downward' | 'keep') =>
      analysePriceLadder({ answers: base, monotoneRule: rule }).assumptions.join(' | ');
    expect(text()).toContain(
      'answers made consistent per respondent: a no at one price counts as a no at every higher price (a yes above a no is read as no)',
    );
    expect(text('carry-yes-downward')).toContain('a no below a yes is read as yes');
    expect(text('keep')).toContain('answers used as given');
    expect(text() + text('keep')).not.toMatch(/carry-|'keep'|monotone rule/);
  });

  it('can keep answers as given', () => {
    const result = analysePriceLadder({ answers: base, monotoneRule: 'keep' });
    expect(result.nonMonotoneRespondents).toBe(1);
    expect(result.steps.map((s) => s.share)).toEqual([0.75, 0.75, 0.25]);
  });

  it('weights respondents', () => {
    const weighted = base.map((a) => ({ ...a, weight: a.respondent === 'd' ? 3 : 1 }));
    // Computed here by hand: at 30 only d (weight 3 of 6) buys.
    expect(analysePriceLadder({ answers: weighted }).steps[2].share).toBe(0.5);
  });
});

describe('analysePriceLadder on the 5-point intent scale', () => {
  it('maps intent to purchase probability through the calibration', () => {
    const answers = ladder([
      ['a', 10, 5],
      ['a', 20, 4],
      ['b', 10, 3],
      ['b', 20, 1],
      ['c', 10, 4],
      ['c', 20, 2],
    ]);
    const result = analysePriceLadder({ answers, scale: 'intent-5' });
    // Default calibration 5→0.7, 4→0.5, 3→0.3, 2→0.1, 1→0 (common practice / from memory).
    expect(result.steps[0].share).toBeCloseTo((0.7 + 0.3 + 0.5) / 3, 12);
    expect(result.steps[1].share).toBeCloseTo((0.5 + 0 + 0.1) / 3, 12);
    const custom = analysePriceLadder({
      answers,
      scale: 'intent-5',
      calibration: { 1: 0, 2: 0, 3: 0, 4: 1, 5: 1 },
    });
    expect(custom.steps.map((s) => s.share)).toEqual([2 / 3, 1 / 3]);
  });

  it('refuses an intent outside 1–5', () => {
    const answers = ladder([
      ['a', 10, 6],
      ['a', 20, 1],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers, scale: 'intent-5' }))).toMatchObject({
      code: 'invalid-value',
      field: 'buy',
    });
  });
});

describe('analysePriceLadder refusals', () => {
  it('refuses empty data', () => {
    expect(refusalOf(() => analysePriceLadder({ answers: [] }))).toMatchObject({
      code: 'too-few-observations',
      field: 'buy',
    });
  });

  it('refuses a single price level', () => {
    const answers = ladder([
      ['a', 10, 1],
      ['b', 10, 0],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'too-few-levels',
      field: 'price',
    });
  });

  it('refuses all-yes answers: the logit has no finite estimate', () => {
    const answers = ladder([
      ['a', 10, 1],
      ['a', 20, 1],
      ['b', 10, 1],
      ['b', 20, 1],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'no-finite-estimate',
      field: 'price',
    });
  });

  it('refuses perfectly separated answers', () => {
    const answers = ladder([
      ['a', 10, 1],
      ['a', 20, 0],
      ['b', 10, 1],
      ['b', 20, 0],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'no-finite-estimate',
      field: 'price',
    });
  });

  it('refuses a NaN price', () => {
    const answers = ladder([
      ['a', NaN, 1],
      ['a', 20, 0],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'invalid-value',
      field: 'price',
    });
  });

  it('refuses a buy answer other than 0 or 1', () => {
    const answers = ladder([
      ['a', 10, 2],
      ['a', 20, 0],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'invalid-value',
      field: 'buy',
    });
  });

  it('refuses a respondent answering the same price twice', () => {
    const answers = ladder([
      ['a', 10, 1],
      ['a', 10, 0],
      ['a', 20, 0],
    ]);
    expect(refusalOf(() => analysePriceLadder({ answers }))).toMatchObject({
      code: 'duplicate-answer',
      field: 'price',
    });
  });

  it('refuses a negative unit cost', () => {
    expect(refusalOf(() => analysePriceLadder({ answers: base, unitCost: -1 }))).toMatchObject({
      code: 'invalid-value',
      field: 'unitCost',
    });
  });
});
