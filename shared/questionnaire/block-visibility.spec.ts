import type { Block } from './block';
import { starterBlock } from './block-starters';
import { isBlockShown } from './block-visibility';

const owns = starterBlock('single-choice', 'owns');
const size = starterBlock('household-size', 'size');
const tools = starterBlock('multiple-choice', 'tools');
const when = (block: Block, showIf: Block['showIf']): Block => ({ ...block, showIf });
const later = starterBlock('text', 'later');
const blocks = [starterBlock('consent', 'consent'), owns, size, tools];

describe('isBlockShown', () => {
  it('shows a block without a condition', () => {
    expect(isBlockShown(later, {}, blocks)).toBe(true);
  });

  it.each<[Block['showIf'], Record<string, unknown>, boolean]>([
    [{ blockId: 'owns', test: 'equals', value: 'yes' }, { owns: { value: 'yes' } }, true],
    [{ blockId: 'owns', test: 'equals', value: 'yes' }, { owns: { value: 'no' } }, false],
    [{ blockId: 'owns', test: 'not-equals', value: 'yes' }, { owns: { value: 'no' } }, true],
    [{ blockId: 'size', test: 'greater', value: 4 }, { size: { people: 5 } }, true],
    [{ blockId: 'size', test: 'greater', value: 4 }, { size: { people: 4 } }, false],
    [{ blockId: 'size', test: 'less', value: 4 }, { size: { people: 3 } }, true],
    [
      { blockId: 'tools', test: 'equals', value: 'second' },
      { tools: { values: ['first', 'second'] } },
      true,
    ],
    [
      { blockId: 'tools', test: 'not-equals', value: 'second' },
      { tools: { values: ['first', 'second'] } },
      false,
    ],
    [{ blockId: 'size', test: 'answered' }, { size: { people: 1 } }, true],
  ])('evaluates %j against %j as %s', (showIf, answers, shown) => {
    expect(isBlockShown(when(later, showIf), answers, blocks)).toBe(shown);
  });

  it('hides a block whose condition looks at an unanswered block, whatever the test', () => {
    for (const test of ['equals', 'not-equals'] as const) {
      expect(isBlockShown(when(later, { blockId: 'owns', test, value: 'yes' }), {}, blocks)).toBe(
        false,
      );
    }
    expect(isBlockShown(when(later, { blockId: 'size', test: 'answered' }), {}, blocks)).toBe(
      false,
    );
  });
});
