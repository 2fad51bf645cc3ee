import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { BandedCurve } from '../charts/banded-curve';
import { seriesColour } from '../charts/chart-palette';
import { demandChartData } from '../charts/demand-chart-data';
import { demandChartOptions, type AxisTitles } from '../charts/demand-chart-options';
import { LineChartCanvas } from '../charts/line-chart-canvas';
import { levelLabel } from '../figures/figure-format';

/** One entry of the legend under the chart: the curve's colour, name and band. */
export interface ComparisonLegendItem {
  readonly label: string;
  readonly colour: string;
  readonly band: string | null;
}

/** Legend entries in drawing order; the colours are the ones the chart data gives each curve. */
export function comparisonLegend(curves: readonly BandedCurve[]): ComparisonLegendItem[] {
  return curves.map((curve, i) => ({
    label: curve.label,
    colour: seriesColour(i),
    band: curve.points.some((p) => p.low !== null && p.high !== null)
      ? `${levelLabel(curve.confidenceLevel)} band`
      : null,
  }));
}

/**
 * Several demand curves with their bands on a tall plot. The legend is HTML under the canvas,
 * one entry per curve rather than two (estimate and band): drawn inside the canvas, six curves'
 * twelve entries took more height than the plot itself.
 */
@Component({
  selector: 'app-comparison-chart',
  imports: [LineChartCanvas],
  template: `
    <figure class="comparison">
      <app-line-chart-canvas
        class="comparison__plot"
        [data]="data()"
        [options]="options()"
        [summary]="summary()"
      />
      <figcaption>
        <ul class="comparison__legend" aria-label="Curves on the chart">
          @for (item of legend(); track $index) {
            <li>
              <span class="comparison__swatch" [style.background]="item.colour"></span>
              {{ item.label }}
              @if (item.band) {
                <span class="comparison__band">· {{ item.band }} shaded</span>
              }
            </li>
          }
        </ul>
        <p class="comparison__note">
          Dashed where a curve reaches beyond the prices it was fitted on.
        </p>
      </figcaption>
    </figure>
  `,
  styles: `
    .comparison {
      margin: 0;
    }
    .comparison__plot {
      --chart-height: clamp(300px, 55vh, 460px);
    }
    .comparison__legend {
      display: flex;
      flex-wrap: wrap;
      gap: 4px 16px;
      list-style: none;
      margin: 12px 0 0;
      padding: 0;
      font: var(--mat-sys-body-small);
    }
    .comparison__legend li {
      display: inline-flex;
      align-items: center;
      gap: 6px;
    }
    .comparison__swatch {
      width: 14px;
      height: 4px;
      border-radius: 2px;
      flex: none;
    }
    .comparison__band,
    .comparison__note {
      color: var(--mat-sys-on-surface-variant);
    }
    .comparison__note {
      margin: 4px 0 0;
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ComparisonChart {
  readonly curves = input.required<readonly BandedCurve[]>();
  readonly titles = input.required<AxisTitles>();

  protected readonly data = computed(() => demandChartData(this.curves()));
  protected readonly legend = computed(() => comparisonLegend(this.curves()));
  protected readonly options = computed(() => {
    const prices = this.curves().flatMap((curve) => curve.points.map((p) => p.price));
    const span = prices.length ? { min: Math.min(...prices), max: Math.max(...prices) } : undefined;
    const options = demandChartOptions({ ...this.titles(), revenue: undefined }, span);
    return { ...options, plugins: { ...options.plugins, legend: { display: false } } };
  });
  protected readonly summary = computed(() => {
    const names = this.curves().map((c) => c.label);
    return `Chart of ${this.titles().y} against ${this.titles().x} for ${names.join(', ')}, each with its band.`;
  });
}
