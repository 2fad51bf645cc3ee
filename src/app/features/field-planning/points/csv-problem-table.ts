import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { CsvProblem } from '@shared/sampling/csv-problem';

/** A refused file's problems, one row each, by file line and column, so it can be fixed in one go. */
@Component({
  selector: 'app-csv-problem-table',
  template: `
    <section class="csv-problems" role="alert" aria-labelledby="csv-problems-title">
      <h3 id="csv-problems-title" class="csv-problems__title">
        {{ fileName() ? fileName() + ' was' : 'The file was' }} not imported:
        {{ problems().length }} {{ problems().length === 1 ? 'problem' : 'problems' }}
      </h3>
      <p class="csv-problems__lead">
        Nothing was stored. Fix every line below in the file and upload it again.
      </p>
      <div class="csv-problems__scroll">
        <table class="csv-problems__table">
          <caption class="fc-visually-hidden">
            Problems by line and column
          </caption>
          <thead>
            <tr>
              <th scope="col">Line</th>
              <th scope="col">Column</th>
              <th scope="col">Problem</th>
            </tr>
          </thead>
          <tbody>
            @for (row of rows(); track $index) {
              <tr>
                <td class="csv-problems__line">{{ row.line }}</td>
                <td>
                  <code>{{ row.columnLabel }}</code>
                </td>
                <td>{{ row.message }}</td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    </section>
  `,
  styleUrl: './csv-problem-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvProblemTable {
  readonly problems = input.required<readonly CsvProblem[]>();
  readonly fileName = input<string>('');

  protected readonly rows = computed(() =>
    this.problems().map((problem) => ({
      ...problem,
      columnLabel: problem.column || 'whole row',
    })),
  );
}
