import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';

/** The result of one probe, in the shape the health report gives it. */
export interface DependencyCheck {
  readonly ok: boolean;
  readonly latencyMs: number;
  readonly detail: string;
}

/** One outside service: working or not, how fast it answered, and what it said. */
@Component({
  selector: 'app-dependency-card',
  imports: [MatCardModule, MatIcon],
  templateUrl: './dependency-card.html',
  styleUrl: './dependency-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.dependency--failed]': '!check().ok' },
})
export class DependencyCard {
  readonly title = input.required<string>();
  readonly purpose = input.required<string>();
  readonly icon = input.required<string>();
  readonly check = input.required<DependencyCheck>();
}
