import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import { AnalysisWorkspaceState } from '../analysis-workspace-state';
import { DemandChart } from '../charts/demand-chart';
import { demandAxisTitles, fitBandedCurve } from '../charts/fit-curves';
import { ResidualChart } from '../charts/residual-chart';
import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import { EstimateValue } from '../figures/estimate-value';
import { keyFigureNote } from '../figures/key-figure-note';
import { ScheduleTable } from '../schedule/schedule-table';
import { CoefficientTable } from './coefficient-table';
import { DetailLinesChart } from '../charts/detail-lines-chart';
import { DetailTableView } from './detail-table-view';
import { CurveQuestionCard } from './curve-question-card';
import { FitPicker } from './fit-picker';
import { sampleSizeText } from './fit-sample-size';

/** A finished fit: its curve with band and revenue, figures, coefficients and diagnostics. */
@Component({
  selector: 'app-fit-results-page',
  imports: [
    CoefficientTable,
    DetailLinesChart,
    DetailTableView,
    CurveQuestionCard,
    DatePipe,
    DemandChart,
    EstimateValue,
    FitPicker,
    MatCardModule,
    MatIcon,
    MatProgressBar,
    ResidualChart,
    RouterLink,
    ScheduleTable,
  ],
  templateUrl: './fit-results-page.html',
  styleUrl: './fit-results-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FitResultsPage {
  protected readonly state = inject(AnalysisWorkspaceState);
  protected readonly fit = this.state.selectedFit;
  protected readonly result = computed(() => this.fit()?.result ?? null);
  protected readonly level = computed(() => this.fit()?.spec.confidenceLevel ?? 0.95);
  protected readonly sampleSize = computed(() => {
    const fit = this.fit();
    const result = this.result();
    return fit && result ? sampleSizeText(fit.spec, result) : '';
  });

  protected readonly curve = computed(() => {
    const fit = this.fit();
    const result = this.result();
    return fit && result ? fitBandedCurve(result.methodLabel, fit.spec, result) : null;
  });
  /** Whether the drawn curve has a band anywhere (a fit stored without one has none). */
  protected readonly banded = computed(
    () => this.curve()?.points.some((p) => p.low !== null && p.high !== null) ?? false,
  );
  protected readonly ensemble = computed(() => {
    const result = this.result();
    return result?.curve ? curveEnsemble(result.curve, this.level()) : null;
  });
  /** Why each key figure without an interval has none, by label. */
  protected readonly figureNotes = computed(() => {
    const result = this.result();
    const unitCost = this.fit()?.spec.unitCost ?? null;
    const ensemble = this.ensemble();
    return new Map(
      (result?.keyFigures ?? []).map((f) => [f.label, keyFigureNote(f, ensemble, unitCost)]),
    );
  });
  protected readonly titles = computed(() =>
    demandAxisTitles(this.curve()?.quantityKind ?? 'quantity', this.result()?.currency ?? ''),
  );
  protected readonly startPrice = computed(() => {
    const range = this.result()?.curve?.observedPriceRange;
    return range ? Math.round(((range.min + range.max) / 2) * 100) / 100 : 0;
  });

  protected pick(fitId: string): void {
    void this.state.selectFit(fitId);
  }
}
