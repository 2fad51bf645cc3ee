import { isStorableInstant, storableInstant } from './storable-instant';

describe('storable instants', () => {
  it('takes instants whose UTC year is 1..9999', () => {
    expect(isStorableInstant('2027-03-01T09:30:00+03:00')).toBe(true);
    expect(isStorableInstant('0001-01-01T00:00:00Z')).toBe(true);
    expect(isStorableInstant('9999-12-31T23:59:59Z')).toBe(true);
  });

  it('refuses year 0, and offsets that carry the instant out of range', () => {
    expect(isStorableInstant('0000-01-01T00:00:00Z')).toBe(false);
    // 00:30 at +01:00 on 1 January of year 1 is 23:30 on 31 December of year 0 in UTC.
    expect(isStorableInstant('0001-01-01T00:30:00+01:00')).toBe(false);
    // 23:00 at −05:00 on the last day of 9999 is 04:00 on 1 January 10000 in UTC.
    expect(isStorableInstant('9999-12-31T23:00:00-05:00')).toBe(false);
  });

  it('names the field’s value in the refusal', () => {
    const parsed = storableInstant('The start').safeParse('0000-01-01T00:00:00Z');
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.message).toMatch(/^The start is out of range/);
  });
});
