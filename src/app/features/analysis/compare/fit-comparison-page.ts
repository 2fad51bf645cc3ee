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
import type { BandedCurve } from '../charts/banded-curve';
import { DemandChart } from '../charts/demand-chart';
import { demandAxisTitles, fitBandedCurve } from '../charts/fit-curves';
import { comparisonCurves, mixedKinds, type ComparisonScale } from './comparison-curves';

/** Up to six curves stay readable on one chart. */
const maxCurves = 6;

/** Triangulation: the demand curves of several fits of the study on one chart, with bands. */
@Component({
  selector: 'app-fit-comparison-page',
  imports: [
    DatePipe,
    DemandChart,
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
  protected readonly referencePrice = linkedSignal<number>(() => this.defaultReference());
  private readonly scaleChoice = signal<ComparisonScale | null>(null);

  protected readonly rawCurves = computed(() =>
    this.loaded()
      .filter((fit) => this.chosenIds().includes(fit.id))
      .flatMap((fit): BandedCurve[] => {
        const curve = fit.result
          ? fitBandedCurve(this.curveLabel(fit), fit.spec, fit.result)
          : null;
        return curve ? [curve] : [];
      }),
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
    return this.scale() === 'indexed'
      ? { ...titles, y: `Demand index (100 at ${this.referencePrice()} ${currency})` }
      : titles;
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

  private curveLabel(fit: FitResource): string {
    const n = fit.result?.n ?? 0;
    return `${this.methodLabels[fit.spec.method].split(' (')[0]}, n = ${n}`;
  }

  private defaultReference(): number {
    const study = this.state.study();
    const setup = this.state.setup();
    if (!setup || !study) return 1;
    const middle = ((setup.gridFrom ?? 0) + (setup.gridTo ?? 0)) / 2;
    return Math.round(middle * 100) / 100;
  }
}
