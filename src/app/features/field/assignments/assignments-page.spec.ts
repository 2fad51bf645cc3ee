import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { of } from 'rxjs';
import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import type { FieldRoute } from '@shared/routes/field-route';
import type { CachedAssignments } from '../data/field-records';
import { routeId, studyId } from '../testing/field-fixtures';
import { AssignmentsCache } from './assignments-cache';
import { AssignmentsPage } from './assignments-page';
import { PointProgress } from './point-progress';

const route: FieldRoute = {
  id: routeId,
  studyId,
  name: 'Lakeside households',
  windowStart: '2026-11-02',
  windowEnd: '2026-11-28',
  enumerator: null,
  assignedAt: '2026-10-30T09:00:00.000Z',
  stops: [
    {
      position: 1,
      pointId: '7d2e9c74-6f90-4d9c-9e3a-4b5c6d7e8f92',
      code: 'LK-01',
      name: 'Blue door home',
      kind: 'household',
      stratum: 'Lakeside',
      latitude: -0.1,
      longitude: 34.7,
      quota: 104,
    },
  ],
};

const cached: CachedAssignments = {
  key: 'current',
  fetchedAt: '2026-12-01T08:00:00.000Z',
  payload: {
    routes: [route],
    studies: [],
    questionnaireVersions: [],
  } as unknown as FieldAssignments,
};

async function open(online: boolean) {
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(online);
  const refresh = vi.fn(() => Promise.resolve(cached.payload));
  TestBed.configureTestingModule({
    providers: [
      provideRouter([]),
      { provide: AssignmentsCache, useValue: { watch: () => of(cached), refresh } },
      { provide: PointProgress, useValue: { watch: () => of(new Map()) } },
    ],
  });
  const fixture = TestBed.createComponent(AssignmentsPage);
  await fixture.whenStable();
  const page = fixture.nativeElement as HTMLElement;
  const words = () => page.textContent.replace(/\s+/g, ' ');
  return { fixture, page, words, refresh };
}

describe('AssignmentsPage', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date(2026, 11, 2, 10, 0));
  });

  afterEach(() => {
    vi.useRealTimers();
    vi.restoreAllMocks();
  });

  it('says the count is what this device recorded, of the route’s quota', async () => {
    const { words } = await open(true);
    expect(words()).toContain("Recorded on this device: 0 of the route's 104 interviews");
    expect(words()).not.toContain('interviews done on this device');
  });

  it('marks a route whose dates are over', async () => {
    const { page, words } = await open(true);
    expect(words()).toContain('Dates over: ended 28 Nov 2026');
    expect(page.querySelector('.assignments__route--ended')).not.toBeNull();
  });

  it('says the device is offline instead of doing nothing on Update, and updates once back', async () => {
    const { fixture, page, words, refresh } = await open(false);
    const update = [...page.querySelectorAll('button')].find((b) =>
      b.textContent.includes('Update'),
    )!;
    update.click();
    await fixture.whenStable();
    expect(refresh).not.toHaveBeenCalled();
    expect(words()).toContain(
      'This device is offline. Your routes will update when the connection is back.',
    );
    vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(true);
    window.dispatchEvent(new Event('online'));
    await fixture.whenStable();
    expect(refresh).toHaveBeenCalledTimes(1);
    expect(words()).not.toContain('This device is offline');
  });
});
