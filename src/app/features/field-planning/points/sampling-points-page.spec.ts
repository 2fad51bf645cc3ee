import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { By } from '@angular/platform-browser';
import { provideRouter } from '@angular/router';
import type { SamplingPoint } from '@shared/sampling/sampling-point';
import type { Study } from '@shared/studies/study';
import { PlanningStudy } from '../planning-study';
import { CsvDropZone } from './csv-drop-zone';
import { SamplingPointsPage } from './sampling-points-page';

const studyId = '6d82e39b-7461-4be5-9ab9-7c8d9eafb0c7';
const base = `/api/studies/${studyId}`;

const study = (myRoles: Study['myRoles']): Study => ({
  id: studyId,
  name: 'Lamp pricing on the lake shore',
  productName: 'Solar lamp',
  secondProductName: null,
  currency: 'KES',
  locale: 'en-KE',
  market: 'Two invented towns',
  targetSample: 400,
  priceMinMinor: 50000,
  priceMaxMinor: 250000,
  status: 'draft',
  createdAt: '2027-03-01T08:00:00.000Z',
  updatedAt: '2027-03-01T08:00:00.000Z',
  myRoles,
});

const stored: SamplingPoint = {
  id: '7e93f4ac-8572-4cf6-8bca-8d9eafb0c1d8',
  code: 'LK-01',
  name: 'Blue door shop',
  kind: 'shop',
  latitude: -0.0917,
  longitude: 34.768,
  stratum: 'Lakeside',
  notes: '',
  updatedAt: '2027-03-01T08:00:00.000Z',
};

async function openPage(myRoles: Study['myRoles']) {
  TestBed.configureTestingModule({
    providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([]), PlanningStudy],
  });
  const http = TestBed.inject(HttpTestingController);
  TestBed.inject(PlanningStudy).load(studyId);
  http.expectOne(base).flush(study(myRoles));
  const fixture = TestBed.createComponent(SamplingPointsPage);
  http.expectOne(`${base}/sampling-points`).flush([stored]);
  fixture.detectChanges();
  await fixture.whenStable();
  return { fixture, http, element: fixture.nativeElement as HTMLElement };
}

describe('SamplingPointsPage', () => {
  it('shows every problem of a refused file by line and column, and keeps the stored points', async () => {
    const { fixture, http, element } = await openPage(['supervisor']);
    const zone = fixture.debugElement.query(By.directive(CsvDropZone));
    (zone.componentInstance as CsvDropZone).picked.emit({ name: 'bad.csv', text: 'a,b\n1,2' });
    const request = http.expectOne(`${base}/sampling-points/import`);
    expect(request.request.headers.get('Content-Type')).toBe('text/csv');
    request.flush(
      {
        error: {
          code: 'invalid-csv',
          message: 'Nothing was imported: the file has 2 problems.',
          problems: [
            { line: 3, column: 'latitude', message: 'Latitude 123 is outside −90 to 90.' },
            { line: 5, column: 'point_kind', message: '"tent" is not a kind.' },
          ],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    fixture.detectChanges();
    await fixture.whenStable();
    const rows = [...element.querySelectorAll('app-csv-problem-table tbody tr')].map((row) =>
      [...row.querySelectorAll('td')].map((cell) => cell.textContent?.trim()),
    );
    expect(rows).toEqual([
      ['3', 'latitude', 'Latitude 123 is outside −90 to 90.'],
      ['5', 'point_kind', '"tent" is not a kind.'],
    ]);
    expect(element.textContent).toContain('bad.csv was not imported');
    expect(element.textContent).toContain('Points (1)');
  });

  it('shows the import counts and the new list after a good file', async () => {
    const { fixture, http, element } = await openPage(['supervisor']);
    const zone = fixture.debugElement.query(By.directive(CsvDropZone));
    (zone.componentInstance as CsvDropZone).picked.emit({ name: 'good.csv', text: 'ok' });
    const second = { ...stored, id: '8fa405bd-9683-4d07-9cdb-9eafb0c1d2e9', code: 'LK-02' };
    http
      .expectOne(`${base}/sampling-points/import`)
      .flush({ created: 1, updated: 0, unchanged: 1, points: [stored, second] });
    fixture.detectChanges();
    await fixture.whenStable();
    expect(element.querySelector('[role="status"]')?.textContent).toMatch(
      /Imported: 1 new, 0 updated,\s+1 unchanged\./,
    );
    expect(element.querySelector('app-csv-problem-table')).toBeNull();
    expect(element.textContent).toContain('Points (2)');
  });

  it('offers no upload to a researcher, who only reads the points', async () => {
    const { element } = await openPage(['researcher']);
    expect(element.querySelector('app-csv-drop-zone')).toBeNull();
    expect(element.textContent).toContain('LK-01');
  });
});
