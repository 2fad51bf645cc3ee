import type { Block } from './block';
import { starterBlock } from './block-starters';
import { everyKindQuestionnaire } from './every-kind-questionnaire';
import { validateQuestionnaire } from './validate-questionnaire';

const consent = starterBlock('consent', 'consent');
const owns = starterBlock('single-choice', 'owns');
const size = starterBlock('household-size', 'size');
const brief = (problems: ReturnType<typeof validateQuestionnaire>) =>
  problems.map((p) => [p.blockIndex, p.blockId, p.path, p.message]);

describe('validateQuestionnaire', () => {
  it('finds nothing wrong with a questionnaire holding every kind of block', () => {
    expect(validateQuestionnaire(everyKindQuestionnaire())).toEqual([]);
  });

  it('wants consent first', () => {
    expect(brief(validateQuestionnaire({ blocks: [owns, consent] }))).toEqual([
      [1, 'consent', 'kind', 'Consent must be the first block'],
    ]);
    expect(brief(validateQuestionnaire({ blocks: [owns] }))).toEqual([
      [null, null, 'blocks', 'The questionnaire must start with a consent block'],
    ]);
  });

  it('allows consent exactly once', () => {
    const second = { ...consent, id: 'consent-2' };
    expect(brief(validateQuestionnaire({ blocks: [consent, owns, second] }))).toEqual([
      [2, 'consent-2', 'kind', 'Only one consent block is allowed'],
    ]);
  });

  it('refuses a block id used twice', () => {
    expect(
      brief(validateQuestionnaire({ blocks: [consent, owns, { ...size, id: 'owns' }] })),
    ).toEqual([[2, 'owns', 'id', 'The id "owns" is already used by block 2']]);
  });

  it('refuses a condition on a later block, on itself, or on a missing block', () => {
    const ahead: Block = { ...owns, showIf: { blockId: 'size', test: 'answered' } };
    const self: Block = { ...size, showIf: { blockId: 'size', test: 'answered' } };
    const missing: Block = {
      ...starterBlock('text', 'note'),
      showIf: { blockId: 'gone', test: 'answered' },
    };
    expect(brief(validateQuestionnaire({ blocks: [consent, ahead, self, missing] }))).toEqual([
      [
        1,
        'owns',
        'showIf.blockId',
        'A condition can only look at an earlier block, not block 3, which comes later',
      ],
      [2, 'size', 'showIf.blockId', 'A condition can only look at an earlier block, not itself'],
      [3, 'note', 'showIf.blockId', 'No block has the id "gone"'],
    ]);
  });

  it('refuses a condition of a kind the earlier block cannot answer', () => {
    const tag = starterBlock('photo', 'tag');
    const after: Block = { ...size, showIf: { blockId: 'tag', test: 'equals', value: 'x' } };
    expect(brief(validateQuestionnaire({ blocks: [consent, tag, after] }))).toEqual([
      [2, 'size', 'showIf', '"tag" (photo) can only be tested with: answered'],
    ]);
  });

  it('reports every block’s own problems with the block they belong to', () => {
    const ladder = { ...starterBlock('price-ladder', 'ladder'), pricesMinor: [300, 200] };
    const bids = { ...starterBlock('dichotomous-choice', 'bid'), bidDesign: { levels: [] } };
    const card = { ...starterBlock('payment-card', 'card'), amountsMinor: [100, 100] };
    expect(brief(validateQuestionnaire({ blocks: [consent, ladder, bids, card] }))).toEqual([
      [
        1,
        'ladder',
        'pricesMinor.1',
        'Each price must be higher than the one before: price 2 is not',
      ],
      [2, 'bid', 'bidDesign.levels', 'A bid design needs at least one bid'],
      [
        3,
        'card',
        'amountsMinor.1',
        'Each amount must be higher than the one before: amount 2 is not',
      ],
    ]);
  });

  it('still checks the rules across blocks when a block is broken', () => {
    const broken = { id: 'owns', kind: 'single-choice', prompt: '' };
    const problems = validateQuestionnaire({ blocks: [broken, consent, { ...size, id: 'owns' }] });
    expect(problems.map((p) => p.message)).toEqual(
      expect.arrayContaining([
        'Consent must be the first block',
        'Write the question the enumerator reads out',
        'The id "owns" is already used by block 1',
      ]),
    );
  });

  it('names an unknown kind and an unknown field', () => {
    const problems = validateQuestionnaire({
      blocks: [consent, { ...owns, kind: 'slider' }],
      title: 'x',
    });
    expect(problems[0]).toEqual({
      blockIndex: null,
      blockId: null,
      path: 'title',
      message: '"title" is not part of a questionnaire',
    });
    expect(problems[1]).toMatchObject({ blockIndex: 1, blockId: 'owns', path: 'kind' });
    const extra = validateQuestionnaire({ blocks: [{ ...consent, colour: 'red' }] });
    expect(extra).toEqual([
      expect.objectContaining({ blockIndex: 0, message: expect.stringContaining('colour') }),
    ]);
  });

  it('refuses something that is not a definition at all', () => {
    expect(validateQuestionnaire(null)[0].message).toBe(
      'The definition must be an object with a list of blocks',
    );
    expect(validateQuestionnaire({})[0].message).toBe('The definition needs a list of blocks');
  });
});
