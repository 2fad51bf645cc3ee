import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { ReportsPage } from './reports-page';

const studyId = '3c2b1a09-8f7e-4d6c-9b5a-4f3e2d1c0b9a';

function published(n: number, title: string, replacedBy: number | null = null) {
  const id = (k: number) => `0000000${k}-0000-4000-8000-00000000000${k}`;
  return {
    id: id(n),
    studyId,
    studyName: 'Lanterns, Lakeshore',
    productName: 'Solar lantern',
    version: n,
    title,
    replacesId: null,
    replacedById: replacedBy === null ? null : id(replacedBy),
    fitId: '9b1e5c2a-3f4d-4e6f-8a7b-1c2d3e4f5a6b',
    method: 'price-ladder',
    methodLabel: 'Price ladder (Gabor–Granger)',
    currency: 'KES',
    n: 120,
    dataHash: 'a'.repeat(64),
    publishedAt: '2026-11-20T10:00:00.000Z',
    publishedByName: 'Mei Arkwright',
  } satisfies ScheduleVersionSummary;
}

describe('ReportsPage', () => {
  let server: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [ReportsPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => server.verify());

  async function renderWith(versions: ScheduleVersionSummary[]): Promise<HTMLElement> {
    const fixture = TestBed.createComponent(ReportsPage);
    server.expectOne('/api/portal/schedules').flush(versions);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  const cardTitles = (page: HTMLElement) =>
    [...page.querySelectorAll('.version__title')].map((t) => t.textContent?.trim());

  it('lists separate schedules as current, with no earlier versions', async () => {
    const page = await renderWith([published(2, 'Shelf prices'), published(1, 'Lantern demand')]);
    expect(cardTitles(page)).toEqual(['Shelf prices', 'Lantern demand']);
    expect(page.querySelector('.older')).toBeNull();
    expect(page.textContent).not.toMatch(/Replaced/);
  });

  it('lists superseded versions as earlier, saying what took their place', async () => {
    const page = await renderWith([
      published(1, 'Lantern demand'),
      published(2, 'Lantern demand', 3),
      published(3, 'Lantern demand, corrected'),
      published(4, 'Lantern demand'),
    ]);
    expect(cardTitles(page)).toEqual(['Lantern demand', 'Lantern demand, corrected']);
    const older = page.querySelector('.older');
    expect(older?.querySelector('summary')?.textContent?.trim()).toBe('Earlier versions (2)');
    const items = [...(older?.querySelectorAll('li') ?? [])].map((li) =>
      li.textContent?.replace(/\s+/g, ' ').trim(),
    );
    expect(items).toEqual([
      'v2 · Lantern demand (20 Nov 2026) · corrected by v3',
      'v1 · Lantern demand (20 Nov 2026) · v4 is newer, under the same title',
    ]);
  });
});
