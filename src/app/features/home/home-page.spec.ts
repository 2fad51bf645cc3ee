import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { Role } from '@shared/auth/roles';
import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import { signInAs } from '../../testing/sign-in-as';
import { FieldStore } from '../field/data/field-store';
import { HomePage } from './home-page';

const stalePromises = [
  'on their way',
  'Route planning opens once',
  'When a supervisor assigns you a route',
  'it will then be listed here',
];

describe('HomePage', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [HomePage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
  });

  async function render(roles: Role[]) {
    await signInAs(roles);
    const fixture = TestBed.createComponent(HomePage);
    await fixture.whenStable();
    const page = fixture.nativeElement as HTMLElement;
    const http = TestBed.inject(HttpTestingController);
    /** Lets fetched and stored figures arrive, then redraws. */
    const settle = async () => {
      for (let i = 0; i < 5; i++) {
        await new Promise((resolve) => setTimeout(resolve, 10));
        await fixture.whenStable();
      }
    };
    return { page, http, settle };
  }

  const cardTitles = (page: HTMLElement) =>
    Array.from(page.querySelectorAll('[matCardTitle]')).map((t) => t.textContent.trim());
  const links = (page: HTMLElement) =>
    Array.from(page.querySelectorAll('mat-card-actions a')).map((a) => [
      a.textContent.trim(),
      a.getAttribute('href'),
    ]);

  it('greets the person and shows one card per role they hold', async () => {
    const { page, http } = await render(['client', 'admin']);
    http.expectOne('/api/portal/schedules').flush([]);
    expect(page.querySelector('h1')?.textContent).toContain('Welcome, Ines');
    expect(cardTitles(page)).toEqual(['Administrator', 'Client']);
  });

  it('links each role to its main screens', async () => {
    const { page, http } = await render([
      'admin',
      'researcher',
      'supervisor',
      'enumerator',
      'client',
    ]);
    http.expectOne('/api/studies').flush([]);
    http.expectOne('/api/review/pending').flush([]);
    http.expectOne('/api/portal/schedules').flush([]);
    expect(links(page)).toEqual([
      ['Go to members', '/members'],
      ['Go to system health', '/system-health'],
      ['Go to studies', '/studies'],
      ['Go to analysis', '/analysis'],
      ['Go to field planning', '/field-planning'],
      ['Go to the review queue', '/review'],
      ['Go to my routes', '/field/routes'],
      ['Go to sync', '/field/sync'],
      ['Go to reports', '/reports'],
    ]);
    for (const words of stalePromises) expect(page.textContent).not.toContain(words);
  });

  it('counts the interviews waiting for a supervisor’s decision across their studies', async () => {
    const { page, http, settle } = await render(['supervisor']);
    http.expectOne('/api/studies').flush([{}, {}, {}]);
    http.expectOne('/api/review/pending').flush([
      { studyId: 'a', pending: 300, flagged: 12 },
      { studyId: 'b', pending: 12, flagged: 0 },
    ]);
    await settle();
    expect(page.textContent).toContain('312 interviews wait for your decision.');
  });

  it('tells a client when nothing has been published for them', async () => {
    const { page, http, settle } = await render(['client']);
    http.expectOne('/api/portal/schedules').flush([]);
    await settle();
    expect(page.textContent).toContain('Nothing has been published for you yet.');
  });

  it('counts the routes kept on the enumerator’s device', async () => {
    await signInAs(['enumerator']);
    const routes = Array.from({ length: 4 }, () => ({})) as FieldAssignments['routes'];
    await TestBed.inject(FieldStore).db.assignments.put({
      key: 'current',
      payload: { routes } as FieldAssignments,
      fetchedAt: '2026-12-01T08:00:00Z',
    });
    const fixture = TestBed.createComponent(HomePage);
    // The store and its lazily loaded code answer asynchronously; a busy machine may take a while.
    const deadline = Date.now() + 20_000;
    while (Date.now() < deadline && !fixture.nativeElement.textContent.includes('routes are')) {
      await new Promise((resolve) => setTimeout(resolve, 20));
      await fixture.whenStable();
    }
    expect((fixture.nativeElement as HTMLElement).textContent).toContain(
      '4 routes are on this device.',
    );
    await TestBed.inject(FieldStore).db.delete();
  }, 30_000);

  it('leaves a figure out when its list cannot be fetched, e.g. offline', async () => {
    const { page, http, settle } = await render(['researcher']);
    http.expectOne('/api/studies').error(new ProgressEvent('error'), { status: 0 });
    await settle();
    expect(page.textContent).not.toContain('You are in');
    expect(cardTitles(page)).toEqual(['Researcher']);
  });

  it('explains what to do when the account holds no role', async () => {
    const { page } = await render([]);
    expect(cardTitles(page)).toEqual(['No role yet']);
  });
});
