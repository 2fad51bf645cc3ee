import { blockSchema } from './block';
import {
  type BlockOutline,
  consentProblems,
  duplicateIdProblems,
  skipConditionProblems,
} from './cross-block-rules';
import type { QuestionnaireProblem } from './questionnaire-problem';

/**
 * Every problem with a questionnaire definition, each tied to its block: the block's own
 * fields (ladder prices strictly increasing and positive, a bid design with bids and proper
 * follow-ups, card amounts increasing, ranges the right way round…) and the rules across
 * blocks (consent first and exactly once, unique ids, conditions only on earlier blocks of a
 * kind they can test). An empty list means the definition can be stored.
 *
 * Each block is checked on its own, so one broken block does not hide the others' problems.
 */
export function validateQuestionnaire(definition: unknown): QuestionnaireProblem[] {
  if (typeof definition !== 'object' || definition === null || Array.isArray(definition)) {
    return [whole('', 'The definition must be an object with a list of blocks')];
  }
  const { blocks, ...rest } = definition as Record<string, unknown>;
  const extras = Object.keys(rest).map((key) =>
    whole(key, `"${key}" is not part of a questionnaire`),
  );
  if (!Array.isArray(blocks))
    return [...extras, whole('blocks', 'The definition needs a list of blocks')];
  if (blocks.length > 200)
    return [...extras, whole('blocks', 'A questionnaire has at most 200 blocks')];

  const outlines: BlockOutline[] = [];
  const own: QuestionnaireProblem[] = [];
  blocks.forEach((raw: unknown, index) => {
    const parsed = blockSchema.safeParse(raw);
    const outline = outlineOf(raw, index, parsed.success ? parsed.data : null);
    outlines.push(outline);
    if (parsed.success) return;
    for (const issue of parsed.error.issues) {
      own.push({
        blockIndex: index,
        blockId: outline.id,
        path: issue.path.map(String).join('.'),
        message: issue.message,
      });
    }
  });
  return [
    ...extras,
    ...consentProblems(outlines),
    ...own,
    ...duplicateIdProblems(outlines),
    ...skipConditionProblems(outlines),
  ].sort(byBlock);
}

function whole(path: string, message: string): QuestionnaireProblem {
  return { blockIndex: null, blockId: null, path, message };
}

function outlineOf(raw: unknown, index: number, parsed: BlockOutline['parsed']): BlockOutline {
  const record = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
  const text = (value: unknown) => (typeof value === 'string' ? value : null);
  const showIf = record['showIf'];
  const showIfBlockId =
    typeof showIf === 'object' && showIf !== null
      ? text((showIf as Record<string, unknown>)['blockId'])
      : null;
  return { index, id: text(record['id']), kind: text(record['kind']), showIfBlockId, parsed };
}

function byBlock(a: QuestionnaireProblem, b: QuestionnaireProblem): number {
  return (a.blockIndex ?? -1) - (b.blockIndex ?? -1);
}
