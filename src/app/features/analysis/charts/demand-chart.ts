import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { BandedCurve } from './banded-curve';
import { demandChartData } from './demand-chart-data';
import { demandChartOptions, type AxisTitles } from './demand-chart-options';
import { LineChartCanvas } from './line-chart-canvas';

/**
 * One or more demand curves with their bands (and the first one's revenue when asked), drawn
 * with chart.js. The canvas has a text summary for screen readers; the tables beside every
 * chart carry the same numbers.
 */
@Component({
  selector: 'app-demand-chart',
  imports: [LineChartCanvas],
  template: `
    <figure class="chart">
      <app-line-chart-canvas [data]="data()" [options]="options()" [summary]="summary()" />
      @if (caption()) {
        <figcaption class="chart__caption">{{ caption() }}</figcaption>
      }
    </figure>
  `,
  styles: `
    .chart {
      margin: 0;
    }
    .chart__caption {
      margin-top: 8px;
      font: var(--mat-sys-body-small);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DemandChart {
  readonly curves = input.required<readonly BandedCurve[]>();
  readonly titles = input.required<AxisTitles>();
  readonly revenue = input(false);
  readonly caption = input('');

  protected readonly data = computed(() =>
    demandChartData(this.curves(), { revenue: this.revenue() }),
  );
  protected readonly options = computed(() => {
    const prices = this.curves().flatMap((curve) => curve.points.map((p) => p.price));
    const span = prices.length ? { min: Math.min(...prices), max: Math.max(...prices) } : undefined;
    const titles = this.revenue() ? this.titles() : { ...this.titles(), revenue: undefined };
    return demandChartOptions(titles, span);
  });
  protected readonly summary = computed(() => {
    const names = this.curves().map((c) => c.label);
    return `Chart of ${this.titles().y} against ${this.titles().x} for ${names.join(', ')}, each with its band.`;
  });
}
