import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartConfiguration } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { RouteProgress } from '@shared/routes/route-progress';
import { progressChartData, progressChartSummary } from './progress-chart-data';

const options: ChartConfiguration<'bar'>['options'] = {
  indexAxis: 'y',
  responsive: true,
  maintainAspectRatio: false,
  animation: false,
  scales: {
    x: { beginAtZero: true, ticks: { precision: 0 }, title: { display: true, text: 'Interviews' } },
  },
  plugins: { legend: { position: 'bottom' } },
};

/** Horizontal bars per route (long names stay readable on a phone): quota against the counts. */
@Component({
  selector: 'app-progress-chart',
  imports: [BaseChartDirective],
  template: `
    <div class="progress-chart" [style.height.px]="height()">
      <canvas
        baseChart
        type="bar"
        role="img"
        [attr.aria-label]="summary()"
        [data]="data()"
        [options]="options"
      ></canvas>
    </div>
  `,
  styles: `
    .progress-chart {
      position: relative;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgressChart {
  readonly routes = input.required<readonly RouteProgress[]>();

  protected readonly options = options;
  protected readonly data = computed(() => progressChartData(this.routes()));
  protected readonly summary = computed(() => progressChartSummary(this.routes()));
  protected readonly height = computed(() => 110 + 90 * Math.max(1, this.routes().length));
}
