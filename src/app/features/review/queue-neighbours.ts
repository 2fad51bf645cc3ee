import type { ReviewQueueItem } from '@shared/field-sync/review-queue';

export interface QueueNeighbours {
  previous: { id: string; at: number } | null;
  next: { id: string; at: number } | null;
}

/** The offset of the three-item window around place `at` of the filtered list. */
export const neighbourWindowOffset = (at: number) => Math.max(at - 1, 0);

/**
 * The interviews before and after the one at place `at`, from a window of the filtered list that
 * starts at `neighbourWindowOffset(at)`. A decision may have taken the current interview out of
 * the list (a status filter); the one now at its place is then the next.
 */
export function queueNeighbours(
  window: readonly ReviewQueueItem[],
  at: number,
  currentId: string,
): QueueNeighbours {
  const offset = neighbourWindowOffset(at);
  const here = at - offset;
  const place = (index: number) => {
    const item = window[index];
    return item && item.id !== currentId ? { id: item.id, at: offset + index } : null;
  };
  const stillHere = window[here]?.id === currentId;
  return {
    previous: here > 0 ? place(here - 1) : null,
    next: stillHere ? place(here + 1) : window[here] ? { id: window[here].id, at } : null,
  };
}
