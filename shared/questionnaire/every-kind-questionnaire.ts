import type { Block } from './block';
import { blockKinds } from './block-kind';
import { starterBlock } from './block-starters';

/** A valid questionnaire with one block of every kind, consent first (for specs). */
export function everyKindQuestionnaire(): { blocks: Block[] } {
  return { blocks: blockKinds.map((kind) => starterBlock(kind, kind)) };
}
