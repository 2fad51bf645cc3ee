import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import type { Block } from '@shared/questionnaire/block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { ConsentBlockView } from './consent-block-view';
import { DichotomousChoiceBlockView } from './dichotomous-choice-block-view';
import { HouseholdSizeBlockView } from './household-size-block-view';
import { IncomeBandBlockView } from './income-band-block-view';
import { LocationBlockView } from './location-block-view';
import { MultipleChoiceBlockView } from './multiple-choice-block-view';
import { NumberBlockView } from './number-block-view';
import { PaymentCardBlockView } from './payment-card-block-view';
import { PhotoBlockView } from './photo-block-view';
import { PriceLadderBlockView } from './price-ladder-block-view';
import { PriceThresholdsBlockView } from './price-thresholds-block-view';
import { PurchaseRecallBlockView } from './purchase-recall-block-view';
import { ShelfObservationBlockView } from './shelf-observation-block-view';
import { SingleChoiceBlockView } from './single-choice-block-view';
import { TextBlockView } from './text-block-view';
import { WtpOpenBlockView } from './wtp-open-block-view';

/**
 * One block as the enumerator sees it: the question to read out, the note for the enumerator,
 * and the view of the block's kind. Inputs: the block, its current answer and the context;
 * output: every change of the answer (undefined when cleared).
 */
@Component({
  selector: 'app-block-view',
  imports: [
    ConsentBlockView,
    DichotomousChoiceBlockView,
    HouseholdSizeBlockView,
    IncomeBandBlockView,
    LocationBlockView,
    MultipleChoiceBlockView,
    NumberBlockView,
    PaymentCardBlockView,
    PhotoBlockView,
    PriceLadderBlockView,
    PriceThresholdsBlockView,
    PurchaseRecallBlockView,
    ShelfObservationBlockView,
    SingleChoiceBlockView,
    TextBlockView,
    WtpOpenBlockView,
  ],
  templateUrl: './block-view.html',
  styles: `
    .block__prompt {
      font: var(--mat-sys-headline-small);
      margin: 0 0 8px;
    }
    .block__note {
      margin: 0 0 16px;
      padding: 8px 12px;
      border-radius: 8px;
      background: var(--mat-sys-surface-container-high);
      font: var(--mat-sys-body-medium);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlockView {
  readonly block = input.required<Block>();
  readonly answer = input<unknown>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly answerChange = output<unknown>();

  protected readonly promptId = computed(() => `block-prompt-${this.block().id}`);
  /** The answer typed for the template's per-kind views (each checks its own block). */
  protected readonly typed = computed(() => this.answer() as never);
}
