import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import type {
  ShelfObservationAnswer,
  ShelfObservationBlock,
} from '@shared/questionnaire/blocks/shelf-observation-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { MoneyInput } from './money-input';
import { PhotoPicker } from './photo-picker';

const unitWords: Record<ShelfObservationBlock['packUnit'], string> = {
  g: 'grams',
  kg: 'kilograms',
  ml: 'millilitres',
  l: 'litres',
  piece: 'pieces',
};

/** The shelf price, pack size, the count the block asks for, and the price-tag photo. */
@Component({
  selector: 'app-shelf-observation-block-view',
  imports: [MoneyInput, PhotoPicker],
  template: `
    <app-money-input
      label="Shelf price"
      [currency]="context().currency"
      [locale]="context().locale"
      [valueMinor]="answer()?.priceMinor"
      (valueMinorChange)="set('priceMinor', $event)"
    />
    <label class="bv-field">
      <span>Pack size ({{ unitWord() }})</span>
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
      <span>{{ quantityLabel() }}</span>
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

  protected readonly unitWord = computed(() => unitWords[this.block().packUnit]);
  protected readonly quantityLabel = computed(() => {
    const block = this.block();
    return block.measure === 'units-sold'
      ? `Units sold in the last ${block.periodDays ?? 0} days`
      : 'Units in stock now';
  });

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
