import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import type { Block } from '@shared/questionnaire/block';
import type { QuestionnaireProblem } from '@shared/questionnaire/questionnaire-problem';
import type { SkipCondition } from '@shared/questionnaire/skip-condition';
import type { MoneyContext } from '../fields/money-context';
import { problemFieldLabel } from '../problem-field';
import { ConsentSettings } from './consent-settings';
import { DichotomousChoiceSettings } from './dichotomous-choice-settings';
import { HouseholdSizeSettings } from './household-size-settings';
import { IncomeBandSettings } from './income-band-settings';
import { LocationSettings } from './location-settings';
import { MultipleChoiceSettings } from './multiple-choice-settings';
import { NumberSettings } from './number-settings';
import { PaymentCardSettings } from './payment-card-settings';
import { PhotoSettings } from './photo-settings';
import { PriceLadderSettings } from './price-ladder-settings';
import { PriceThresholdsSettings } from './price-thresholds-settings';
import { PurchaseRecallSettings } from './purchase-recall-settings';
import { ShelfObservationSettings } from './shelf-observation-settings';
import { SingleChoiceSettings } from './single-choice-settings';
import { SkipConditionSettings } from './skip-condition-settings';
import { TextSettings } from './text-settings';
import { WtpOpenSettings } from './wtp-open-settings';

/** The settings of one block: what every block has, then exactly what its kind needs. */
@Component({
  selector: 'app-block-settings',
  imports: [
    ConsentSettings,
    DichotomousChoiceSettings,
    HouseholdSizeSettings,
    IncomeBandSettings,
    LocationSettings,
    MatCheckbox,
    MatFormFieldModule,
    MatInput,
    MultipleChoiceSettings,
    NumberSettings,
    PaymentCardSettings,
    PhotoSettings,
    PriceLadderSettings,
    PriceThresholdsSettings,
    PurchaseRecallSettings,
    ShelfObservationSettings,
    SingleChoiceSettings,
    SkipConditionSettings,
    TextSettings,
    WtpOpenSettings,
  ],
  templateUrl: './block-settings.html',
  styleUrl: './block-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BlockSettings {
  readonly block = input.required<Block>();
  readonly earlier = input.required<readonly Block[]>();
  readonly problems = input<readonly QuestionnaireProblem[]>([]);
  readonly money = input.required<MoneyContext>();
  readonly readOnly = input(false);
  readonly blockChange = output<Block>();

  protected readonly problemRows = computed(() =>
    this.problems().map((problem) => ({
      field: problemFieldLabel(problem.path, this.block().kind),
      message: problem.message,
    })),
  );

  protected patch(change: Partial<Block>): void {
    this.blockChange.emit({ ...this.block(), ...change } as Block);
  }

  protected setCondition(showIf: SkipCondition | undefined): void {
    this.patch({ showIf });
  }

  protected text(event: Event): string {
    return (event.target as HTMLInputElement).value;
  }
}
