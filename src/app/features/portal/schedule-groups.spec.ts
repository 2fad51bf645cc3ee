import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { groupByStudy } from './schedule-groups';

const idOf = (studyId: string, n: number) =>
  `0000000${n}-0000-4000-8000-${studyId.padStart(12, '0')}`;

function version(
  studyId: string,
  studyName: string,
  n: number,
  replacedBy: number | null = null,
): ScheduleVersionSummary {
  return {
    id: idOf(studyId, n),
    studyId,
    studyName,
    productName: 'Solar lantern',
    version: n,
    title: `Schedule ${n}`,
    replacesId: null,
    replacedById: replacedBy === null ? null : idOf(studyId, replacedBy),
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

const titled = (title: string, v: ScheduleVersionSummary) => ({ ...v, title });

describe('groupByStudy', () => {
  it('groups by study in name order, current versions apart from earlier ones, newest first', () => {
    const groups = groupByStudy([
      version('2', 'Water filters, Reedbank', 1),
      version('1', 'Lanterns, Lakeshore', 1, 3),
      version('1', 'Lanterns, Lakeshore', 2),
      version('1', 'Lanterns, Lakeshore', 3),
    ]);
    expect(groups.map((g) => g.studyName)).toEqual([
      'Lanterns, Lakeshore',
      'Water filters, Reedbank',
    ]);
    expect(groups[0].current.map((v) => v.version)).toEqual([3, 2]);
    expect(groups[0].earlier.map((e) => [e.version.version, e.newer.version, e.corrected])).toEqual(
      [[1, 3, true]],
    );
    expect(groups[1].current).toHaveLength(1);
    expect(groups[1].earlier).toEqual([]);
  });

  it('keeps an older version of another title current, even though nothing replaced it', () => {
    const [group] = groupByStudy([
      titled('Lantern demand', version('1', 'Lanterns, Lakeshore', 1)),
      titled('Shelf prices', version('1', 'Lanterns, Lakeshore', 2)),
    ]);
    expect(group.current.map((v) => v.version)).toEqual([2, 1]);
    expect(group.earlier).toEqual([]);
  });

  it('lists the older of two versions under one title as earlier, naming the newer one', () => {
    const [group] = groupByStudy([
      titled('Lantern demand', version('1', 'Lanterns, Lakeshore', 1)),
      titled('Lantern demand ', version('1', 'Lanterns, Lakeshore', 2)),
    ]);
    expect(group.current.map((v) => v.version)).toEqual([2]);
    expect(group.earlier.map((e) => [e.version.version, e.newer.version, e.corrected])).toEqual([
      [1, 2, false],
    ]);
  });

  it('names the version in force, not a replaced one, as the newer of the same title', () => {
    const [group] = groupByStudy([
      titled('Lantern demand', version('1', 'Lanterns, Lakeshore', 1)),
      titled('Lantern demand', version('1', 'Lanterns, Lakeshore', 2)),
      titled('Lantern demand', version('1', 'Lanterns, Lakeshore', 3, 4)),
      titled('Lantern demand, corrected', version('1', 'Lanterns, Lakeshore', 4)),
    ]);
    expect(group.current.map((v) => v.version)).toEqual([4, 2]);
    expect(group.earlier.map((e) => [e.version.version, e.newer.version])).toEqual([
      [3, 4],
      [1, 2],
    ]);
  });

  it('keeps a version current when the correction it names is not among the versions', () => {
    const [group] = groupByStudy([version('1', 'Lanterns, Lakeshore', 1, 9)]);
    expect(group.current.map((v) => v.version)).toEqual([1]);
    expect(group.earlier).toEqual([]);
  });

  it('gives no groups when nothing is published', () => {
    expect(groupByStudy([])).toEqual([]);
  });
});
