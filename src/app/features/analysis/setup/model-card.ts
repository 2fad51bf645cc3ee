import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggle } from '@angular/material/slide-toggle';
import { analysisMethodLabels, analysisMethods } from '@shared/analysis/analysis-method';
import type { FieldIssue } from '@shared/http/api-error';
import type { FitSetupValues } from './fit-setup-values';
import {
  covariateChoices,
  formChoices,
  instrumentChoiceLabels,
  sourceChoices,
  standardErrorChoices,
} from './model-choices';

/** The method, its options, and the schedule's price grid, unit cost and confidence level. */
@Component({
  selector: 'app-model-card',
  imports: [
    FormsModule,
    MatCardModule,
    MatCheckbox,
    MatFormFieldModule,
    MatInput,
    MatSelectModule,
    MatSlideToggle,
  ],
  templateUrl: './model-card.html',
  styleUrl: './setup-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ModelCard {
  readonly values = input.required<FitSetupValues>();
  readonly currency = input.required<string>();
  readonly issues = input<readonly FieldIssue[]>([]);
  readonly changed = output<Partial<FitSetupValues>>();

  protected readonly methods = analysisMethods;
  protected readonly methodLabels = analysisMethodLabels;
  protected readonly forms = formChoices;
  protected readonly covariates = covariateChoices;
  protected readonly standardErrors = standardErrorChoices;
  protected readonly instruments = instrumentChoiceLabels;
  protected readonly sources = sourceChoices;

  protected toggleCovariate(value: FitSetupValues['covariates'][number], on: boolean): void {
    const others = this.values().covariates.filter((c) => c !== value);
    this.changed.emit({ covariates: on ? [...others, value] : others });
  }
}
