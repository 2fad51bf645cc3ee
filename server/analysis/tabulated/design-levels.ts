import { inArray } from 'drizzle-orm';
import type { Block } from '@shared/questionnaire/block';
import type { Executor } from '../../db/database';
import { questionnaireVersions } from '../../db/schema';
import { toMajor } from '../analysis-interview';

/** What the answered blocks fix: design prices (major units) and dichotomous-choice bounds. */
export interface BlockDesign {
  readonly blockIds: string[];
  readonly designLevels: number[] | null;
  readonly bounds: Set<'single' | 'double'>;
}

/**
 * Reads the blocks the fit's rows answer from their questionnaire versions (a handful of
 * definitions, whatever the number of interviews) for the prices they fix, as the in-memory
 * extraction does: ladder prices, card amounts, bids with their follow-ups.
 */
export async function blockDesign(
  db: Executor,
  blocks: readonly [string, string][],
  digits: number,
): Promise<BlockDesign> {
  const versionIds = [...new Set(blocks.map(([version]) => version))];
  const versions =
    versionIds.length === 0
      ? []
      : await db
          .select({ id: questionnaireVersions.id, definition: questionnaireVersions.definition })
          .from(questionnaireVersions)
          .where(inArray(questionnaireVersions.id, versionIds));
  const byVersion = new Map(
    versions.map((v) => [v.id, (v.definition as { blocks?: Block[] }).blocks ?? []]),
  );
  const design = new Set<number>();
  const bounds = new Set<'single' | 'double'>();
  for (const [version, blockId] of blocks) {
    const block = byVersion.get(version)?.find((b) => b.id === blockId);
    if (!block) continue;
    const major = (minor: number) => design.add(toMajor(minor, digits));
    if (block.kind === 'price-ladder') block.pricesMinor.forEach(major);
    if (block.kind === 'payment-card') block.amountsMinor.forEach(major);
    if (block.kind === 'dichotomous-choice') {
      bounds.add(block.bounds);
      for (const level of block.bidDesign.levels) {
        for (const bid of [level.bidMinor, level.afterYesMinor, level.afterNoMinor]) {
          if (bid !== undefined) major(bid);
        }
      }
    }
  }
  return {
    blockIds: [...new Set(blocks.map(([, blockId]) => blockId))].sort(),
    designLevels: design.size > 0 ? [...design].sort((a, b) => a - b) : null,
    bounds,
  };
}
