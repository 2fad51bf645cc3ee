import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { ChartData, ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { XY } from './demand-chart-data';

/**
 * The canvas every line chart of the analysis draws on: chart.js through ng2-charts, sized by
 * `--chart-height` (340 px unless the host sets it), with `summary` as the image's text for
 * screen readers.
 */
@Component({
  selector: 'app-line-chart-canvas',
  imports: [BaseChartDirective],
  template: `
    <div class="line-chart">
      <canvas
        baseChart
        type="line"
        role="img"
        [attr.aria-label]="summary()"
        [data]="data()"
        [options]="options()"
      ></canvas>
    </div>
  `,
  styles: `
    .line-chart {
      position: relative;
      height: var(--chart-height, 340px);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LineChartCanvas {
  readonly data = input.required<ChartData<'line', XY[]>>();
  readonly options = input.required<ChartOptions<'line'>>();
  readonly summary = input.required<string>();
}
