import type { Block } from './block';
import { starterBlock } from './block-starters';
import { validateInterviewAnswers } from './interview-answers';

const owns = starterBlock('single-choice', 'owns');
const size: Block = {
  ...starterBlock('household-size', 'size'),
  showIf: { blockId: 'owns', test: 'equals', value: 'yes' },
};
const remarks = starterBlock('text', 'remarks');
const definition = { blocks: [starterBlock('consent', 'consent'), owns, size, remarks] };
const messages = (answers: Record<string, unknown>) =>
  validateInterviewAnswers(definition, answers).map((p) => `${p.blockId}: ${p.message}`);

describe('validateInterviewAnswers', () => {
  it('accepts a complete interview', () => {
    expect(
      messages({ consent: { agreed: true }, owns: { value: 'yes' }, size: { people: 3 } }),
    ).toEqual([]);
  });

  it('keeps no answer without consent', () => {
    expect(messages({ consent: { agreed: false } })).toEqual([]);
    expect(messages({ consent: { agreed: false }, owns: { value: 'no' } })).toEqual([
      'owns: Without consent, no answer may be kept',
    ]);
  });

  it('wants required blocks that were shown, and no answer to skipped ones', () => {
    expect(messages({ consent: { agreed: true }, owns: { value: 'yes' } })).toEqual([
      'size: This block needs an answer',
    ]);
    expect(
      messages({ consent: { agreed: true }, owns: { value: 'no' }, size: { people: 2 } }),
    ).toEqual(['size: This block was not to be asked, given the earlier answers']);
  });

  it('checks each answer against its block and names unknown blocks', () => {
    expect(messages({ consent: { agreed: true }, owns: { value: 'perhaps' }, ghost: {} })).toEqual([
      'ghost: No block has the id "ghost"',
      'owns: Choose one of: yes, no',
    ]);
  });
});
