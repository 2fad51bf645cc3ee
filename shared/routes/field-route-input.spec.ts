import { fieldRouteInputSchema, routeAssignmentSchema } from './field-route-input';
import { quotaShare } from './route-progress';

const pointA = '6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61';
const pointB = '0b6f2d9e-2c1a-4e7b-8d3f-5a6b7c8d9e02';

const valid = {
  name: 'Harbour loop',
  stops: [
    { pointId: pointA, quota: 4 },
    { pointId: pointB, quota: 2 },
  ],
  windowStart: '2027-03-01',
  windowEnd: '2027-03-07',
};

function issuesOf(input: unknown) {
  const parsed = fieldRouteInputSchema.safeParse(input);
  if (parsed.success) throw new Error('expected the route to be refused');
  return parsed.error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

describe('fieldRouteInputSchema', () => {
  it('accepts a route with ordered stops, a window and no enumerator', () => {
    expect(fieldRouteInputSchema.parse(valid)).toEqual(valid);
  });

  it('accepts a one-day window', () => {
    expect(fieldRouteInputSchema.safeParse({ ...valid, windowEnd: '2027-03-01' }).success).toBe(
      true,
    );
  });

  it('refuses a quota of zero, naming the stop', () => {
    const stops = [valid.stops[0], { pointId: pointB, quota: 0 }];
    expect(issuesOf({ ...valid, stops })).toEqual([
      { path: 'stops.1.quota', message: 'The quota must be at least 1 interview.' },
    ]);
  });

  it('refuses a fractional quota', () => {
    const stops = [{ pointId: pointA, quota: 1.5 }];
    expect(issuesOf({ ...valid, stops })[0].path).toBe('stops.0.quota');
  });

  it('refuses a window that ends before it starts', () => {
    expect(issuesOf({ ...valid, windowEnd: '2027-02-28' })).toEqual([
      { path: 'windowEnd', message: 'The last day must be on or after the first day.' },
    ]);
  });

  it('refuses an impossible date, saying how a day is written', () => {
    expect(issuesOf({ ...valid, windowStart: '2027-02-30' })).toEqual([
      {
        path: 'windowStart',
        message: 'The first day must be a real day written YYYY-MM-DD, such as 2027-03-01.',
      },
    ]);
  });

  it('refuses a last day in another format with the same wording', () => {
    expect(issuesOf({ ...valid, windowEnd: '07/03/2027' })).toEqual([
      {
        path: 'windowEnd',
        message: 'The last day must be a real day written YYYY-MM-DD, such as 2027-03-01.',
      },
    ]);
  });

  it('refuses the same point twice and a route with no stops', () => {
    const stops = [valid.stops[0], valid.stops[1], { pointId: pointA, quota: 1 }];
    expect(issuesOf({ ...valid, stops })).toEqual([
      { path: 'stops.2.pointId', message: 'This point is already stop 1 of the route.' },
    ]);
    expect(issuesOf({ ...valid, stops: [] })).toEqual([
      { path: 'stops', message: 'A route needs at least one stop.' },
    ]);
  });

  it('refuses a blank name and an unknown field', () => {
    expect(issuesOf({ ...valid, name: '   ' })[0].path).toBe('name');
    expect(issuesOf({ ...valid, colour: 'red' })[0].message).toMatch(/colour/);
  });
});

describe('routeAssignmentSchema', () => {
  it('takes an enumerator id or null, nothing else', () => {
    expect(routeAssignmentSchema.safeParse({ enumeratorId: null }).success).toBe(true);
    expect(routeAssignmentSchema.safeParse({ enumeratorId: pointA }).success).toBe(true);
    expect(routeAssignmentSchema.safeParse({ enumeratorId: 'someone' }).success).toBe(false);
  });
});

describe('quotaShare', () => {
  it('is the completed share of the quota, capped at 1', () => {
    expect(quotaShare({ quota: 4, completed: 1, accepted: 0, flagged: 0 })).toBe(0.25);
    expect(quotaShare({ quota: 2, completed: 3, accepted: 3, flagged: 0 })).toBe(1);
  });
});
