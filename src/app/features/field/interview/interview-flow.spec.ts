import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { answerIssues } from './answer-check';
import {
  isRefusal,
  nextStep,
  previousStep,
  progressPercent,
  withoutHiddenAnswers,
} from './interview-flow';

/** consent → owns (yes/no) → how many, only if yes → ages, only if more than 2 → comment. */
function questionnaire(): Block[] {
  const owns = starterBlock('single-choice', 'owns');
  const count = {
    ...starterBlock('number', 'count'),
    showIf: { blockId: 'owns', test: 'equals', value: 'yes' },
  };
  const ages = {
    ...starterBlock('text', 'ages'),
    showIf: { blockId: 'count', test: 'greater', value: 2 },
  };
  return [
    starterBlock('consent', 'consent'),
    owns,
    count,
    ages,
    starterBlock('text', 'comment'),
  ] as Block[];
}

const agreed = { consent: { agreed: true } };

describe('the runner’s skip logic', () => {
  const blocks = questionnaire();

  it('walks every block in order when each condition holds', () => {
    const answers = { ...agreed, owns: { value: 'yes' }, count: { value: 4 } };
    expect(nextStep(blocks, answers, 0)).toBe(1);
    expect(nextStep(blocks, answers, 1)).toBe(2);
    expect(nextStep(blocks, answers, 2)).toBe(3);
    expect(nextStep(blocks, answers, 3)).toBe(4);
    expect(nextStep(blocks, answers, 4)).toBe(5);
  });

  it('skips a block whose condition fails, and the blocks that depend on it', () => {
    const answers = { ...agreed, owns: { value: 'no' } };
    expect(nextStep(blocks, answers, 1)).toBe(4);
    expect(previousStep(blocks, answers, 4)).toBe(1);
  });

  it('skips only the block whose own condition fails', () => {
    const answers = { ...agreed, owns: { value: 'yes' }, count: { value: 1 } };
    expect(nextStep(blocks, answers, 2)).toBe(4);
    expect(previousStep(blocks, answers, 4)).toBe(2);
  });

  it('goes back from the closing screen to the last block asked', () => {
    expect(previousStep(blocks, agreed, blocks.length)).toBe(4);
    expect(previousStep(blocks, agreed, 0)).toBeNull();
  });

  it('drops answers of blocks hidden after an earlier answer changed', () => {
    const changed = { ...agreed, owns: { value: 'no' }, count: { value: 4 }, ages: { value: 'x' } };
    expect(withoutHiddenAnswers(blocks, changed)).toEqual({ ...agreed, owns: { value: 'no' } });
  });

  it('tells a refusal at the consent block from an agreement', () => {
    expect(isRefusal(blocks[0], { agreed: false })).toBe(true);
    expect(isRefusal(blocks[0], { agreed: true })).toBe(false);
    expect(isRefusal(blocks[1], { agreed: false })).toBe(false);
  });

  it('reports progress through the blocks that are asked', () => {
    const answers = { ...agreed, owns: { value: 'no' } };
    expect(progressPercent(blocks, answers, 0)).toBe(0);
    expect(progressPercent(blocks, answers, 4)).toBe(67);
    expect(progressPercent(blocks, answers, blocks.length)).toBe(100);
  });
});

describe('answerIssues', () => {
  const blocks = questionnaire();

  it('asks for an answer to a required block and lets an optional one be left empty', () => {
    expect(answerIssues(blocks[1], undefined)).toEqual([
      { path: '', message: 'This question needs an answer' },
    ]);
    expect(answerIssues(blocks[4], undefined)).toEqual([]);
  });

  it('gives the block’s own message for an answer out of its range', () => {
    expect(answerIssues(blocks[2], { value: 5000 })).toEqual([
      { path: 'value', message: 'At most 1000' },
    ]);
    expect(answerIssues(blocks[2], { value: 12 })).toEqual([]);
  });
});
