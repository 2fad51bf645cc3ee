import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import type { HealthReport } from '@shared/health/health-report';
import { SystemHealthPage } from './system-health-page';

const degraded: HealthReport = {
  status: 'degraded',
  checks: {
    database: { ok: true, latencyMs: 3, detail: 'PostgreSQL 15 answered' },
    objectStore: { ok: false, latencyMs: 2000, detail: 'Timed out after 2000 ms' },
    mail: { ok: true, latencyMs: 12, detail: 'SMTP relay accepted the greeting' },
    identityProvider: { ok: true, latencyMs: 40, detail: 'Discovery document loaded' },
  },
};

describe('SystemHealthPage', () => {
  let fixture: ComponentFixture<SystemHealthPage>;
  let server: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      imports: [SystemHealthPage],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    server = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(SystemHealthPage);
  });

  afterEach(() => server.verify());

  function cards(): HTMLElement[] {
    return Array.from(
      (fixture.nativeElement as HTMLElement).querySelectorAll('app-dependency-card'),
    );
  }

  it('shows one card per dependency, marking the failed one', async () => {
    server.expectOne('/api/health/details').flush(degraded, { status: 503, statusText: 'Unavailable' });
    await fixture.whenStable();
    expect(cards()).toHaveLength(4);
    const failed = cards().filter((card) => card.classList.contains('dependency--failed'));
    expect(failed).toHaveLength(1);
    expect(failed[0].textContent).toContain('Photo storage');
    expect(failed[0].textContent).toContain('Timed out after 2000 ms');
    expect(fixture.nativeElement.textContent).toContain('Some services are not working');
  });

  it('asks again when the refresh button is pressed', async () => {
    server.expectOne('/api/health/details').flush({ ...degraded, status: 'ok' });
    await fixture.whenStable();
    const button = (fixture.nativeElement as HTMLElement).querySelector('button')!;
    button.click();
    server.expectOne('/api/health/details').flush(degraded, { status: 503, statusText: 'Unavailable' });
    await fixture.whenStable();
    expect(fixture.nativeElement.textContent).toContain('Failed');
  });

  it('says so when the server cannot be reached', async () => {
    server.expectOne('/api/health/details').error(new ProgressEvent('error'));
    await fixture.whenStable();
    expect(cards()).toHaveLength(0);
    expect(fixture.nativeElement.querySelector('[role="alert"]').textContent).toContain(
      'cannot reach',
    );
  });
});
