import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { type Block, blockSchema } from '@shared/questionnaire/block';
import { isBlockShown } from '@shared/questionnaire/block-visibility';
import type { BlockViewContext } from '../../field-blocks/block-view-context';
import { BlockView } from '../../field-blocks/block-view';
import type { MoneyContext } from './fields/money-context';

/** One row of the preview: a block the enumerator would see, or why it cannot be shown yet. */
interface PreviewRow {
  readonly block: Block;
  readonly ready: boolean;
}

/**
 * The questionnaire as the enumerator's device shows it, built from the same block views the
 * field app runs. Answers typed here drive the skip conditions live and are never stored.
 */
@Component({
  selector: 'app-questionnaire-preview',
  imports: [BlockView, MatButton, MatIcon],
  templateUrl: './questionnaire-preview.html',
  styleUrl: './questionnaire-preview.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class QuestionnairePreview {
  readonly blocks = input.required<readonly Block[]>();
  readonly money = input.required<MoneyContext>();

  protected readonly answers = signal<Readonly<Record<string, unknown>>>({});
  protected readonly context = computed<BlockViewContext>(() => ({
    ...this.money(),
    bid: null,
    seed: 'preview',
  }));
  /** Blocks asked given the answers so far; nothing after a refused consent. */
  protected readonly rows = computed<PreviewRow[]>(() => {
    const blocks = this.blocks();
    const answers = this.answers();
    const rows: PreviewRow[] = [];
    for (const block of blocks) {
      if (!isBlockShown(block, answers, blocks)) continue;
      rows.push({ block, ready: blockSchema.safeParse(block).success });
      const refused =
        block.kind === 'consent' &&
        (answers[block.id] as { agreed?: boolean } | undefined)?.agreed === false;
      if (refused) break;
    }
    return rows;
  });
  protected readonly skipped = computed(() => this.blocks().length - this.rows().length);

  protected record(blockId: string, answer: unknown): void {
    this.answers.update((all) => {
      const next = { ...all };
      if (answer === undefined) delete next[blockId];
      else next[blockId] = answer;
      return next;
    });
  }

  protected clearAnswers(): void {
    this.answers.set({});
  }
}
