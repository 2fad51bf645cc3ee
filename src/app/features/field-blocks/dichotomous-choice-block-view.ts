import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { formatMoney } from '@shared/money/format-money';
import type {
  DichotomousChoiceAnswer,
  DichotomousChoiceBlock,
} from '@shared/questionnaire/blocks/dichotomous-choice-block';
import { previewContext, type BlockViewContext } from './block-view-context';
import { YesNoChoice } from './yes-no-choice';

/** Yes or no at the bid drawn for this interview, and at the follow-up bid when double-bounded. */
@Component({
  selector: 'app-dichotomous-choice-block-view',
  imports: [YesNoChoice],
  template: `
    <p class="bid" [id]="block().id + '-first'">At {{ money(bid().bidMinor) }}?</p>
    <app-yes-no-choice
      [labelledBy]="block().id + '-first'"
      [value]="answer()?.firstResponse"
      (valueChange)="answerFirst($event)"
    />
    @if (followUp(); as second) {
      <p class="bid" [id]="block().id + '-second'">And at {{ money(second) }}?</p>
      <app-yes-no-choice
        [labelledBy]="block().id + '-second'"
        [value]="answer()?.secondResponse"
        (valueChange)="answerSecond($event)"
      />
    }
  `,
  styleUrl: './block-view.scss',
  styles: `
    .bid {
      font: var(--mat-sys-title-large);
      margin: 8px 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DichotomousChoiceBlockView {
  readonly block = input.required<DichotomousChoiceBlock>();
  readonly answer = input<DichotomousChoiceAnswer | undefined>();
  readonly context = input<BlockViewContext>(previewContext);
  readonly labelledBy = input<string>('');
  readonly answerChange = output<DichotomousChoiceAnswer | undefined>();

  protected readonly bid = computed(() => this.context().bid ?? this.block().bidDesign.levels[0]);
  protected readonly followUp = computed(() => {
    const first = this.answer()?.firstResponse;
    if (this.block().bounds !== 'double' || !first) return null;
    return (first === 'yes' ? this.bid().afterYesMinor : this.bid().afterNoMinor) ?? null;
  });

  protected money(minor: number): string {
    return formatMoney(minor, this.context().currency, this.context().locale);
  }

  protected answerFirst(firstResponse: 'yes' | 'no'): void {
    const bidMinor = this.bid().bidMinor;
    if (this.block().bounds === 'single') {
      this.answerChange.emit({ bidMinor, firstResponse });
      return;
    }
    const level = this.bid();
    const followUpMinor = firstResponse === 'yes' ? level.afterYesMinor : level.afterNoMinor;
    const held = this.answer();
    // A changed first answer changes the follow-up bid, so its answer no longer applies.
    const second = held?.firstResponse === firstResponse ? held.secondResponse : undefined;
    this.answerChange.emit({
      bidMinor,
      firstResponse,
      followUpMinor,
      ...(second ? { secondResponse: second } : {}),
    });
  }

  protected answerSecond(secondResponse: 'yes' | 'no'): void {
    const held = this.answer();
    if (held) this.answerChange.emit({ ...held, secondResponse });
  }
}
