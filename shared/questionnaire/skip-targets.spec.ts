import type { Block } from './block';
import { starterBlock } from './block-starters';
import { skipConditionProblem, skipSubjectOf, skipTestsFor, skipValuesFor } from './skip-targets';

const choice = starterBlock('single-choice', 'owns');
const count = starterBlock('number', 'count');
const photo = starterBlock('photo', 'tag');

describe('what a skip condition may test', () => {
  it('allows every test on numbers, is / is not on choices, and only "answered" on the rest', () => {
    expect(skipTestsFor(count)).toEqual(['equals', 'not-equals', 'less', 'greater', 'answered']);
    expect(skipTestsFor(choice)).toEqual(['equals', 'not-equals', 'answered']);
    expect(skipTestsFor(photo)).toEqual(['answered']);
    expect(skipTestsFor(starterBlock('consent', 'consent'))).toEqual([]);
  });

  it('lists the values a choice can be compared with', () => {
    expect(skipValuesFor(choice)).toEqual(['yes', 'no']);
    expect(skipValuesFor(starterBlock('dichotomous-choice', 'bid'))).toEqual(['yes', 'no']);
    expect(skipValuesFor(count)).toBeNull();
  });

  it.each<[string, Parameters<typeof skipConditionProblem>[0], Block, string | null]>([
    ['a fitting value', { blockId: 'owns', test: 'equals', value: 'yes' }, choice, null],
    [
      'an unknown value',
      { blockId: 'owns', test: 'equals', value: 'maybe' },
      choice,
      '"owns" has no answer "maybe"; choose one of: yes, no',
    ],
    [
      '"less" on a choice',
      { blockId: 'owns', test: 'less', value: 3 },
      choice,
      '"owns" (single-choice) can only be tested with: equals, not-equals, answered',
    ],
    [
      'a text value on a number',
      { blockId: 'count', test: 'equals', value: 'three' },
      count,
      '"count" records a number; compare it with a number',
    ],
    ['"greater" on a number', { blockId: 'count', test: 'greater', value: 3 }, count, null],
    [
      '"equals" on a photo',
      { blockId: 'tag', test: 'equals', value: 'x' },
      photo,
      '"tag" (photo) can only be tested with: answered',
    ],
  ])('judges %s', (_label, condition, target, expected) => {
    expect(skipConditionProblem(condition, target)).toBe(expected);
  });

  it('reads the compared part of each answer', () => {
    expect(skipSubjectOf(choice, { value: 'no' })).toBe('no');
    expect(skipSubjectOf(starterBlock('household-size', 'people'), { people: 5 })).toBe(5);
    expect(skipSubjectOf(starterBlock('multiple-choice', 'm'), { values: ['first'] })).toEqual([
      'first',
    ]);
    expect(skipSubjectOf(choice, undefined)).toBeUndefined();
  });
});
