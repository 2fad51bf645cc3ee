import { TestBed } from '@angular/core/testing';
import type { FieldRoute } from '@shared/routes/field-route';
import type { SamplingPoint } from '@shared/sampling/sampling-point';
import { RouteBuilderState } from './route-builder-state';

const point = (id: string, code: string, name: string, stratum: string): SamplingPoint => ({
  id,
  code,
  name,
  kind: 'shop',
  latitude: -0.1,
  longitude: 34.7,
  stratum,
  notes: '',
  updatedAt: '2027-03-01T08:00:00.000Z',
});

const points = [
  point('0d2c8d35-1e0b-4b8f-9a53-1c2d3e4f5a61', 'LK-01', 'Blue door shop', 'Lakeside'),
  point('1e3d9e46-2f1c-4c90-8b64-2d3e4f5a6b72', 'LK-02', 'Jetty stall', 'Lakeside'),
  point('2f4eaf57-302d-4da1-9c75-3e4f5a6b7c83', 'HL-01', 'Green gate home', 'Hillside'),
];

describe('RouteBuilderState', () => {
  let state: RouteBuilderState;
  const codes = () => state.stops().map((stop) => stop.point.code);

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [RouteBuilderState] });
    state = TestBed.inject(RouteBuilderState);
    state.setPoints(points);
    state.setName('Lakeside morning');
    state.setWindow('2027-04-05', '2027-04-09');
  });

  it('adds points as stops in the order picked, each once, and offers only the rest', () => {
    state.addPoint(points[2].id, 3);
    state.addPoint(points[0].id);
    state.addPoint(points[2].id);
    expect(codes()).toEqual(['HL-01', 'LK-01']);
    expect(state.availablePoints().map((p) => p.code)).toEqual(['LK-02']);
    expect(state.totalQuota()).toBe(4);
  });

  it('narrows the points on offer by code, name or stratum', () => {
    state.search.set('lakeside jetty');
    expect(state.availablePoints().map((p) => p.code)).toEqual(['LK-02']);
    state.search.set('hl-');
    expect(state.availablePoints().map((p) => p.code)).toEqual(['HL-01']);
  });

  it('reorders stops by drag positions and clamps moves past the ends', () => {
    points.forEach((p) => state.addPoint(p.id));
    state.moveStop(2, 0);
    expect(codes()).toEqual(['HL-01', 'LK-01', 'LK-02']);
    state.moveStop(0, 9);
    expect(codes()).toEqual(['LK-01', 'LK-02', 'HL-01']);
    state.removeStop(1);
    expect(codes()).toEqual(['LK-01', 'HL-01']);
  });

  it('builds the body the API takes, stops in order', () => {
    state.addPoint(points[1].id, 2);
    state.addPoint(points[0].id, 5);
    state.setEnumerator('9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d');
    expect(state.input()).toEqual({
      name: 'Lakeside morning',
      windowStart: '2027-04-05',
      windowEnd: '2027-04-09',
      enumeratorId: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
      stops: [
        { pointId: points[1].id, quota: 2 },
        { pointId: points[0].id, quota: 5 },
      ],
    });
    expect(state.valid()).toBe(true);
  });

  it('names a zero quota and a reversed window by their fields, once saving was tried', () => {
    state.addPoint(points[0].id);
    state.addPoint(points[1].id);
    state.setQuota(1, 0);
    state.setWindow('2027-04-09', '2027-04-05');
    expect(state.valid()).toBe(false);
    expect(state.problemAt('stops.1.quota')).toBeNull();
    state.showProblems.set(true);
    expect(state.problemAt('stops.1.quota')).toBe('The quota must be at least 1 interview.');
    expect(state.problemAt('windowEnd')).toBe('The last day must be on or after the first day.');
  });

  it('refuses a route with no stops or no window', () => {
    state.setWindow('', '');
    state.showProblems.set(true);
    expect(state.problemAt('stops')).toBe('A route needs at least one stop.');
    expect(state.problemAt('windowStart')).toBe(
      'The first day must be a real day written YYYY-MM-DD, such as 2027-03-01.',
    );
  });

  it('keeps the server’s refusal beside its stop until the route changes', () => {
    state.addPoint(points[0].id);
    state.refusedWith([{ path: 'stops.0.pointId', message: 'Not a point of this study.' }]);
    expect(state.problemAt('stops.0.pointId')).toBe('Not a point of this study.');
    state.setQuota(0, 2);
    expect(state.problemAt('stops.0.pointId')).toBeNull();
  });

  it('loads a stored route for editing', () => {
    const route: FieldRoute = {
      id: '3a5fb068-413e-4eb2-8d86-4f5a6b7c8d94',
      studyId: '4b60c179-524f-4fc3-9e97-5a6b7c8d9ea5',
      name: 'Hill loop',
      windowStart: '2027-05-01',
      windowEnd: '2027-05-02',
      enumerator: {
        userId: '5c71d28a-6350-4ad4-8fa8-6b7c8d9eafb6',
        name: 'Asha',
        email: 'a@x.test',
      },
      assignedAt: '2027-04-20T09:00:00.000Z',
      stops: [
        {
          position: 1,
          pointId: points[2].id,
          code: 'HL-01',
          name: 'Green gate home',
          kind: 'shop',
          stratum: 'Hillside',
          latitude: -0.1,
          longitude: 34.7,
          quota: 4,
        },
      ],
    };
    state.load(route);
    expect(state.name()).toBe('Hill loop');
    expect(state.enumeratorId()).toBe('5c71d28a-6350-4ad4-8fa8-6b7c8d9eafb6');
    expect(state.stops()).toEqual([{ point: points[2], quota: 4 }]);
  });
});
