import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  inject,
  linkedSignal,
  signal,
  untracked,
} from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCardModule } from '@angular/material/card';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { DatePipe } from '@angular/common';
import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import type { FitResource } from '@shared/analysis/fit-resource';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { evenPrices, type BandedCurve } from '../charts/banded-curve';
import { demandAxisTitles, fitBandedCurve } from '../charts/fit-curves';
import { fitDistinctions } from '../results/fit-distinctions';
import { ComparisonChart } from './comparison-chart';
import { comparisonCurves, mixedKinds, type ComparisonScale } from './comparison-curves';
import { defaultIndexPrice } from './index-price';

/** Up to six curves stay readable on one chart. */
const maxCurves = 6;

/** Triangulation: the demand curves of several fits of the study on one chart, with bands. */
@Component({
  selector: 'app-fit-comparison-page',
  imports: [
    ComparisonChart,
    DatePipe,
    FormsModule,
    MatButtonToggleModule,
    MatCardModule,
    MatCheckbox,
    MatFormFieldModule,
    MatInput,
    RouterLink,
  ],
  templateUrl: './fit-comparison-page.html',
  styleUrl: './fit-comparison-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitComparisonPage {
  protected readonly state = inject(AnalysisWorkspaceState);
  protected readonly methodLabels = analysisMethodLabels;
  protected readonly chosenIds = linkedSignal<readonly string[]>(() =>
    this.state
      .finishedFits()
      .filter((fit) => fit.hasSchedule)
      .slice(0, 3)
      .map((fit) => fit.id),
  );
  private readonly loaded = signal<readonly FitResource[]>([]);
  private readonly chosenFits = computed(() =>
    this.loaded().filter((fit) => this.chosenIds().includes(fit.id)),
  );
  /** The price the researcher typed; until then the default below. */
  private readonly referenceChoice = signal<number | null>(null);
  private readonly scaleChoice = signal<ComparisonScale | null>(null);
  protected readonly distinctions = computed(() =>
    fitDistinctions(this.state.finishedFits(), this.state.format()),
  );

  protected readonly rawCurves = computed(() => {
    const labels = this.curveLabels(this.chosenFits());
    return this.chosenFits().flatMap((fit): BandedCurve[] => {
      const curve = fit.result ? fitBandedCurve(labels.get(fit.id)!, fit.spec, fit.result) : null;
      return curve ? [curve] : [];
    });
  });
  protected readonly referencePrice = computed(
    () =>
      this.referenceChoice() ??
      defaultIndexPrice(this.rawCurves(), this.gridPrices()) ??
      this.setupMiddle(),
  );
  protected readonly mixed = computed(() => mixedKinds(this.rawCurves()));
  protected readonly scale = computed(
    () => this.scaleChoice() ?? (this.mixed() ? 'indexed' : 'as-estimated'),
  );
  protected readonly curves = computed(() =>
    comparisonCurves(this.rawCurves(), this.scale(), this.referencePrice()),
  );
  protected readonly titles = computed(() => {
    const currency = this.state.study()?.currency ?? '';
    const kind = this.rawCurves()[0]?.quantityKind ?? 'quantity';
    const titles = demandAxisTitles(kind, currency);
    const price = this.state.format()?.value(this.referencePrice(), 'price') ?? '';
    return this.scale() === 'indexed' ? { ...titles, y: `Index (100 at ${price})` } : titles;
  });

  constructor() {
    effect(() => {
      const ids = this.chosenIds();
      untracked(() => void this.loadChosen(ids));
    });
  }

  protected toggle(fitId: string, on: boolean): void {
    const others = this.chosenIds().filter((id) => id !== fitId);
    this.chosenIds.set(on ? [...others, fitId].slice(-maxCurves) : others);
  }

  protected setScale(scale: ComparisonScale): void {
    this.scaleChoice.set(scale);
  }

  private async loadChosen(ids: readonly string[]): Promise<void> {
    const fits = await Promise.all(ids.map((id) => this.state.loadFit(id)));
    this.loaded.update((known) => [
      ...known.filter((fit) => !ids.includes(fit.id)),
      ...fits.filter((fit) => fit.status === 'done'),
    ]);
  }

  protected chooseReference(value: number | string | null): void {
    this.referenceChoice.set(value === '' || value === null ? null : Number(value));
  }

  /** The prices of the compared fits' own schedules: the grid an index price is picked from. */
  private gridPrices(): number[] {
    return this.chosenFits().flatMap((fit) => {
      const grid = fit.spec.priceGrid;
      return evenPrices(grid.from, grid.to, grid.steps);
    });
  }

  /**
   * Method and n name a curve; where two chosen fits would share that name, what sets each
   * apart is added, or the legend would show two identical entries.
   */
  private curveLabels(fits: readonly FitResource[]): Map<string, string> {
    const base = (fit: FitResource) =>
      `${this.methodLabels[fit.spec.method].split(' (')[0]}, n = ${fit.result?.n ?? 0}`;
    const details = fitDistinctions(fits, this.state.format());
    return new Map(
      fits.map((fit) => {
        const twins = fits.filter((other) => base(other) === base(fit)).length > 1;
        return [fit.id, twins ? `${base(fit)} (${details.get(fit.id)})` : base(fit)];
      }),
    );
  }

  private setupMiddle(): number {
    const setup = this.state.setup();
    if (!setup) return 1;
    const middle = ((setup.gridFrom ?? 0) + (setup.gridTo ?? 0)) / 2;
    return Math.round(middle * 100) / 100;
  }
}
