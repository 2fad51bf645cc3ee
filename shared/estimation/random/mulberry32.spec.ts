import { gaussian } from './gaussian';
import { mulberry32 } from './mulberry32';

describe('mulberry32', () => {
  it('repeats its sequence for the same seed and differs for another', () => {
    const a = mulberry32(42);
    const b = mulberry32(42);
    const c = mulberry32(43);
    const first = Array.from({ length: 5 }, a);
    expect(Array.from({ length: 5 }, b)).toEqual(first);
    expect(Array.from({ length: 5 }, c)).not.toEqual(first);
  });

  it('stays in [0, 1) with mean ½ and variance 1/12 (uniform moments, common practice)', () => {
    const next = mulberry32(7);
    const draws = Array.from({ length: 100_000 }, next);
    const mean = draws.reduce((s, u) => s + u, 0) / draws.length;
    const variance = draws.reduce((s, u) => s + (u - mean) ** 2, 0) / draws.length;
    expect(Math.min(...draws)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...draws)).toBeLessThan(1);
    expect(Math.abs(mean - 0.5)).toBeLessThan(0.005); // ≈ 5 standard errors
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.002);
  });
});

describe('gaussian', () => {
  it('draws mean 0, variance 1 and 95 % within ±1.96 (standard normal, common practice)', () => {
    const next = gaussian(mulberry32(11));
    const draws = Array.from({ length: 100_000 }, next);
    const mean = draws.reduce((s, z) => s + z, 0) / draws.length;
    const variance = draws.reduce((s, z) => s + (z - mean) ** 2, 0) / draws.length;
    const inside = draws.filter((z) => Math.abs(z) < 1.959963984540054).length / draws.length;
    expect(Math.abs(mean)).toBeLessThan(0.02);
    expect(Math.abs(variance - 1)).toBeLessThan(0.02);
    expect(Math.abs(inside - 0.95)).toBeLessThan(0.005);
  });
});
