import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartOptions } from 'chart.js';
import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import type { PolicyIncidence } from '@shared/estimation/welfare/policy-incidence';
import type { SupplyCurve } from '@shared/estimation/welfare/supply-curve';
import { chartColours } from '../charts/chart-palette';
import { LineChartCanvas } from '../charts/line-chart-canvas';
import { policyChartData } from './policy-chart-data';
import type { PolicyKind } from './policy-simulation';

const font = { family: "'Fira Sans', system-ui, sans-serif", size: 13 };

/** Supply and demand with the policy's wedge and deadweight loss shaded. */
@Component({
  selector: 'app-policy-chart',
  imports: [LineChartCanvas],
  template: `
    <app-line-chart-canvas
      style="--chart-height: 380px"
      [data]="data()"
      [options]="options()"
      [summary]="summary()"
    />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PolicyChart {
  readonly demand = input.required<FittedDemandCurve>();
  readonly confidenceLevel = input.required<number>();
  readonly supply = input.required<SupplyCurve>();
  readonly result = input.required<PolicyIncidence>();
  readonly kind = input.required<PolicyKind>();
  readonly currency = input.required<string>();
  readonly quantityTitle = input.required<string>();

  protected readonly data = computed(() =>
    policyChartData(
      this.demand(),
      this.supply(),
      this.result(),
      this.kind(),
      this.confidenceLevel(),
    ),
  );
  protected readonly options = computed((): ChartOptions<'line'> => {
    const axis = (text: string) => ({
      type: 'linear' as const,
      title: { display: true, text, color: chartColours.text, font },
      ticks: { color: chartColours.text, font },
      grid: { color: chartColours.grid },
    });
    return {
      responsive: true,
      maintainAspectRatio: false,
      animation: false,
      parsing: false,
      scales: {
        x: { ...axis(this.quantityTitle()), min: 0 },
        y: { ...axis(`Price (${this.currency()})`), min: 0 },
      },
      plugins: {
        legend: { position: 'bottom', labels: { color: chartColours.text, font, boxWidth: 14 } },
        tooltip: { enabled: false },
      },
    };
  });
  protected readonly summary = computed(() => {
    const r = this.result();
    const demandLine = this.data().datasets.find((d) => d.label?.startsWith('Demand'))?.label;
    return (
      `Supply and demand chart: the market moves from price ${r.before.price.toFixed(2)} to a ` +
      `buyer price of ${r.buyerPrice.toFixed(2)} and a seller price of ${r.sellerPrice.toFixed(2)}; ` +
      `the shaded triangle is the deadweight loss. ${demandLine ?? ''}.`
    );
  });
}
