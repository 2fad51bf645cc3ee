import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatTableModule } from '@angular/material/table';
import type { FitCoefficient } from '@shared/analysis/fit-result';
import { map } from 'rxjs';
import { levelLabel, type FigureFormat } from '../figures/figure-format';

/** Estimated coefficients with standard error, interval and p-value (Material table). */
@Component({
  selector: 'app-coefficient-table',
  imports: [MatTableModule],
  template: `
    <div
      class="table-scroll"
      tabindex="0"
      role="region"
      aria-label="Coefficients, scrolls sideways on small screens"
    >
      <table mat-table [dataSource]="coefficients()" class="coefficients">
        <caption class="fc-visually-hidden">
          Estimated coefficients with their intervals
        </caption>
        <ng-container matColumnDef="term">
          <th mat-header-cell *matHeaderCellDef scope="col">Term</th>
          <td mat-cell *matCellDef="let row">{{ row.term }}</td>
        </ng-container>
        <ng-container matColumnDef="estimate">
          <th mat-header-cell *matHeaderCellDef scope="col">Estimate</th>
          <td mat-cell *matCellDef="let row" class="num">{{ number(row.estimate) }}</td>
        </ng-container>
        <ng-container matColumnDef="se">
          <th mat-header-cell *matHeaderCellDef scope="col">Std. error</th>
          <td mat-cell *matCellDef="let row" class="num">{{ number(row.stdError) }}</td>
        </ng-container>
        <ng-container matColumnDef="ci">
          <th mat-header-cell *matHeaderCellDef scope="col">{{ level() }} interval</th>
          <td mat-cell *matCellDef="let row" class="num">
            @if (row.ciLow !== null && row.ciHigh !== null) {
              {{ number(row.ciLow) }} to {{ number(row.ciHigh) }}
            } @else {
              –
            }
          </td>
        </ng-container>
        <ng-container matColumnDef="estimateWithInterval">
          <th mat-header-cell *matHeaderCellDef scope="col" class="num">
            Estimate
            <span class="band-below">std. error; {{ level() }} interval</span>
          </th>
          <td mat-cell *matCellDef="let row" class="num">
            {{ number(row.estimate) }}
            <span class="band-below">
              {{ number(row.stdError) }};
              @if (row.ciLow !== null && row.ciHigh !== null) {
                {{ number(row.ciLow) }} to {{ number(row.ciHigh) }}
              } @else {
                no interval
              }
            </span>
          </td>
        </ng-container>
        <ng-container matColumnDef="p">
          <th mat-header-cell *matHeaderCellDef scope="col">p-value</th>
          <td mat-cell *matCellDef="let row" class="num">{{ pValue(row.pValue) }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns()"></tr>
        <tr mat-row *matRowDef="let row; columns: columns()"></tr>
      </table>
    </div>
  `,
  styleUrl: './results-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CoefficientTable {
  readonly coefficients = input.required<readonly FitCoefficient[]>();
  readonly format = input.required<FigureFormat>();
  readonly confidenceLevel = input.required<number>();
  private readonly wide = toSignal(
    inject(BreakpointObserver)
      .observe('(min-width: 720px)')
      .pipe(map((state) => state.matches)),
    { initialValue: true },
  );
  // On a phone the standard error and interval go under the estimate.
  protected readonly columns = computed(() =>
    this.wide() ? ['term', 'estimate', 'se', 'ci', 'p'] : ['term', 'estimateWithInterval'],
  );

  protected level(): string {
    return levelLabel(this.confidenceLevel());
  }

  protected number(value: number | null): string {
    return this.format().value(value, 'index');
  }

  protected pValue(value: number | null): string {
    if (value === null) return '–';
    return value < 0.001 ? '< 0.001' : value.toFixed(3);
  }
}
