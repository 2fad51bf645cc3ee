import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatTableModule } from '@angular/material/table';
import type { DetailTable } from '@shared/analysis/fit-result';
import type { FigureFormat } from '../figures/figure-format';
import { detailCellText } from './detail-cells';

// A ladder of up to a dozen steps fits on screen whole; longer tables (one row per stated
// price) would push the rest of the page down.
const scrollAfterRows = 12;
let nextId = 0;

/**
 * A method's own table (ladder steps, arc elasticities, the four threshold curves, the WTP
 * curve) as the fit computed it; long tables scroll inside their card under a fixed header,
 * and say so above the table.
 */
@Component({
  selector: 'app-detail-table',
  imports: [MatTableModule],
  template: `
    @if (scrolls()) {
      <p class="scroll-hint" [id]="hintId">
        {{ table().rows.length }} rows: scroll inside the table to see them all.
      </p>
    }
    <div
      class="table-scroll"
      [class.table-scroll--tall]="scrolls()"
      tabindex="0"
      role="region"
      [attr.aria-label]="label()"
      [attr.aria-describedby]="scrolls() ? hintId : null"
    >
      <table mat-table [dataSource]="table().rows">
        <caption class="fc-visually-hidden">
          {{
            table().title
          }}
        </caption>
        @for (column of columnIds(); track column; let c = $index) {
          <ng-container [matColumnDef]="column">
            <th mat-header-cell *matHeaderCellDef scope="col" class="num">
              {{ table().columns[c] }}
            </th>
            <td mat-cell *matCellDef="let row" class="num" [class.row-price]="c === 0">
              {{ cell(c, row[c]) }}
            </td>
          </ng-container>
        }
        <tr mat-header-row *matHeaderRowDef="columnIds(); sticky: true"></tr>
        <tr mat-row *matRowDef="let row; columns: columnIds()"></tr>
      </table>
    </div>
  `,
  styleUrl: './results-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DetailTableView {
  readonly table = input.required<DetailTable>();
  readonly format = input.required<FigureFormat>();

  protected readonly columnIds = computed(() => this.table().columns.map((_, c) => `c${c}`));
  /** Only a long table scrolls inside its card; a short one shows every row. */
  protected readonly scrolls = computed(() => this.table().rows.length > scrollAfterRows);
  protected readonly hintId = `detail-table-hint-${nextId++}`;
  protected readonly label = computed(
    () =>
      `${this.table().title}, ${this.table().rows.length} rows${this.scrolls() ? '; scrolls' : ''}`,
  );

  protected cell(column: number, value: DetailTable['rows'][number][number]): string {
    return detailCellText(this.table(), column, value, this.format());
  }
}
