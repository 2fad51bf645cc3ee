import { filterFromParams, filterToParams, pageFromParams } from './queue-filter';

describe('the review queue filter in the address', () => {
  it('reads the filters it knows and keeps the reference as typed', () => {
    expect(
      filterFromParams({ status: 'flagged', reference: 'Interview 3F9A', sort: 'newest', x: 'y' }),
    ).toEqual({ status: 'flagged', reference: 'Interview 3F9A', sort: 'newest' });
  });

  it('drops a value the API would refuse instead of breaking the page', () => {
    expect(filterFromParams({ status: 'sleepy', from: '2026-02-30x', flag: 'gps-far' })).toEqual({
      flag: 'gps-far',
    });
  });

  it('drops a last day before the first day', () => {
    expect(filterFromParams({ from: '2026-03-05', to: '2026-03-01' })).toEqual({
      from: '2026-03-05',
    });
  });

  it('writes only the fields that are set', () => {
    expect(filterToParams({ status: 'received', routeId: undefined })).toEqual({
      status: 'received',
    });
  });

  it('reads the page number, defaulting to the first', () => {
    expect(pageFromParams({ page: '3' })).toBe(3);
    expect(pageFromParams({ page: '0' })).toBe(1);
    expect(pageFromParams({ page: 'two' })).toBe(1);
    expect(pageFromParams({})).toBe(1);
  });
});
