import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { currentVersionIds } from './current-versions';

const v = (id: string, version: number, title: string, replacedById: string | null = null) =>
  ({ id, version, title, replacedById }) as ScheduleVersionSummary;

describe('currentVersionIds', () => {
  it('marks only the newest of two versions in force under one title', () => {
    const ids = currentVersionIds([v('a', 1, 'Lantern demand'), v('b', 2, 'Lantern demand ')]);
    expect([...ids]).toEqual(['b']);
  });

  it('keeps separate schedules current and a replaced version out', () => {
    const ids = currentVersionIds([
      v('a', 1, 'Ladder', 'c'),
      v('b', 2, 'Shelf demand'),
      v('c', 3, 'Ladder'),
    ]);
    expect([...ids].sort()).toEqual(['b', 'c']);
  });
});
