import type { ChartConfiguration } from 'chart.js';
import type { RouteProgress } from '@shared/routes/route-progress';

type BarData = ChartConfiguration<'bar'>['data'];

/** Colours from the app's palette (ink teal, amber) with enough contrast on white. */
const colours = {
  quota: '#b5cace',
  completed: '#2d666f',
  accepted: '#00363c',
  flagged: '#c98a12',
} as const;

/** One group of bars per route: the quota, then completed, accepted and flagged interviews. */
export function progressChartData(routes: readonly RouteProgress[]): BarData {
  const series = (key: keyof typeof colours, label: string) => ({
    label,
    data: routes.map((route) => route[key]),
    backgroundColor: colours[key],
    borderRadius: 4,
  });
  return {
    labels: routes.map((route) => route.name),
    datasets: [
      series('quota', 'Quota'),
      series('completed', 'Completed'),
      series('accepted', 'Accepted'),
      series('flagged', 'Flagged'),
    ],
  };
}

/** A sentence for screen readers; the table beside the chart has every number too. */
export function progressChartSummary(routes: readonly RouteProgress[]): string {
  if (routes.length === 0) return 'No routes yet.';
  const parts = routes.map(
    (r) =>
      `${r.name}: ${r.completed} of ${r.quota} completed, ${r.accepted} accepted, ${r.flagged} flagged`,
  );
  return `Interviews against quota per route. ${parts.join('; ')}.`;
}
