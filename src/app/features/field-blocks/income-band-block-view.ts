import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type {
  IncomeBandAnswer,
  IncomeBandBlock,
} from '@shared/questionnaire/blocks/income-band-block';

/** The household's income band per period, or a declined answer where allowed. */
@Component({
  selector: 'app-income-band-block-view',
  template: `
    <p class="bv-hint">Household income per {{ block().period }}.</p>
    <ul class="bv-options" role="radiogroup" [attr.aria-labelledby]="labelledBy()">
      @for (band of block().bands; track band.value) {
        <li role="none">
          <label class="bv-option">
            <input
              type="radio"
              [name]="block().id"
              [checked]="answer()?.band === band.value"
              (change)="answerChange.emit({ band: band.value })"
            />
            {{ band.label }}
          </label>
        </li>
      }
      @if (block().allowDecline) {
        <li role="none">
          <label class="bv-option">
            <input
              type="radio"
              [name]="block().id"
              [checked]="answer() !== undefined && answer()?.band === null"
              (change)="answerChange.emit({ band: null })"
            />
            Prefers not to say
          </label>
        </li>
      }
    </ul>
  `,
  styleUrl: './block-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IncomeBandBlockView {
  readonly block = input.required<IncomeBandBlock>();
  readonly answer = input<IncomeBandAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<IncomeBandAnswer | undefined>();
}
