import { ChangeDetectionStrategy, Component, computed, input, output } from '@angular/core';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import type { Block } from '@shared/questionnaire/block';
import { blockKindLabels } from '@shared/questionnaire/block-kind';
import {
  type SkipCondition,
  type SkipTest,
  skipTestLabels,
} from '@shared/questionnaire/skip-condition';
import { skipTestsFor, skipValuesFor } from '@shared/questionnaire/skip-targets';
import { NumberField } from '../fields/number-field';

function labelledValues(block: Block): readonly { value: string; label: string }[] {
  switch (block.kind) {
    case 'single-choice':
    case 'multiple-choice':
      return block.options;
    case 'income-band':
      return block.bands;
    case 'dichotomous-choice':
      return [
        { value: 'yes', label: 'Yes at the first bid' },
        { value: 'no', label: 'No at the first bid' },
      ];
    default:
      return [];
  }
}

/**
 * "Ask only if…": picks an earlier block, a test that block can answer, and the value to
 * compare with — only combinations the shared rules accept are offered.
 */
@Component({
  selector: 'app-skip-condition-settings',
  imports: [MatCheckbox, MatFormFieldModule, MatSelectModule, NumberField],
  templateUrl: './skip-condition-settings.html',
  styles: `
    :host {
      display: grid;
      gap: 8px;
    }
    mat-form-field {
      width: 100%;
    }
    .skip__hint {
      margin: -4px 0 0 40px;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SkipConditionSettings {
  readonly condition = input<SkipCondition | undefined>();
  /** The blocks before this one: the only ones a condition may look at. */
  readonly earlier = input.required<readonly Block[]>();
  readonly readOnly = input(false);
  readonly conditionChange = output<SkipCondition | undefined>();

  protected readonly kindLabels = blockKindLabels;
  protected readonly testLabels = skipTestLabels;
  protected readonly targets = computed(() =>
    this.earlier().filter((b) => skipTestsFor(b).length > 0),
  );
  protected readonly target = computed(() =>
    this.earlier().find((b) => b.id === this.condition()?.blockId),
  );
  protected readonly tests = computed(() => {
    const target = this.target();
    return target ? skipTestsFor(target) : [];
  });
  protected readonly values = computed(() => {
    const target = this.target();
    return target ? skipValuesFor(target) : null;
  });
  /** The values with the words the respondent hears, where the block has them. */
  protected readonly valueChoices = computed(() => {
    const target = this.target();
    const labelled = target ? labelledValues(target) : [];
    return (this.values() ?? []).map((value) => ({
      value,
      label: labelled.find((choice) => choice.value === value)?.label ?? value,
    }));
  });
  protected readonly comparedValue = computed(() => {
    const condition = this.condition();
    return condition && 'value' in condition ? condition.value : undefined;
  });

  protected toggle(on: boolean): void {
    const first = this.targets().at(-1);
    this.conditionChange.emit(on && first ? { blockId: first.id, test: 'answered' } : undefined);
  }

  protected chooseTarget(blockId: string): void {
    this.conditionChange.emit({ blockId, test: 'answered' });
  }

  protected chooseTest(test: SkipTest): void {
    const blockId = this.condition()?.blockId ?? '';
    if (test === 'answered') return this.conditionChange.emit({ blockId, test });
    const values = this.values();
    const value = values ? (values[0] ?? '') : 0;
    if (test === 'less' || test === 'greater')
      return this.conditionChange.emit({ blockId, test, value: Number(value) || 0 });
    this.conditionChange.emit({ blockId, test, value });
  }

  protected chooseValue(value: string | number | undefined): void {
    const condition = this.condition();
    if (!condition || condition.test === 'answered') return;
    this.conditionChange.emit({ ...condition, value: value ?? '' } as SkipCondition);
  }
}
