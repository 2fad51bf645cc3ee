import type { Block, BlockOfKind } from '@shared/questionnaire/block';
import type { BlockKind } from '@shared/questionnaire/block-kind';

/** One accepted interview as the analysis reads it: answers, where it was taken, its blocks. */
export interface AnalysisInterview {
  readonly id: string;
  readonly finishedAt: string;
  readonly routeId: string | null;
  readonly pointId: string | null;
  /** The sampling point's stratum, which the analysis calls its region. */
  readonly region: string | null;
  readonly answers: Readonly<Record<string, unknown>>;
  /** The blocks of the questionnaire version the interview was taken with. */
  readonly blocks: readonly Block[];
}

/**
 * The block of `kind` an interview answered: the one named `blockId` when given, else the first
 * of that kind in its questionnaire. Undefined when the questionnaire has none or it was not
 * answered.
 */
export function answeredBlock<K extends BlockKind>(
  interview: AnalysisInterview,
  kind: K,
  blockId?: string,
): { block: BlockOfKind<K>; answer: unknown } | undefined {
  const block = interview.blocks.find(
    (b): b is BlockOfKind<K> => b.kind === kind && (blockId === undefined || b.id === blockId),
  );
  if (!block) return undefined;
  const answer = interview.answers[block.id];
  return answer === undefined || answer === null ? undefined : { block, answer };
}

/** Minor units of the study currency to major units (prices enter the engine in major units). */
export function toMajor(minor: number, digits: number): number {
  return minor / 10 ** digits;
}
