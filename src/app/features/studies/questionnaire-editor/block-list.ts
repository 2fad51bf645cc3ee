import { CdkDrag, CdkDragDrop, CdkDragHandle, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import type { Block } from '@shared/questionnaire/block';
import { blockKindLabels } from '@shared/questionnaire/block-kind';
import { blockKindIcons } from './block-kind-icons';
import { EditorState } from './editor-state';
import type { MoneyContext } from './fields/money-context';
import { BlockSettings } from './settings/block-settings';

/**
 * The questionnaire's blocks in order: drag by the handle (or use the arrows) to reorder; open
 * a block to configure it in place, which keeps the settings beside the block on a phone.
 */
@Component({
  selector: 'app-block-list',
  imports: [BlockSettings, CdkDrag, CdkDragHandle, CdkDropList, MatIcon, MatIconButton],
  templateUrl: './block-list.html',
  styleUrl: './block-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlockList {
  protected readonly state = inject(EditorState);

  readonly money = input.required<MoneyContext>();
  readonly readOnly = input(false);

  protected readonly labels = blockKindLabels;
  protected readonly icons = blockKindIcons;
  protected readonly blocks = computed(() => this.state.items().map((item) => item.block));

  protected reorder(event: CdkDragDrop<unknown>): void {
    this.state.move(event.previousIndex, event.currentIndex);
  }

  protected earlierThan(index: number): readonly Block[] {
    return this.blocks().slice(0, index);
  }

  protected problemCount(key: number): number {
    return this.state.problemsByKey().get(key)?.length ?? 0;
  }
}
