import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { formatMoney } from '@shared/money/format-money';
import { stableSiteHash } from '@shared/questionnaire/bid-assignment';
import {
  openLadderPrices,
  type PriceLadderAnswer,
  type PriceLadderBlock,
} from '@shared/questionnaire/blocks/price-ladder-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { YesNoChoice } from './yes-no-choice';

type Response = PriceLadderAnswer['steps'][number]['response'];

/** Words for the 5-point purchase intent scale, 1 to 5. */
export const intentLabels = ['Certainly not', 'Probably not', 'Unsure', 'Probably', 'Certainly'];

/** The order a ladder's prices are put: up, down, or up from a start fixed per interview. */
export function ladderOrder(block: PriceLadderBlock, seed: string): number[] {
  const prices = block.pricesMinor;
  if (block.order === 'ascending') return [...prices];
  if (block.order === 'descending') return [...prices].reverse();
  const start = stableSiteHash(seed) % prices.length;
  return [...prices.slice(start), ...prices.slice(0, start)];
}

/**
 * Purchase intent at each price of the ladder, asked in the block's order. A price that an
 * answer elsewhere settles (see `openLadderPrices`) says it needs no asking.
 */
@Component({
  selector: 'app-price-ladder-block-view',
  imports: [YesNoChoice],
  template: `
    <ol class="ladder" [attr.aria-labelledby]="labelledBy() || null">
      @for (price of order(); track price; let i = $index) {
        <li class="ladder__step">
          <span class="ladder__price" [id]="labelId(i)">At {{ money(price) }}?</span>
          @if (settled().has(price)) {
            <span class="bv-hint">No need to ask: the answer at another price settles it.</span>
          }
          @if (block().scale === 'yes-no') {
            <app-yes-no-choice
              [labelledBy]="labelId(i)"
              [value]="$any(responseAt(price))"
              (valueChange)="record(price, $event)"
            />
          } @else {
            <div class="ladder__intent" role="radiogroup" [attr.aria-labelledby]="labelId(i)">
              @for (label of intentLabels; track label; let level = $index) {
                <label class="bv-option">
                  <input
                    type="radio"
                    [name]="block().id + '-' + price"
                    [checked]="responseAt(price) === level + 1"
                    (change)="record(price, level + 1)"
                  />
                  {{ level + 1 }} · {{ label }}
                </label>
              }
            </div>
          }
        </li>
      }
    </ol>
  `,
  styleUrl: './block-view.scss',
  styles: `
    .ladder {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 16px;
    }
    .ladder__price {
      display: block;
      margin-bottom: 6px;
      font: var(--mat-sys-title-medium);
    }
    .ladder__intent {
      display: grid;
      gap: 6px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceLadderBlockView {
  readonly block = input.required<PriceLadderBlock>();
  readonly answer = input<PriceLadderAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<PriceLadderAnswer | undefined>();

  protected readonly intentLabels = intentLabels;
  protected readonly order = computed(() => ladderOrder(this.block(), this.context().seed));
  /** Prices not answered that the answers given settle. */
  protected readonly settled = computed(() => {
    const steps = this.answer()?.steps ?? [];
    const open = new Set(openLadderPrices(this.block(), steps));
    const answered = new Set(steps.map((step) => step.priceMinor));
    return new Set(this.block().pricesMinor.filter((p) => !answered.has(p) && !open.has(p)));
  });

  protected labelId(index: number): string {
    return `${this.block().id}-price-${index}`;
  }

  protected money(minor: number): string {
    return formatMoney(minor, this.context().currency, this.context().locale);
  }

  protected responseAt(price: number): Response | undefined {
    return this.answer()?.steps.find((step) => step.priceMinor === price)?.response;
  }

  /** Records one price's answer; steps stay in the order the prices were put. */
  protected record(price: number, response: Response): void {
    const held = new Map((this.answer()?.steps ?? []).map((s) => [s.priceMinor, s.response]));
    held.set(price, response);
    const steps = this.order()
      .filter((p) => held.has(p))
      .map((priceMinor) => ({ priceMinor, response: held.get(priceMinor)! }));
    this.answerChange.emit({ steps });
  }
}
