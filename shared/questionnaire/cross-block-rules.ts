import type { Block } from './block';
import type { QuestionnaireProblem } from './questionnaire-problem';
import { skipConditionProblem } from './skip-targets';

/** What the cross-block rules need of a block, read loosely so broken blocks still count. */
export interface BlockOutline {
  index: number;
  id: string | null;
  kind: string | null;
  showIfBlockId: string | null;
  /** The block as parsed, when its own fields are valid. */
  parsed: Block | null;
}

const problem = (b: BlockOutline, path: string, message: string): QuestionnaireProblem => ({
  blockIndex: b.index,
  blockId: b.id,
  path,
  message,
});

/** Consent comes first and exactly once. */
export function consentProblems(outlines: readonly BlockOutline[]): QuestionnaireProblem[] {
  const consents = outlines.filter((b) => b.kind === 'consent');
  if (consents.length === 0) {
    return [
      {
        blockIndex: null,
        blockId: null,
        path: 'blocks',
        message: 'The questionnaire must start with a consent block',
      },
    ];
  }
  const found: QuestionnaireProblem[] = [];
  if (consents[0].index !== 0)
    found.push(problem(consents[0], 'kind', 'Consent must be the first block'));
  for (const extra of consents.slice(1)) {
    found.push(problem(extra, 'kind', 'Only one consent block is allowed'));
  }
  return found;
}

/** No two blocks share an id. */
export function duplicateIdProblems(outlines: readonly BlockOutline[]): QuestionnaireProblem[] {
  return outlines.flatMap((b) => {
    const first = outlines.find((other) => other.id !== null && other.id === b.id);
    return first && first.index < b.index
      ? [problem(b, 'id', `The id "${b.id}" is already used by block ${first.index + 1}`)]
      : [];
  });
}

/** Each condition looks at an earlier block, with a test and value that block can answer. */
export function skipConditionProblems(outlines: readonly BlockOutline[]): QuestionnaireProblem[] {
  return outlines.flatMap((b) => {
    const targetId = b.showIfBlockId;
    if (targetId === null) return [];
    const target = outlines.find((other) => other.id === targetId);
    if (!target) return [problem(b, 'showIf.blockId', `No block has the id "${targetId}"`)];
    if (target.index >= b.index) {
      const where =
        target.index === b.index ? 'itself' : `block ${target.index + 1}, which comes later`;
      return [
        problem(b, 'showIf.blockId', `A condition can only look at an earlier block, not ${where}`),
      ];
    }
    const condition = b.parsed?.showIf;
    if (!condition || !target.parsed) return [];
    const message = skipConditionProblem(condition, target.parsed);
    return message ? [problem(b, 'showIf', message)] : [];
  });
}
