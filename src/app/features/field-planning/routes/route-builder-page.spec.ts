import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MAT_DATE_LOCALE, provideNativeDateAdapter } from '@angular/material/core';
import { provideRouter } from '@angular/router';
import type { FieldRoute } from '@shared/routes/field-route';
import type { Study } from '@shared/studies/study';
import { PlanningStudy } from '../planning-study';
import { RouteBuilderPage } from './route-builder-page';
import { RouteBuilderState } from './route-builder-state';

const studyId = '6d82e39b-7461-4be5-9ab9-7c8d9eafb0c7';
const routeId = '3a5fb068-413e-4eb2-8d86-4f5a6b7c8d94';
const base = `/api/studies/${studyId}`;

const study: Study = {
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
  myRoles: ['supervisor'],
};

const route: FieldRoute = {
  id: routeId,
  studyId,
  name: 'Hill loop',
  windowStart: '2026-12-20',
  windowEnd: '2026-12-22',
  enumerator: null,
  assignedAt: null,
  stops: [
    {
      position: 1,
      pointId: '2f4eaf57-302d-4da1-9c75-3e4f5a6b7c83',
      code: 'HL-01',
      name: 'Green gate home',
      kind: 'household',
      stratum: 'Hillside',
      latitude: -0.1,
      longitude: 34.7,
      quota: 4,
    },
  ],
};

async function openRoute() {
  TestBed.configureTestingModule({
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideNativeDateAdapter(),
      { provide: MAT_DATE_LOCALE, useValue: 'en-US' },
      PlanningStudy,
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  TestBed.inject(PlanningStudy).load(studyId);
  http.expectOne(base).flush(study);
  const fixture = TestBed.createComponent(RouteBuilderPage);
  fixture.componentRef.setInput('routeId', routeId);
  fixture.detectChanges();
  http.expectOne(`${base}/sampling-points`).flush([]);
  http.expectOne(`${base}/enumerators`).flush([]);
  http.expectOne(`${base}/routes/${routeId}`).flush(route);
  fixture.detectChanges();
  await fixture.whenStable();
  const element = fixture.nativeElement as HTMLElement;
  const field = (name: string) => element.querySelector<HTMLInputElement>(`input[name="${name}"]`)!;
  return { fixture, element, field };
}

/** Types the way a keyboard does: one input event per character, the page redrawn after each. */
async function typeInto(
  fixture: { detectChanges(): void; whenStable(): Promise<unknown> },
  input: HTMLInputElement,
  text: string,
) {
  input.value = '';
  input.dispatchEvent(new Event('input'));
  for (const character of text) {
    input.value += character;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    await fixture.whenStable();
  }
  input.dispatchEvent(new Event('change'));
  input.dispatchEvent(new Event('blur'));
  fixture.detectChanges();
  await fixture.whenStable();
}

describe('RouteBuilderPage', () => {
  it('shows the stored window in the locale’s format', async () => {
    const { field } = await openRoute();
    expect(field('windowStart').value).toBe('12/20/2026');
    expect(field('windowEnd').value).toBe('12/22/2026');
  });

  it('keeps what is typed into a date that was already set, and saves the new day', async () => {
    const { fixture, field } = await openRoute();
    const state = fixture.debugElement.injector.get(RouteBuilderState);
    await typeInto(fixture, field('windowEnd'), '12/24/2026');
    expect(field('windowEnd').value).toBe('12/24/2026');
    expect(state.windowEnd()).toBe('2026-12-24');
    expect(state.windowStart()).toBe('2026-12-20');
  });

  it('explains a missing day in the format the field reads, not the API’s', async () => {
    const { fixture, element, field } = await openRoute();
    await typeInto(fixture, field('windowStart'), '');
    fixture.debugElement.injector.get(RouteBuilderState).showProblems.set(true);
    fixture.detectChanges();
    await fixture.whenStable();
    const alerts = [...element.querySelectorAll('[role="alert"]')].map((p) =>
      p.textContent?.trim(),
    );
    expect(alerts).toContain('Choose the first day in the calendar, or type it like 3/25/2027.');
    expect(element.textContent).not.toContain('2027-03-01');
  });
});
