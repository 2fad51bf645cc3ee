import { reviewQueueQuerySchema, type ReviewQueueQuery } from '@shared/field-sync/review-queue';

/** What the review queue shows, as kept in the page's address so it survives reloads and links. */
export type QueueFilter = Omit<ReviewQueueQuery, 'limit' | 'offset'>;

/** The filter fields, in the order the address lists them. */
export const queueFilterKeys = [
  'status',
  'flag',
  'enumeratorId',
  'routeId',
  'pointId',
  'from',
  'to',
  'reference',
  'sort',
] as const satisfies readonly (keyof QueueFilter)[];

export const queuePageSize = 50;

/**
 * Reads a filter from query parameters, keeping each value the API would accept and dropping
 * the others (an address edited by hand must not break the page).
 */
export function filterFromParams(
  params: Readonly<Record<string, string | undefined>>,
): QueueFilter {
  const kept: Record<string, string> = {};
  for (const key of queueFilterKeys) {
    const value = params[key];
    if (value === undefined || value === '') continue;
    if (reviewQueueQuerySchema.safeParse({ ...kept, [key]: value }).success) kept[key] = value;
  }
  const filter: QueueFilter = reviewQueueQuerySchema.parse(kept);
  delete (filter as Partial<ReviewQueueQuery>).limit;
  delete (filter as Partial<ReviewQueueQuery>).offset;
  // The reference is kept as typed, so the search box shows what the person wrote.
  return kept['reference'] === undefined ? filter : { ...filter, reference: kept['reference'] };
}

/** The query parameters of a filter; empty fields are left out. */
export function filterToParams(filter: QueueFilter): Record<string, string> {
  const params: Record<string, string> = {};
  for (const key of queueFilterKeys) {
    const value = filter[key];
    if (value !== undefined && value !== '') params[key] = String(value);
  }
  return params;
}

/** The page number in the address (1-based), or the first page. */
export function pageFromParams(params: Readonly<Record<string, string | undefined>>): number {
  const page = Number(params['page']);
  return Number.isInteger(page) && page >= 1 ? page : 1;
}
