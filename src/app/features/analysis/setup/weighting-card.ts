import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatMenuModule } from '@angular/material/menu';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggle } from '@angular/material/slide-toggle';
import type { WeightingSummary } from '@shared/analysis/fit-result';
import {
  rakingVariableLabels,
  rakingVariables,
  type RakingVariable,
} from '@shared/analysis/weighting-spec';
import type { FieldIssue } from '@shared/http/api-error';
import type { FitSetupValues, MarginRow } from './fit-setup-values';
import {
  knownLevels,
  notStatedChoice,
  targetTotals,
  withMarginFor,
  type LevelChoice,
} from './margin-rows';

/**
 * Raking to population margins: a table of levels and their population shares that the
 * researcher fills in, with the totals per variable and, once a weighted fit has run, the design
 * effect and effective sample size it produced.
 */
@Component({
  selector: 'app-weighting-card',
  imports: [
    DecimalPipe,
    FormsModule,
    MatButton,
    MatCardModule,
    MatFormFieldModule,
    MatIcon,
    MatIconButton,
    MatInput,
    MatMenuModule,
    MatSelectModule,
    MatSlideToggle,
  ],
  templateUrl: './weighting-card.html',
  styleUrls: ['./setup-card.scss', './weighting-card.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WeightingCard {
  readonly values = input.required<FitSetupValues>();
  readonly incomeBands = input.required<readonly LevelChoice[]>();
  readonly regions = input.required<readonly string[]>();
  readonly issues = input<readonly FieldIssue[]>([]);
  /** What raking did in the latest weighted fit, if there is one. */
  readonly summary = input<WeightingSummary | null>(null);
  readonly changed = output<Partial<FitSetupValues>>();

  protected readonly variables = rakingVariables;
  protected readonly variableLabels = rakingVariableLabels;
  protected readonly rows = computed(() => this.values().margins);
  protected readonly totals = computed(() => targetTotals(this.rows()));

  protected levelsOf(variable: RakingVariable): readonly LevelChoice[] {
    return [...knownLevels(variable, this.incomeBands(), this.regions()), notStatedChoice];
  }

  protected addMargin(variable: RakingVariable): void {
    const levels = knownLevels(variable, this.incomeBands(), this.regions());
    this.changed.emit({ weightingOn: true, margins: withMarginFor(this.rows(), variable, levels) });
  }

  protected addLevel(variable: RakingVariable): void {
    this.changed.emit({
      margins: [...this.rows(), { variable, level: '', targetPercent: null }],
    });
  }

  protected updateRow(index: number, change: Partial<MarginRow>): void {
    this.changed.emit({
      margins: this.rows().map((row, i) => (i === index ? { ...row, ...change } : row)),
    });
  }

  protected removeRow(index: number): void {
    this.changed.emit({ margins: this.rows().filter((_, i) => i !== index) });
  }
}
