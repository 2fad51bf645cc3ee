import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import type { SamplingPoint } from '@shared/sampling/sampling-point';
import { samplingPointKindLabels } from '@shared/sampling/sampling-point-kind';

/** The study's sampling points; scrolls sideways on a phone rather than squeezing the columns. */
@Component({
  selector: 'app-point-table',
  imports: [MatTableModule, DecimalPipe],
  template: `
    <div class="point-table" tabindex="0" role="region" aria-label="Sampling points, scrollable">
      <table mat-table [dataSource]="points()">
        <caption class="fc-visually-hidden">
          Sampling points of the study
        </caption>
        <ng-container matColumnDef="code">
          <th mat-header-cell *matHeaderCellDef scope="col">Code</th>
          <td mat-cell *matCellDef="let point" class="point-table__code">{{ point.code }}</td>
        </ng-container>
        <ng-container matColumnDef="name">
          <th mat-header-cell *matHeaderCellDef scope="col">Name</th>
          <td mat-cell *matCellDef="let point">{{ point.name }}</td>
        </ng-container>
        <ng-container matColumnDef="kind">
          <th mat-header-cell *matHeaderCellDef scope="col">Kind</th>
          <td mat-cell *matCellDef="let point">{{ kindLabel(point) }}</td>
        </ng-container>
        <ng-container matColumnDef="stratum">
          <th mat-header-cell *matHeaderCellDef scope="col">Stratum</th>
          <td mat-cell *matCellDef="let point">{{ point.stratum }}</td>
        </ng-container>
        <ng-container matColumnDef="position">
          <th mat-header-cell *matHeaderCellDef scope="col">Latitude, longitude</th>
          <td mat-cell *matCellDef="let point" class="point-table__number">
            {{ point.latitude | number: '1.4-6' }}, {{ point.longitude | number: '1.4-6' }}
          </td>
        </ng-container>
        <ng-container matColumnDef="notes">
          <th mat-header-cell *matHeaderCellDef scope="col">Notes</th>
          <td mat-cell *matCellDef="let point" class="point-table__notes">{{ point.notes }}</td>
        </ng-container>
        <tr mat-header-row *matHeaderRowDef="columns"></tr>
        <tr mat-row *matRowDef="let row; columns: columns"></tr>
      </table>
    </div>
  `,
  styles: `
    .point-table {
      overflow-x: auto;
    }
    .point-table:focus-visible {
      outline: 2px solid var(--mat-sys-primary);
    }
    table {
      min-width: 720px;
    }
    .point-table__code {
      font-weight: 500;
      white-space: nowrap;
    }
    .point-table__number {
      font-variant-numeric: tabular-nums;
      white-space: nowrap;
    }
    .point-table__notes {
      white-space: pre-line;
      max-width: 16rem;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PointTable {
  readonly points = input.required<readonly SamplingPoint[]>();
  /** Material's row template gives `any`; this keeps the cell typed. */
  protected kindLabel(point: SamplingPoint): string {
    return samplingPointKindLabels[point.kind];
  }
  protected readonly columns = ['code', 'name', 'kind', 'stratum', 'position', 'notes'];
}
