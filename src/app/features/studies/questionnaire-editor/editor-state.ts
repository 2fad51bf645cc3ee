import { Injectable, computed, signal } from '@angular/core';
import type { Block } from '@shared/questionnaire/block';
import type { BlockKind } from '@shared/questionnaire/block-kind';
import {
  type StarterPriceRange,
  freshBlockId,
  starterBlock,
} from '@shared/questionnaire/block-starters';
import type { QuestionnaireDefinition } from '@shared/questionnaire/questionnaire-definition';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import { validateQuestionnaire } from '@shared/questionnaire/validate-questionnaire';

/** A block in the editor with a key of its own: ids are edited, so they cannot track cards. */
export interface EditorItem {
  readonly key: number;
  readonly block: Block;
}

/**
 * The questionnaire being edited: its blocks in order, the one selected, and every problem the
 * shared rules find, recomputed on each change. Provided per editor page.
 */
@Injectable()
export class EditorState {
  private nextKey = 1;
  private readonly itemList = signal<readonly EditorItem[]>([]);
  private readonly selected = signal<number | null>(null);
  private readonly changed = signal(false);

  readonly items = this.itemList.asReadonly();
  readonly selectedKey = this.selected.asReadonly();
  readonly dirty = this.changed.asReadonly();
  readonly definition = computed<QuestionnaireDefinition>(() => ({
    blocks: this.itemList().map((item) => item.block),
  }));
  readonly problems = computed<QuestionnaireProblem[]>(() =>
    validateQuestionnaire(this.definition()),
  );
  /** Problems per card key; those of the whole questionnaire are under -1. */
  readonly problemsByKey = computed(() => {
    const byKey = new Map<number, QuestionnaireProblem[]>();
    for (const problem of this.problems()) {
      const key =
        problem.blockIndex === null ? -1 : (this.itemList()[problem.blockIndex]?.key ?? -1);
      byKey.set(key, [...(byKey.get(key) ?? []), problem]);
    }
    return byKey;
  });

  /** Starts over with a stored definition; nothing is unsaved. */
  load(definition: QuestionnaireDefinition): void {
    this.itemList.set(definition.blocks.map((block) => ({ key: this.nextKey++, block })));
    this.selected.set(null);
    this.changed.set(false);
  }

  /**
   * Adds a fresh block of `kind` after the selected block (or at the end) and selects it; its
   * amounts follow the study's price range when one is given.
   */
  add(kind: BlockKind, prices?: StarterPriceRange): void {
    const ids = this.itemList().map((item) => item.block.id);
    const block = starterBlock(kind, freshBlockId(kind, ids), prices);
    const item = { key: this.nextKey++, block };
    const at = this.indexOf(this.selected());
    this.edit((list) => [
      ...list.slice(0, at + 1 || list.length),
      item,
      ...list.slice(at + 1 || list.length),
    ]);
    this.selected.set(item.key);
  }

  remove(key: number): void {
    this.edit((list) => list.filter((item) => item.key !== key));
    if (this.selected() === key) this.selected.set(null);
  }

  /** Moves the card at `from` to `to` (as drag-and-drop reports them). */
  move(from: number, to: number): void {
    const list = this.itemList();
    if (from === to || from < 0 || from >= list.length) return;
    const target = Math.max(0, Math.min(to, list.length - 1));
    this.edit((current) => {
      const next = [...current];
      const [moved] = next.splice(from, 1);
      next.splice(target, 0, moved);
      return next;
    });
  }

  /** Moves a card one place up (-1) or down (+1): the keyboard's way to reorder. */
  moveBy(key: number, delta: -1 | 1): void {
    const from = this.indexOf(key);
    if (from >= 0) this.move(from, from + delta);
  }

  /**
   * Replaces a block. When its id changes, conditions that looked at the old id follow it, so
   * renaming a block does not silently break the skip logic built on it.
   */
  update(key: number, block: Block): void {
    const before = this.itemList().find((item) => item.key === key)?.block;
    this.edit((list) =>
      list.map((item) => {
        if (item.key === key) return { key, block };
        const showIf = item.block.showIf;
        if (!before || before.id === block.id || showIf?.blockId !== before.id) return item;
        return {
          key: item.key,
          block: { ...item.block, showIf: { ...showIf, blockId: block.id } },
        };
      }),
    );
  }

  select(key: number | null): void {
    this.selected.set(this.selected() === key ? null : key);
  }

  /** Selects the block a problem belongs to, if any; returns its key. */
  selectIndex(index: number): number | null {
    const key = this.itemList()[index]?.key ?? null;
    this.selected.set(key);
    return key;
  }

  markSaved(): void {
    this.changed.set(false);
  }

  private indexOf(key: number | null): number {
    return key === null ? -1 : this.itemList().findIndex((item) => item.key === key);
  }

  private edit(change: (list: readonly EditorItem[]) => readonly EditorItem[]): void {
    this.itemList.update(change);
    this.changed.set(true);
  }
}
