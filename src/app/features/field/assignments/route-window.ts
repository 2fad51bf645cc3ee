import type { FieldRoute } from '@shared/routes/field-route';

/** Where today falls against a route's dates: before them, within them, or past them. */
export type RouteWindowState = 'ahead' | 'open' | 'ended';

/** The device's local calendar day as `YYYY-MM-DD`: a route's dates are local days too. */
export function localDay(now: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** Whether a route's window is ahead, open or over on `today`; its last day still counts as open. */
export function routeWindowState(
  route: Pick<FieldRoute, 'windowStart' | 'windowEnd'>,
  today: string,
): RouteWindowState {
  if (today > route.windowEnd) return 'ended';
  if (today < route.windowStart) return 'ahead';
  return 'open';
}
