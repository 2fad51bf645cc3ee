import { ChangeDetectionStrategy, Component } from '@angular/core';
import type { LocationBlock } from '@shared/questionnaire/blocks/location-block';
import { NumberField } from '../fields/number-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Location: the GPS accuracy the device waits for. */
@Component({
  selector: 'app-location-settings',
  imports: [NumberField],
  template: `
    <app-number-field
      label="Accuracy to wait for"
      suffix="m"
      hint="A worse fix is still kept, with its accuracy"
      [value]="block().targetAccuracyMetres"
      [readOnly]="readOnly()"
      (valueChange)="patch({ targetAccuracyMetres: $any($event) })"
    />
  `,
  styles: settingsStyles,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LocationSettings extends KindSettings<LocationBlock> {}
