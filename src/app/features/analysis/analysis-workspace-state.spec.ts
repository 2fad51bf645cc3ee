import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import type { Study } from '@shared/studies/study';
import { AnalysisWorkspaceState, studyPriceRange } from './analysis-workspace-state';
import { defaultSetupValues, fitSpecFrom } from './setup/fit-setup-values';

const studyId = '3f2b1c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
const fitId = '7a6b5c4d-3e2f-4a1b-9c8d-7e6f5a4b3c2d';
const base = `/api/studies/${studyId}`;

const study: Study = {
  id: studyId,
  name: 'Lantern pricing, Reedbank',
  productName: 'Solar lantern',
  secondProductName: null,
  currency: 'KES',
  locale: 'en-KE',
  market: 'Invented villages',
  targetSample: 200,
  priceMinMinor: 50000,
  priceMaxMinor: 400000,
  status: 'in_field',
  createdAt: '2026-11-01T08:00:00.000Z',
  updatedAt: '2026-11-01T08:00:00.000Z',
  myRoles: ['researcher'],
};

const spec = (() => {
  const checked = fitSpecFrom(defaultSetupValues({ min: 500, max: 4000 }));
  if (!checked.ok) throw new Error('the default set-up must be valid');
  return checked.spec;
})();

function fitAt(status: FitResource['status'], progress: number): FitResource {
  return {
    id: fitId,
    studyId,
    spec,
    status,
    progress,
    result: null,
    error:
      status === 'failed'
        ? { code: 'too-few-observations', message: 'Too few', field: null }
        : null,
    dataHash: null,
    createdBy: null,
    createdAt: '2026-12-01T10:00:00.000Z',
    startedAt: null,
    finishedAt: null,
  };
}

describe('AnalysisWorkspaceState', () => {
  let state: AnalysisWorkspaceState;
  let server: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), AnalysisWorkspaceState],
    });
    state = TestBed.inject(AnalysisWorkspaceState);
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    vi.useRealTimers();
    server.verify();
  });

  async function openStudy(): Promise<void> {
    const opened = state.open(studyId);
    server.expectOne(base).flush(study);
    await Promise.resolve();
    await new Promise((r) => setTimeout(r));
    server.expectOne(`${base}/routes`).flush([]);
    server
      .expectOne(`${base}/sampling-points`)
      .flush([{ stratum: 'North' }, { stratum: 'East' }, { stratum: 'North' }]);
    server.expectOne(`${base}/questionnaires`).flush([]);
    await new Promise((r) => setTimeout(r));
    server.expectOne(`${base}/fits`).flush([] as FitSummary[]);
    server.expectOne(`${base}/schedules`).flush([]);
    await opened;
  }

  it('opens a study with its regions, in order and each once, and a set-up on its price range', async () => {
    await openStudy();
    expect(state.regions()).toEqual(['East', 'North']);
    expect(state.setup()?.gridFrom).toBe(500); // 50000 cents of KES
    expect(studyPriceRange(study)).toEqual({ min: 500, max: 4000 });
  });

  it('follows a fit job from queued to done and selects the finished fit', async () => {
    await openStudy();
    vi.useFakeTimers();
    state.runFit(spec);
    const post = server.expectOne({ method: 'POST', url: `${base}/fits` });
    expect(post.request.body).toEqual({ spec });
    post.flush({ fitId });

    await vi.advanceTimersByTimeAsync(0);
    server.expectOne(`${base}/fits/${fitId}`).flush(fitAt('queued', 0));
    expect(state.job()?.status).toBe('queued');

    await vi.advanceTimersByTimeAsync(800);
    server.expectOne(`${base}/fits/${fitId}`).flush(fitAt('running', 60));
    expect(state.job()?.progress).toBe(60);

    await vi.advanceTimersByTimeAsync(800);
    server.expectOne(`${base}/fits/${fitId}`).flush(fitAt('done', 100));
    await vi.advanceTimersByTimeAsync(0);
    server.expectOne(`${base}/fits`).flush([]);
    expect(state.selectedFitId()).toBe(fitId);
    expect(state.selectedFit()?.status).toBe('done');

    await vi.advanceTimersByTimeAsync(5000);
    server.expectNone(`${base}/fits/${fitId}`);
  });

  it('keeps the server’s refusal of a specification to show beside the run button', async () => {
    await openStudy();
    state.runFit(spec);
    server.expectOne({ method: 'POST', url: `${base}/fits` }).flush(
      {
        error: {
          code: 'invalid-request',
          message: 'The specification has problems',
          issues: [{ path: 'spec.priceGrid.to', message: 'Must be above zero' }],
        },
      },
      { status: 400, statusText: 'Bad Request' },
    );
    expect(state.jobProblem()?.issues).toEqual([
      { path: 'spec.priceGrid.to', message: 'Must be above zero' },
    ]);
  });
});
