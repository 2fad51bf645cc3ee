import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import type { ConsentAnswer, ConsentBlock } from '@shared/questionnaire/blocks/consent-block';

/** The consent statement, read out, and the respondent's agreement or refusal. */
@Component({
  selector: 'app-consent-block-view',
  template: `
    <blockquote class="consent__statement">{{ block().statement }}</blockquote>
    <ul class="bv-options" role="radiogroup" [attr.aria-labelledby]="labelledBy()">
      <li role="none">
        <label class="bv-option">
          <input
            type="radio"
            name="consent"
            [checked]="answer()?.agreed === true"
            (change)="answerChange.emit({ agreed: true })"
          />
          Agrees to take part
        </label>
      </li>
      <li role="none">
        <label class="bv-option">
          <input
            type="radio"
            name="consent"
            [checked]="answer()?.agreed === false"
            (change)="answerChange.emit({ agreed: false })"
          />
          Declines — end the interview
        </label>
      </li>
    </ul>
  `,
  styleUrl: './block-view.scss',
  styles: `
    .consent__statement {
      margin: 0 0 16px;
      padding: 12px 16px;
      border-left: 4px solid var(--mat-sys-primary);
      background: var(--mat-sys-surface-container);
      font: var(--mat-sys-body-large);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConsentBlockView {
  readonly block = input.required<ConsentBlock>();
  readonly answer = input<ConsentAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<ConsentAnswer | undefined>();
}
