import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import type { BidBounds, BidLevel } from '@shared/questionnaire/bid-design';
import type { DichotomousChoiceBlock } from '@shared/questionnaire/blocks/dichotomous-choice-block';
import { MoneyField } from '../fields/money-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Yes or no at a bid: single or double bounds, and the bid design with its follow-ups. */
@Component({
  selector: 'app-dichotomous-choice-settings',
  imports: [MatButton, MatFormFieldModule, MatIcon, MatIconButton, MatSelectModule, MoneyField],
  templateUrl: './dichotomous-choice-settings.html',
  styles: `
    ${settingsStyles}
    .bids {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 12px;
    }
    .bid {
      display: grid;
      grid-template-columns: 1fr auto;
      gap: 4px 8px;
      padding: 8px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
    }
    .bid__fields {
      display: grid;
      gap: 8px;
    }
    h4 {
      font: var(--mat-sys-title-small);
      margin: 0;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DichotomousChoiceSettings extends KindSettings<DichotomousChoiceBlock> {
  /** Switching bounds adds or drops the follow-ups, so the design always fits its bounds. */
  protected setBounds(bounds: BidBounds): void {
    const levels = this.block().bidDesign.levels.map((level) =>
      bounds === 'single' ? { bidMinor: level.bidMinor } : withFollowUps(level),
    );
    this.patch({ bounds, bidDesign: { levels } });
  }

  protected setLevel(index: number, change: Partial<BidLevel>): void {
    const levels = this.block().bidDesign.levels.map((level, i) =>
      i === index ? { ...level, ...change } : level,
    );
    this.patch({ bidDesign: { levels } });
  }

  protected removeLevel(index: number): void {
    this.patch({
      bidDesign: { levels: this.block().bidDesign.levels.filter((_, i) => i !== index) },
    });
  }

  protected addLevel(): void {
    const levels = this.block().bidDesign.levels;
    const bidMinor = (levels.at(-1)?.bidMinor ?? 0) + 100;
    const level = this.block().bounds === 'double' ? withFollowUps({ bidMinor }) : { bidMinor };
    this.patch({ bidDesign: { levels: [...levels, level] } });
  }
}

/** Default follow-ups: double the bid after a yes, half of it after a no. */
function withFollowUps(level: BidLevel): BidLevel {
  return {
    bidMinor: level.bidMinor,
    afterYesMinor: level.afterYesMinor ?? level.bidMinor * 2,
    afterNoMinor: level.afterNoMinor ?? Math.max(1, Math.floor(level.bidMinor / 2)),
  };
}
