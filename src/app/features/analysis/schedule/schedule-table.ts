import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatTableModule } from '@angular/material/table';
import type { ScheduleRow } from '@shared/analysis/fit-result';
import { map } from 'rxjs';
import { levelLabel, type FigureFormat } from '../figures/figure-format';

const wideColumns = ['price', 'estimate', 'band', 'revenue', 'elasticity', 'respondents'];
// On a phone the band goes under the estimate and the secondary columns step aside.
const narrowColumns = ['price', 'estimateWithBand'];

/**
 * A demand schedule as a table: at each price the estimated quantity or share with its band,
 * revenue, elasticity and the respondents the cell rests on; extrapolated prices are marked.
 */
@Component({
  selector: 'app-schedule-table',
  imports: [MatTableModule],
  templateUrl: './schedule-table.html',
  styleUrl: '../results/results-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScheduleTable {
  readonly rows = input.required<readonly ScheduleRow[]>();
  readonly quantityKind = input.required<'quantity' | 'share'>();
  readonly format = input.required<FigureFormat>();
  readonly confidenceLevel = input.required<number>();

  private readonly wide = toSignal(
    inject(BreakpointObserver)
      .observe('(min-width: 720px)')
      .pipe(map((state) => state.matches)),
    { initialValue: true },
  );
  protected readonly columns = computed(() => (this.wide() ? wideColumns : narrowColumns));
  protected readonly level = computed(() => levelLabel(this.confidenceLevel()));
  protected readonly unit = computed(() => this.quantityKind());
  protected readonly estimateTitle = computed(() =>
    this.quantityKind() === 'share' ? 'Buying share (estimate)' : 'Quantity (estimate)',
  );
  // A share schedule's revenue is price × share: what one person asked brings in, buyer or not.
  protected readonly revenueTitle = computed(() =>
    this.quantityKind() === 'share' ? 'Revenue per potential buyer' : 'Revenue',
  );
  protected readonly shortTitle = computed(() =>
    this.quantityKind() === 'share' ? 'Buying share' : 'Quantity',
  );

  protected band(row: ScheduleRow): string {
    return this.format().interval(row.ciLow, row.ciHigh, this.unit()) ?? 'no band';
  }
}
