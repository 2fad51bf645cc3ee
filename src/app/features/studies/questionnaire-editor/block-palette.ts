import { ChangeDetectionStrategy, Component, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { type BlockKind, blockKindLabels, blockKinds } from '@shared/questionnaire/block-kind';
import { blockKindIcons } from './block-kind-icons';

/** Every kind of block, one button each; the new block lands after the selected one. */
@Component({
  selector: 'app-block-palette',
  imports: [MatButton, MatIcon],
  template: `
    <section class="palette" aria-labelledby="palette-heading">
      <h2 id="palette-heading" class="palette__heading">Add a block</h2>
      <ul class="palette__kinds">
        @for (kind of kinds; track kind) {
          <li>
            <button
              mat-stroked-button
              type="button"
              class="palette__kind"
              (click)="picked.emit(kind)"
            >
              <mat-icon aria-hidden="true">{{ icons[kind] }}</mat-icon
              >{{ labels[kind] }}
            </button>
          </li>
        }
      </ul>
    </section>
  `,
  styles: `
    .palette__heading {
      font: var(--mat-sys-title-medium);
      margin: 0 0 8px;
    }
    .palette__kinds {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      grid-template-columns: repeat(auto-fill, minmax(10rem, 1fr));
      gap: 8px;
    }
    .palette__kind {
      width: 100%;
      height: auto;
      min-height: 44px;
      justify-content: flex-start;
      text-align: start;
      line-height: 1.25;
      --mat-button-outlined-horizontal-padding: 12px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlockPalette {
  readonly picked = output<BlockKind>();
  protected readonly kinds = blockKinds;
  protected readonly labels = blockKindLabels;
  protected readonly icons = blockKindIcons;
}
