import { ChangeDetectionStrategy, Component } from '@angular/core';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIcon } from '@angular/material/icon';
import { MatInput } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { IncomeBand, IncomeBandBlock } from '@shared/questionnaire/blocks/income-band-block';
import { MoneyField } from '../fields/money-field';
import { KindSettings, settingsStyles } from './kind-settings';

/** Income band: the period, the bands with their bounds, and whether declining is allowed. */
@Component({
  selector: 'app-income-band-settings',
  imports: [
    MatButton,
    MatCheckbox,
    MatFormFieldModule,
    MatIcon,
    MatIconButton,
    MatInput,
    MatSelectModule,
    MoneyField,
  ],
  templateUrl: './income-band-settings.html',
  styles: `
    ${settingsStyles}
    .bands {
      list-style: none;
      margin: 0;
      padding: 0;
      display: grid;
      gap: 12px;
    }
    .band {
      display: grid;
      grid-template-columns: 1fr auto;
      gap: 4px 8px;
      padding: 8px;
      border: 1px solid var(--mat-sys-outline-variant);
      border-radius: 12px;
    }
    .band__fields {
      display: grid;
      gap: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class IncomeBandSettings extends KindSettings<IncomeBandBlock> {
  protected setBand(index: number, change: Partial<IncomeBand>): void {
    this.patch({
      bands: this.block().bands.map((band, i) => (i === index ? { ...band, ...change } : band)),
    });
  }

  protected removeBand(index: number): void {
    this.patch({ bands: this.block().bands.filter((_, i) => i !== index) });
  }

  /** A new open-ended band above the last, which gets closed where the new one starts. */
  protected addBand(): void {
    const bands = this.block().bands;
    const last = bands.at(-1);
    const from = last ? (last.toMinor ?? last.fromMinor * 2 + 100) : 0;
    const closed = bands.map((band, i) =>
      i === bands.length - 1 ? { ...band, toMinor: band.toMinor ?? from } : band,
    );
    const n = bands.length + 1;
    this.patch({ bands: [...closed, { value: `band-${n}`, label: `Band ${n}`, fromMinor: from }] });
  }
}
