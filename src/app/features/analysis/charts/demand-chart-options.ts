import type { ChartOptions, LegendItem } from 'chart.js';
import { chartColours } from './chart-palette';

/** Axis titles of a chart: what each axis measures, with units. */
export interface AxisTitles {
  readonly x: string;
  readonly y: string;
  /** Title of the right-hand revenue axis; no such axis when absent. */
  readonly revenue?: string;
}

const font = { family: "'Fira Sans', system-ui, sans-serif", size: 13 };

/** Band halves have no label of their own and stay out of the legend. */
export function legendKeeps(item: LegendItem): boolean {
  return item.text.length > 0;
}

function axis(title: string, position?: 'left' | 'right') {
  return {
    type: 'linear' as const,
    position,
    title: { display: true, text: title, color: chartColours.text, font },
    ticks: { color: chartColours.text, font },
    grid: { color: chartColours.grid },
  };
}

/**
 * Options shared by the demand, comparison and policy charts: linear axes with titles, a legend
 * without the band halves, and a tooltip that lists every curve at the hovered x.
 */
export function demandChartOptions(
  titles: AxisTitles,
  priceSpan?: { readonly min: number; readonly max: number },
): ChartOptions<'line'> {
  const scales: NonNullable<ChartOptions<'line'>['scales']> = {
    // The price axis ends where the curves do, not at the next round number beyond them.
    x: { ...axis(titles.x), ...(priceSpan ? { min: priceSpan.min, max: priceSpan.max } : {}) },
    y: { ...axis(titles.y, 'left'), beginAtZero: true },
  };
  if (titles.revenue) {
    scales['revenue'] = {
      ...axis(titles.revenue, 'right'),
      beginAtZero: true,
      grid: { drawOnChartArea: false },
    };
  }
  return {
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    parsing: false,
    normalized: true,
    interaction: { mode: 'nearest', axis: 'x', intersect: false },
    scales,
    plugins: {
      legend: {
        position: 'bottom',
        labels: { filter: legendKeeps, color: chartColours.text, font, boxWidth: 14 },
      },
      tooltip: { filter: (item) => item.dataset.label !== '' },
    },
  };
}
