import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { correctionIssueText } from './correction-issue';

const blocks = [{ ...starterBlock('wtp-open', 'most'), prompt: 'What is the most you would pay?' }];

describe('correctionIssueText', () => {
  it('leads an answer’s issue with its question instead of its path', () => {
    const issue = {
      path: 'answers.most.amountMinor',
      message: 'Most they would pay: type the amount',
    };
    expect(correctionIssueText(issue, blocks as Block[])).toBe(
      'What is the most you would pay? — Most they would pay: type the amount',
    );
  });

  it('keeps the path of an issue about no block of this questionnaire', () => {
    const issue = { path: 'finishedAt', message: 'Ends before it starts' };
    expect(correctionIssueText(issue, blocks as Block[])).toBe('finishedAt: Ends before it starts');
    expect(correctionIssueText({ path: '', message: 'Refused' }, [])).toBe('Refused');
  });
});
