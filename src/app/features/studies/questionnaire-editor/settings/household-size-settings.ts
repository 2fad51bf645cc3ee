import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { HouseholdSizeBlock } from '@shared/questionnaire/blocks/household-size-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Household size: the largest household the device accepts. */
@Component({
  selector: 'app-household-size-settings',
  imports: [NumberField],
  template: `
    <app-number-field
      label="Largest household"
      suffix="people"
      [value]="block().maxPeople"
      [readOnly]="readOnly()"
      (valueChange)="patch({ maxPeople: $any($event) })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HouseholdSizeSettings extends KindSettings<HouseholdSizeBlock> {}
