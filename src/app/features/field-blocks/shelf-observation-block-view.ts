import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import {
  shelfObservationFieldNames,
  type ShelfObservationAnswer,
  type ShelfObservationBlock,
} from '@shared/questionnaire/blocks/shelf-observation-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';
import { PhotoPicker } from './photo-picker';

/** The shelf price, pack size, the count the block asks for, and the price-tag photo. */
@Component({
  selector: 'app-shelf-observation-block-view',
  imports: [MoneyInput, PhotoPicker],
  template: `
    <app-money-input
      part="priceMinor"
      [label]="names().priceMinor"
      [currency]="context().currency"
      [locale]="context().locale"
      [valueMinor]="answer()?.priceMinor"
      (valueMinorChange)="set('priceMinor', $event)"
    />
    <label class="bv-field">
      <span>{{ names().packSize }}</span>
      <input
        class="bv-input"
        type="number"
        inputmode="decimal"
        step="any"
        [value]="answer()?.packSize ?? ''"
        (input)="set('packSize', read($any($event.target).value))"
      />
    </label>
    <label class="bv-field">
      <span>{{ names().quantity }}</span>
      <input
        class="bv-input"
        type="number"
        inputmode="numeric"
        min="0"
        step="1"
        [value]="answer()?.quantity ?? ''"
        (input)="set('quantity', read($any($event.target).value))"
      />
    </label>
    @if (block().photo !== 'none') {
      <p class="bv-hint">
        Price-tag photo ({{ block().photo === 'required' ? 'needed' : 'if you can' }})
      </p>
      <app-photo-picker
        [photoIds]="answer()?.photoId ? [answer()!.photoId!] : []"
        [max]="1"
        (photoIdsChange)="set('photoId', $event[0])"
      />
    }
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShelfObservationBlockView {
  readonly block = input.required<ShelfObservationBlock>();
  readonly answer = input<ShelfObservationAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<ShelfObservationAnswer | undefined>();

  protected readonly names = computed(() => shelfObservationFieldNames(this.block()));

  protected read(text: string): number | undefined {
    const value = Number(text);
    return text.trim() !== '' && Number.isFinite(value) ? value : undefined;
  }

  /** Keeps the other parts; a part not given yet is left out of the answer. */
  protected set(field: keyof ShelfObservationAnswer, value: number | string | undefined): void {
    const next: Record<string, unknown> = { ...this.answer(), [field]: value };
    for (const key of Object.keys(next)) if (next[key] === undefined) delete next[key];
    this.answerChange.emit(next as unknown as ShelfObservationAnswer);
  }
}
