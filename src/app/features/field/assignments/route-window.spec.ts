import { localDay, routeWindowState } from './route-window';

const november = { windowStart: '2026-11-02', windowEnd: '2026-11-28' };

describe('routeWindowState', () => {
  it('calls a route ended once its last day has passed', () => {
    expect(routeWindowState(november, '2026-12-02')).toBe('ended');
    expect(routeWindowState(november, '2026-11-29')).toBe('ended');
  });

  it('keeps a route open on its first and last day', () => {
    expect(routeWindowState(november, '2026-11-02')).toBe('open');
    expect(routeWindowState(november, '2026-11-28')).toBe('open');
  });

  it('calls a route ahead before its first day', () => {
    expect(routeWindowState(november, '2026-11-01')).toBe('ahead');
  });

  it('reads today as the device’s local day, not the UTC one', () => {
    expect(localDay(new Date(2026, 11, 2, 23, 30))).toBe('2026-12-02');
    expect(localDay(new Date(2026, 0, 5, 0, 15))).toBe('2026-01-05');
  });
});
