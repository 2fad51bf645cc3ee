import { DestroyRef, Injectable, computed, inject, signal } from '@angular/core';
import { Observable, Subscription, firstValueFrom, forkJoin, of, catchError, tap } from 'rxjs';
import type { FitResource, FitSummary } from '@shared/analysis/fit-resource';
import type { FitSpec } from '@shared/analysis/fit-spec';
import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import type { FieldRoute } from '@shared/routes/field-route';
import type { Study } from '@shared/studies/study';
import { readApiProblem, type ApiProblem } from '../../core/api-problem';
import { AnalysisApi } from './analysis-api';
import { FigureFormat } from './figures/figure-format';
import { pollJob } from './jobs/fit-polling';
import { defaultSetupValues, type FitSetupValues } from './setup/fit-setup-values';

/**
 * The state of one study's analysis workspace, shared by its tabs: the study and what can be
 * filtered on, the set-up being edited, the study's fits and published versions, the job
 * running now, and the finished fits loaded so far (results, policy and comparison read them).
 */
@Injectable()
export class AnalysisWorkspaceState {
  private readonly api = inject(AnalysisApi);
  private polling: Subscription | null = null;

  private readonly studyState = signal<Study | null>(null);
  private readonly loadProblem = signal<string | null>(null);
  private readonly loadedFits = signal<ReadonlyMap<string, FitResource>>(new Map());

  readonly study = this.studyState.asReadonly();
  readonly problem = this.loadProblem.asReadonly();
  readonly routes = signal<readonly FieldRoute[]>([]);
  readonly regions = signal<readonly string[]>([]);
  readonly incomeBands = signal<readonly { value: string; label: string }[]>([]);
  readonly fits = signal<readonly FitSummary[]>([]);
  readonly schedules = signal<readonly ScheduleVersionSummary[]>([]);
  readonly setup = signal<FitSetupValues | null>(null);
  /** The fit whose job was started from this screen, as last polled. */
  readonly job = signal<FitResource | null>(null);
  /** Why the job could not be started or followed (a refused spec, a lost connection). */
  readonly jobProblem = signal<ApiProblem | null>(null);
  /** The finished fit the results, policy and publish tabs show. */
  readonly selectedFitId = signal<string | null>(null);

  readonly format = computed(() => {
    const study = this.study();
    return study ? new FigureFormat(study.currency, study.locale) : null;
  });
  readonly finishedFits = computed(() => this.fits().filter((fit) => fit.status === 'done'));
  readonly selectedFit = computed(() => {
    const id = this.selectedFitId();
    return id ? (this.loadedFits().get(id) ?? null) : null;
  });

  constructor() {
    inject(DestroyRef).onDestroy(() => this.polling?.unsubscribe());
  }

  /** Loads a study and what its set-up offers; keeps the set-up when it is the same study. */
  async open(studyId: string): Promise<void> {
    if (this.study()?.id === studyId) return;
    this.forgetStudy();
    try {
      const study = await firstValueFrom(this.api.getStudy(studyId));
      this.studyState.set(study);
      this.setup.set(defaultSetupValues(studyPriceRange(study)));
      const optional = <T>(request: Observable<T>, fallback: T) =>
        request.pipe(catchError(() => of(fallback)));
      const [routes, regions, bands] = await firstValueFrom(
        forkJoin([
          optional(this.api.listRoutes(studyId), [] as FieldRoute[]),
          optional(this.api.listRegions(studyId), [] as string[]),
          optional(this.api.listIncomeBands(studyId), [] as { value: string; label: string }[]),
        ]),
      );
      this.routes.set(routes);
      this.regions.set(regions);
      this.incomeBands.set(bands);
      await Promise.all([this.refreshFits(), this.refreshSchedules()]);
    } catch (error) {
      this.loadProblem.set(readApiProblem(error).message);
    }
  }

  async refreshFits(): Promise<void> {
    const study = this.study();
    if (!study) return;
    this.fits.set(await firstValueFrom(this.api.listFits(study.id)));
    const latestDone = this.finishedFits()[0];
    if (!this.selectedFitId() && latestDone) await this.selectFit(latestDone.id);
  }

  async refreshSchedules(): Promise<void> {
    const study = this.study();
    if (study) this.schedules.set(await firstValueFrom(this.api.listSchedules(study.id)));
  }

  /** A finished fit with its result, fetched once and kept. */
  async loadFit(fitId: string): Promise<FitResource> {
    const known = this.loadedFits().get(fitId);
    if (known) return known;
    const fit = await firstValueFrom(this.api.getFit(this.requireStudy().id, fitId));
    if (fit.status === 'done') this.remember(fit);
    return fit;
  }

  async selectFit(fitId: string): Promise<void> {
    await this.loadFit(fitId);
    this.selectedFitId.set(fitId);
  }

  /** Queues a fit and follows its job until it finishes; the finished fit becomes selected. */
  runFit(spec: FitSpec): void {
    const studyId = this.requireStudy().id;
    this.polling?.unsubscribe();
    this.jobProblem.set(null);
    this.job.set(null);
    this.polling = this.api.startFit(studyId, spec).subscribe({
      next: ({ fitId }) => this.follow(studyId, fitId),
      error: (error: unknown) => this.jobProblem.set(readApiProblem(error)),
    });
  }

  private follow(studyId: string, fitId: string): void {
    this.polling = pollJob(() => this.api.getFit(studyId, fitId))
      .pipe(tap((fit) => this.job.set(fit)))
      .subscribe({
        complete: () => void this.finish(this.job()),
        error: (error: unknown) => this.jobProblem.set(readApiProblem(error)),
      });
  }

  private async finish(fit: FitResource | null): Promise<void> {
    if (fit?.status === 'done') {
      this.remember(fit);
      this.selectedFitId.set(fit.id);
    }
    await this.refreshFits();
  }

  /** Another study opens in the same workspace: nothing of the last one may show. */
  private forgetStudy(): void {
    this.polling?.unsubscribe();
    this.studyState.set(null);
    this.loadProblem.set(null);
    this.loadedFits.set(new Map());
    this.fits.set([]);
    this.schedules.set([]);
    this.job.set(null);
    this.jobProblem.set(null);
    this.selectedFitId.set(null);
  }

  private remember(fit: FitResource): void {
    this.loadedFits.update((map) => new Map(map).set(fit.id, fit));
  }

  private requireStudy(): Study {
    const study = this.study();
    if (!study) throw new Error('No study is open in the analysis workspace');
    return study;
  }
}

/** The study's planned price range in major units of its currency. */
export function studyPriceRange(study: Study): { min: number; max: number } {
  const scale = 10 ** minorUnitDigits(study.currency);
  return { min: study.priceMinMinor / scale, max: study.priceMaxMinor / scale };
}
