import { CachedReport } from './cached-report';

describe('CachedReport', () => {
  it('runs the check once per period, sharing it between callers', async () => {
    let time = 0;
    let runs = 0;
    const cached = new CachedReport(
      () => Promise.resolve(++runs),
      15_000,
      () => time,
    );
    expect(await Promise.all([cached.current(), cached.current()])).toEqual([1, 1]);
    time = 14_999;
    expect(await cached.current()).toBe(1);
    time = 15_000;
    expect(await cached.current()).toBe(2);
  });

  it('does not keep a failed check', async () => {
    let fail = true;
    const cached = new CachedReport(() =>
      fail ? Promise.reject(new Error('down')) : Promise.resolve('up'),
    );
    await expect(cached.current()).rejects.toThrow('down');
    fail = false;
    expect(await cached.current()).toBe('up');
  });
});
