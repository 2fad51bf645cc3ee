import { Observable, filter, fromEvent, merge, timer } from 'rxjs';

/**
 * Ticks at once, then every `periodMs` while the page is visible, and again the moment it becomes
 * visible: a page left in a background tab asks the server nothing.
 */
export function visibleTicks(document: Document, periodMs: number): Observable<unknown> {
  const visible = () => document.visibilityState === 'visible';
  return merge(
    timer(0, periodMs).pipe(filter(visible)),
    fromEvent(document, 'visibilitychange').pipe(filter(visible)),
  );
}
