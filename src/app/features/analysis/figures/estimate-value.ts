import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { EstimatedFigure } from '@shared/analysis/estimated-figure';
import { levelLabel, type FigureFormat, type FigureUnit } from './figure-format';

/**
 * A figure as every screen shows it: the value, the word "estimate", and its interval (or why it
 * has none), so no number appears as if it were known exactly.
 */
@Component({
  selector: 'app-estimate-value',
  template: `
    <span class="estimate__value">{{ value() }}</span>
    <span class="estimate__tag">estimate</span>
    @if (interval(); as range) {
      <span class="estimate__interval">{{ level() }} interval {{ range }}</span>
    } @else if (figure().note; as note) {
      <span class="estimate__interval">{{ note }}</span>
    }
  `,
  styles: `
    :host {
      display: inline-flex;
      flex-wrap: wrap;
      align-items: baseline;
      gap: 0 8px;
    }
    .estimate__value {
      font: var(--mat-sys-title-large);
      font-variant-numeric: tabular-nums;
    }
    .estimate__tag {
      font: var(--mat-sys-label-small);
      text-transform: uppercase;
      letter-spacing: 0.06em;
      padding: 1px 6px;
      border-radius: 6px;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    .estimate__interval {
      flex-basis: 100%;
      font: var(--mat-sys-body-medium);
      color: var(--mat-sys-on-surface-variant);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EstimateValue {
  readonly figure = input.required<EstimatedFigure>();
  readonly unit = input.required<FigureUnit>();
  readonly format = input.required<FigureFormat>();
  readonly confidenceLevel = input.required<number>();

  protected readonly value = computed(() =>
    this.format().value(this.figure().estimate, this.unit()),
  );
  protected readonly interval = computed(() =>
    this.format().interval(this.figure().low, this.figure().high, this.unit()),
  );
  protected readonly level = computed(() => levelLabel(this.confidenceLevel()));
}
