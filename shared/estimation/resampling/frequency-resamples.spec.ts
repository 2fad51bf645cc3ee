import { frequencyResamples } from './frequency-resamples';
import { binomialDraw } from '../random/binomial-draw';

describe('frequencyResamples', () => {
  it('draws every resample to the table total, the same way for the same seed', () => {
    const counts = [500_000, 1, 0, 250_000, 249_999];
    const a = frequencyResamples(counts, (d) => [...d], 50, 9);
    const b = frequencyResamples(counts, (d) => [...d], 50, 9);
    expect(b).toEqual(a);
    for (const drawn of a) {
      expect(drawn![2]).toBe(0);
      // exact arithmetic: the cells of one resample add up to the 1,000,000 respondents drawn.
      expect(drawn!.reduce((s, v) => s + v, 0)).toBe(1_000_000);
    }
  });

  it('gives each cell the multinomial mean and variance n·p and n·p·(1 − p)', () => {
    // A cell of 30 respondents in 100: mean 30, variance 100·0.3·0.7 = 21 (binomial moments,
    // handbook formula); 4,000 resamples put the sample mean within about 0.07 of 30.
    const counts = [20, 30, 50];
    const draws = frequencyResamples(counts, (d) => d[1], 4000, 3) as number[];
    const mean = draws.reduce((s, v) => s + v, 0) / draws.length;
    const variance = draws.reduce((s, v) => s + (v - mean) ** 2, 0) / (draws.length - 1);
    expect(Math.abs(mean - 30)).toBeLessThan(0.3);
    expect(Math.abs(variance - 21)).toBeLessThan(2);
  });
});

describe('binomialDraw', () => {
  it.each([
    [30, 0.3],
    [1000, 0.3],
    [1_000_000, 0.01],
  ])('has the binomial mean n·p and variance n·p·(1 − p) at n = %d, p = %d', (n, p) => {
    // Binomial moments (handbook formula); 20,000 draws hold the sample mean within 4 standard
    // errors and the variance within 5 % of the truth.
    const draw = binomialDraw(17);
    const draws = Array.from({ length: 20_000 }, () => draw(n, p));
    const mean = draws.reduce((s, v) => s + v, 0) / draws.length;
    const variance = draws.reduce((s, v) => s + (v - mean) ** 2, 0) / (draws.length - 1);
    const sd = Math.sqrt(n * p * (1 - p));
    expect(Math.abs(mean - n * p)).toBeLessThan((4 * sd) / Math.sqrt(draws.length));
    expect(Math.abs(variance / (sd * sd) - 1)).toBeLessThan(0.05);
    expect(draws.every((x) => Number.isInteger(x) && x >= 0 && x <= n)).toBe(true);
  });
});
