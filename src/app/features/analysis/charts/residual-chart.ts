import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartData, ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import { chartColours, withAlpha } from './chart-palette';
import type { XY } from './demand-chart-data';

/** A residual as the fit result lists it. */
export interface ResidualPoint {
  readonly fitted: number;
  readonly residual: number;
}

/** Residuals against fitted values, with the zero line: a shapeless cloud is what one hopes for. */
export function residualChartData(points: readonly ResidualPoint[]): ChartData<'scatter', XY[]> {
  const xs = points.map((p) => p.fitted);
  const zero = xs.length ? [Math.min(...xs), Math.max(...xs)] : [0, 1];
  return {
    datasets: [
      {
        label: 'Residual',
        data: points.map((p) => ({ x: p.fitted, y: p.residual })),
        backgroundColor: withAlpha(chartColours.ink, 0.55),
        pointRadius: 3,
      },
      {
        label: 'Zero',
        type: 'line' as 'scatter',
        data: zero.map((x) => ({ x, y: 0 })),
        borderColor: chartColours.amber,
        borderWidth: 1.5,
        pointRadius: 0,
        showLine: true,
      },
    ],
  };
}

const options: ChartOptions<'scatter'> = {
  responsive: true,
  maintainAspectRatio: false,
  animation: false,
  scales: {
    x: { title: { display: true, text: 'Fitted value (model scale)' } },
    y: { title: { display: true, text: 'Residual' } },
  },
  plugins: { legend: { display: false } },
};

/** The residual diagnostics plot of a regression fit. */
@Component({
  selector: 'app-residual-chart',
  imports: [BaseChartDirective],
  template: `
    <div class="residuals">
      <canvas
        baseChart
        type="scatter"
        role="img"
        [attr.aria-label]="summary()"
        [data]="data()"
        [options]="options"
      ></canvas>
    </div>
  `,
  styles: `
    .residuals {
      position: relative;
      height: 260px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ResidualChart {
  readonly points = input.required<readonly ResidualPoint[]>();
  protected readonly options = options;
  protected readonly data = computed(() => residualChartData(this.points()));
  protected readonly summary = computed(
    () => `Scatter of ${this.points().length} residuals against fitted values, around zero.`,
  );
}
