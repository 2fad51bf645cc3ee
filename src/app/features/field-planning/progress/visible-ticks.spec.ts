import { visibleTicks } from './visible-ticks';

/** Just enough of a document: a visibility state to flip and its change event. */
class FakeDocument extends EventTarget {
  visibilityState: DocumentVisibilityState = 'visible';

  hide(): void {
    this.visibilityState = 'hidden';
    this.dispatchEvent(new Event('visibilitychange'));
  }

  show(): void {
    this.visibilityState = 'visible';
    this.dispatchEvent(new Event('visibilitychange'));
  }
}

describe('visibleTicks', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('ticks at once and every period while visible, not while hidden, and on coming back', () => {
    const page = new FakeDocument();
    let ticks = 0;
    const subscription = visibleTicks(page as unknown as Document, 15_000).subscribe(
      () => (ticks += 1),
    );
    vi.advanceTimersByTime(0);
    expect(ticks).toBe(1);
    vi.advanceTimersByTime(30_000);
    expect(ticks).toBe(3);
    page.hide();
    vi.advanceTimersByTime(60_000);
    expect(ticks).toBe(3);
    page.show();
    expect(ticks).toBe(4);
    subscription.unsubscribe();
  });
});
