import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import type {
  HouseholdSizeAnswer,
  HouseholdSizeBlock,
} from '@shared/questionnaire/blocks/household-size-block';

/** The number of people, typed or stepped with large − and + buttons. */
@Component({
  selector: 'app-household-size-block-view',
  imports: [MatIconButton, MatIcon],
  template: `
    <div class="household">
      <button
        mat-icon-button
        type="button"
        class="household__step"
        aria-label="One person fewer"
        [disabled]="(answer()?.people ?? 1) <= 1"
        (click)="step(-1)"
      >
        <mat-icon>remove</mat-icon>
      </button>
      <input
        class="bv-input household__count"
        type="number"
        inputmode="numeric"
        min="1"
        [attr.max]="block().maxPeople"
        [attr.aria-labelledby]="labelledBy() || null"
        [value]="answer()?.people ?? ''"
        (input)="read($any($event.target).value)"
      />
      <button
        mat-icon-button
        type="button"
        class="household__step"
        aria-label="One person more"
        [disabled]="(answer()?.people ?? 0) >= block().maxPeople"
        (click)="step(1)"
      >
        <mat-icon>add</mat-icon>
      </button>
    </div>
    <p class="bv-hint">People who live and eat together, up to {{ block().maxPeople }}.</p>
  `,
  styleUrl: './block-view.scss',
  styles: `
    .household {
      display: flex;
      align-items: center;
      gap: 12px;
      margin-bottom: 8px;
    }
    .household__count {
      max-width: 8rem;
      text-align: center;
    }
    .household__step {
      width: 56px;
      height: 56px;
      border: 1px solid var(--mat-sys-outline);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HouseholdSizeBlockView {
  readonly block = input.required<HouseholdSizeBlock>();
  readonly answer = input<HouseholdSizeAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<HouseholdSizeAnswer | undefined>();

  protected step(by: number): void {
    const people = Math.min(this.block().maxPeople, Math.max(1, (this.answer()?.people ?? 0) + by));
    this.answerChange.emit({ people });
  }

  protected read(text: string): void {
    const people = Number(text);
    this.answerChange.emit(text.trim() !== '' && Number.isFinite(people) ? { people } : undefined);
  }
}
