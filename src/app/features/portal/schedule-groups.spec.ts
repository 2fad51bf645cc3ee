import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { groupByStudy } from './schedule-groups';

function version(
  studyId: string,
  studyName: string,
  n: number,
  replacedById: string | null = null,
): ScheduleVersionSummary {
  return {
    id: `0000000${n}-0000-4000-8000-${studyId.padStart(12, '0')}`,
    studyId,
    studyName,
    productName: 'Solar lantern',
    version: n,
    title: `Schedule ${n}`,
    replacesId: null,
    replacedById,
    fitId: '9b1e5c2a-3f4d-4e6f-8a7b-1c2d3e4f5a6b',
    method: 'price-ladder',
    methodLabel: 'Price ladder (Gabor–Granger)',
    currency: 'KES',
    n: 120,
    dataHash: 'a'.repeat(64),
    publishedAt: '2026-11-20T10:00:00.000Z',
    publishedByName: 'Mei Arkwright',
  };
}

describe('groupByStudy', () => {
  it('groups by study in name order, current versions apart from replaced ones, newest first', () => {
    const groups = groupByStudy([
      version('2', 'Water filters, Reedbank', 1),
      version('1', 'Lanterns, Lakeshore', 1, 'replaced-by-2'),
      version('1', 'Lanterns, Lakeshore', 2),
      version('1', 'Lanterns, Lakeshore', 3),
    ]);
    expect(groups.map((g) => g.studyName)).toEqual([
      'Lanterns, Lakeshore',
      'Water filters, Reedbank',
    ]);
    expect(groups[0].current.map((v) => v.version)).toEqual([3, 2]);
    expect(groups[0].replaced.map((v) => v.version)).toEqual([1]);
    expect(groups[1].current).toHaveLength(1);
  });

  it('shows only the newest of two versions in force that share a title as current', () => {
    const [group] = groupByStudy([
      { ...version('1', 'Lanterns, Lakeshore', 1), title: 'Lantern demand' },
      { ...version('1', 'Lanterns, Lakeshore', 2), title: 'Lantern demand' },
    ]);
    expect(group.current.map((v) => v.version)).toEqual([2]);
    expect(group.replaced.map((v) => v.version)).toEqual([1]);
  });

  it('gives no groups when nothing is published', () => {
    expect(groupByStudy([])).toEqual([]);
  });
});
