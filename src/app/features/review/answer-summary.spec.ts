import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import { describeAnswer } from './answer-summary';

const say = (block: Block, answer: unknown) => describeAnswer(block, answer, 'USD', 'en-US');

describe('describeAnswer', () => {
  it('reads a ladder price by price in the study currency', () => {
    const answer = {
      steps: [
        { priceMinor: 100, response: 'yes' },
        { priceMinor: 150, response: 'no' },
      ],
    };
    expect(say(starterBlock('price-ladder', 'l'), answer)).toBe('$1.00: yes · $1.50: no');
  });

  it('reads a double-bounded choice with its follow-up', () => {
    const block = starterBlock('dichotomous-choice', 'd');
    const answer = {
      bidMinor: 200,
      firstResponse: 'yes',
      followUpMinor: 300,
      secondResponse: 'no',
    };
    expect(say(block, answer)).toBe('At $2.00: yes; at $3.00: no');
  });

  it('names the chosen option by its label and a declined income band', () => {
    expect(say(starterBlock('single-choice', 's'), { value: 'no' })).toBe('No');
    expect(say(starterBlock('income-band', 'i'), { band: null })).toBe('Preferred not to say');
  });

  it('says when a block has no answer', () => {
    expect(say(starterBlock('text', 't'), undefined)).toBe('Not asked, or left unanswered');
  });

  it('shows an answer of an unexpected shape as data instead of failing', () => {
    expect(say(starterBlock('wtp-open', 'w'), { amount: 'ten' })).toBe('{"amount":"ten"}');
  });
});
