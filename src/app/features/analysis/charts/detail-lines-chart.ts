import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { DetailTable } from '@shared/analysis/fit-result';
import { demandChartOptions } from './demand-chart-options';
import { detailLinesData } from './detail-lines-data';
import { LineChartCanvas } from './line-chart-canvas';

/**
 * A detail table drawn as lines (the four threshold curves against price); the table under it
 * carries the same numbers for reading and for screen readers.
 */
@Component({
  selector: 'app-detail-lines-chart',
  imports: [LineChartCanvas],
  template: `
    <app-line-chart-canvas
      style="--chart-height: 300px"
      [data]="data()"
      [options]="options()"
      [summary]="summary()"
    />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DetailLinesChart {
  readonly table = input.required<DetailTable>();
  /** The study's currency, for the price axis. */
  readonly currency = input.required<string>();

  protected readonly data = computed(() => detailLinesData(this.table()));
  protected readonly options = computed(() => {
    const prices = this.table().rows.flatMap((row) => (typeof row[0] === 'number' ? [row[0]] : []));
    const span = prices.length ? { min: Math.min(...prices), max: Math.max(...prices) } : undefined;
    const options = demandChartOptions(
      { x: `${this.table().columns[0]} (${this.currency()})`, y: 'Share of respondents' },
      span,
    );
    return { ...options, scales: { ...options.scales, y: { ...options.scales!['y'], max: 1 } } };
  });
  protected readonly summary = computed(
    () =>
      `Chart of ${this.table().columns.slice(1).join(', ')} against ${this.table().columns[0].toLowerCase()}; the table below lists the same numbers.`,
  );
}
