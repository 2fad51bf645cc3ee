import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { schedulePublishedMail } from './schedule-published-mail';

const version = (number: number, replacesId: string | null) =>
  ({
    version: number,
    replacesId,
    title: 'Lantern purchase share',
    studyName: 'Lamp study',
    productName: 'Solar lantern',
    publishedByName: 'Ruth Researcher',
    method: 'price-ladder',
    n: 231,
    currency: 'KES',
    confidenceLevel: 0.95,
  }) as unknown as ScheduleVersion;

const textOf = (v: ScheduleVersion, replacedVersion: number | null) =>
  schedulePublishedMail({
    to: { email: 'client@example.test', name: 'Cleo' },
    version: v,
    replacedVersion,
    link: 'http://localhost/reports/x',
  }).text;

describe('schedulePublishedMail', () => {
  it('calls version 1 the first version of the schedule', () => {
    expect(textOf(version(1, null), null)).toContain('It is the first version of this schedule.');
  });

  it('says which version a correction replaces', () => {
    const text = textOf(version(2, 'b1f2c3d4-0000-4000-8000-000000000001'), 1);
    expect(text).toContain('has published version 2 of a demand schedule');
    expect(text).toContain('It replaces version 1, which stays available for reference.');
    expect(text).not.toContain('first version');
  });

  it('never calls a later version that replaces none the first version', () => {
    const text = textOf(version(3, null), null);
    expect(text).not.toContain('first version');
    expect(text).toContain('It starts a new schedule for this study');
  });
});
