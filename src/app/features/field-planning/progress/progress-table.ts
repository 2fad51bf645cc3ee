import { PercentPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatProgressBar } from '@angular/material/progress-bar';
import { quotaShare, type RouteProgress } from '@shared/routes/route-progress';
import { formatDay } from '../iso-day';

/** One route's progress: its totals, then every stop against its quota. */
@Component({
  selector: 'app-progress-table',
  imports: [MatProgressBar, PercentPipe],
  template: `
    <section class="route-progress" [attr.aria-labelledby]="'progress-' + route().routeId">
      <header class="route-progress__header">
        <h3 class="route-progress__name" [id]="'progress-' + route().routeId">
          {{ route().name }}
        </h3>
        <p class="route-progress__meta">
          {{ route().enumeratorName ?? 'Not assigned' }} · {{ formatDay(route().windowStart) }} –
          {{ formatDay(route().windowEnd) }}
        </p>
        <p class="route-progress__total">
          {{ route().completed }} of {{ route().quota }} completed ({{ share(route()) | percent }})
        </p>
        <mat-progress-bar
          mode="determinate"
          [value]="share(route()) * 100"
          [attr.aria-label]="'Share of the quota of ' + route().name + ' completed'"
        />
      </header>
      <div
        class="route-progress__scroll"
        tabindex="0"
        role="region"
        [attr.aria-label]="'Stops of ' + route().name + ', scrollable'"
      >
        <table>
          <caption class="fc-visually-hidden">
            Stops of
            {{
              route().name
            }}
          </caption>
          <thead>
            <tr>
              <th scope="col">Stop</th>
              <th scope="col" class="num">Quota</th>
              <th scope="col" class="num">Completed</th>
              <th scope="col" class="num">Accepted</th>
              <th scope="col" class="num">Flagged</th>
            </tr>
          </thead>
          <tbody>
            @for (point of route().points; track point.pointId) {
              <tr [class.route-progress__done]="point.completed >= point.quota">
                <th scope="row">
                  {{ point.position }}. {{ point.code }} <span>{{ point.name }}</span>
                </th>
                <td class="num">{{ point.quota }}</td>
                <td class="num">{{ point.completed }}</td>
                <td class="num">{{ point.accepted }}</td>
                <td class="num">{{ point.flagged }}</td>
              </tr>
            }
          </tbody>
        </table>
      </div>
    </section>
  `,
  styleUrl: './progress-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgressTable {
  readonly route = input.required<RouteProgress>();
  protected readonly share = quotaShare;
  protected readonly formatDay = formatDay;
}
