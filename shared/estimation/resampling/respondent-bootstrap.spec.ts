import { mulberry32 } from '../random/mulberry32';
import { respondentBootstrap } from './respondent-bootstrap';

const mean = (values: readonly number[]) => values.reduce((s, v) => s + v, 0) / values.length;

describe('respondentBootstrap (percentile bootstrap, common practice)', () => {
  const random = mulberry32(9);
  const values = Array.from({ length: 400 }, () => random() * 100);

  it('puts the interval of a mean where the normal approximation does', () => {
    const { m } = respondentBootstrap(values, ['m'], (s) => ({ m: mean(s) }), 0.95, 2000);
    const centre = mean(values);
    const sd = Math.sqrt(values.reduce((s, v) => s + (v - centre) ** 2, 0) / (values.length - 1));
    const half = (1.959964 * sd) / Math.sqrt(values.length); // z(0.975), from memory
    expect(m.ciLow!).toBeCloseTo(centre - half, 0);
    expect(m.ciHigh!).toBeCloseTo(centre + half, 0);
  });

  it('repeats itself for the same answers', () => {
    const once = respondentBootstrap(values, ['m'], (s) => ({ m: mean(s) }), 0.9);
    expect(respondentBootstrap(values, ['m'], (s) => ({ m: mean(s) }), 0.9)).toEqual(once);
  });

  it('withholds the interval of a figure that too many resamples do not have', () => {
    let calls = 0;
    const result = respondentBootstrap(
      values,
      ['often', 'rarely'],
      (s) => {
        calls++;
        if (calls % 5 === 0) throw new Error('refused');
        return { often: mean(s), rarely: calls % 2 === 0 ? mean(s) : null };
      },
      0.95,
    );
    // 80% of resamples give `often` a value and about 40% `rarely`: both fall below 90%.
    expect(result.often).toEqual({ ciLow: null, ciHigh: null });
    expect(result.rarely).toEqual({ ciLow: null, ciHigh: null });
    const kept = respondentBootstrap(
      values,
      ['m'],
      (s) => ({ m: s.length > 0 ? mean(s) : null }),
      0.95,
    );
    expect(kept.m.ciLow).not.toBeNull();
  });
});
