import { storableDay } from './storable-day';

describe('storableDay', () => {
  const day = storableDay('Write the day as YYYY-MM-DD');

  it('takes real days of years 1..9999', () => {
    expect(day.safeParse('2028-02-29').success).toBe(true);
    expect(day.safeParse('0001-01-01').success).toBe(true);
  });

  it('refuses year 0 and days that do not exist', () => {
    expect(day.safeParse('0000-06-01').error?.issues[0]?.message).toMatch(/between 1 and 9999/);
    expect(day.safeParse('2027-02-29').error?.issues[0]?.message).toBe(
      'Write the day as YYYY-MM-DD',
    );
  });
});
