import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { greatCircleDistanceM } from '@shared/field-sync/quality/great-circle-distance';
import { plotLayout, type Position } from './position-plot-geometry';
import { formatMetres } from './review-words';

const size = 240;

/**
 * The assigned point and where the device stood, drawn to scale with the distance between
 * them — no map tiles, so nothing about the respondent's place leaves the server.
 */
@Component({
  selector: 'app-position-plot',
  template: `
    <figure class="plot">
      <svg [attr.viewBox]="'0 0 ' + size + ' ' + size" role="img" [attr.aria-label]="description()">
        <rect x="0" y="0" [attr.width]="size" [attr.height]="size" class="plot__ground" />
        @if (layout(); as l) {
          @if (l.accuracyRadius > 0) {
            <circle
              [attr.cx]="l.device.x"
              [attr.cy]="l.device.y"
              [attr.r]="l.accuracyRadius"
              class="plot__accuracy"
            />
          }
          <line
            [attr.x1]="l.point.x"
            [attr.y1]="l.point.y"
            [attr.x2]="l.device.x"
            [attr.y2]="l.device.y"
            class="plot__line"
          />
          <rect
            [attr.x]="l.point.x - 7"
            [attr.y]="l.point.y - 7"
            width="14"
            height="14"
            class="plot__point"
          />
          <circle [attr.cx]="l.device.x" [attr.cy]="l.device.y" r="7" class="plot__device" />
          <line
            x1="12"
            [attr.x2]="12 + l.scaleBar.length"
            [attr.y1]="size - 14"
            [attr.y2]="size - 14"
            class="plot__scale"
          />
          <text x="12" [attr.y]="size - 20" class="plot__text">
            {{ metres(l.scaleBar.metres) }}
          </text>
          <text x="12" y="20" class="plot__text">N ↑</text>
        }
      </svg>
      <figcaption>
        <span class="plot__key plot__key--point"></span> Assigned point
        <span class="plot__key plot__key--device"></span> Interview position ·
        <strong>{{ metres(distance()) }}</strong> apart
      </figcaption>
    </figure>
  `,
  styles: `
    .plot {
      margin: 0;
      max-width: 320px;
    }
    svg {
      width: 100%;
      height: auto;
      display: block;
      border-radius: 12px;
    }
    .plot__ground {
      fill: var(--mat-sys-surface-container);
    }
    .plot__accuracy {
      fill: color-mix(in srgb, var(--mat-sys-tertiary) 18%, transparent);
      stroke: var(--mat-sys-tertiary);
      stroke-dasharray: 4 3;
    }
    .plot__line {
      stroke: var(--mat-sys-on-surface-variant);
      stroke-width: 2;
      stroke-dasharray: 6 4;
    }
    .plot__point {
      fill: var(--mat-sys-primary);
    }
    .plot__device {
      fill: var(--mat-sys-error);
    }
    .plot__scale {
      stroke: var(--mat-sys-on-surface);
      stroke-width: 3;
    }
    .plot__text {
      font:
        12px 'Fira Sans',
        sans-serif;
      fill: var(--mat-sys-on-surface);
    }
    figcaption {
      margin-top: 8px;
      font: var(--mat-sys-body-medium);
    }
    .plot__key {
      display: inline-block;
      width: 12px;
      height: 12px;
      margin: 0 4px 0 8px;
      vertical-align: middle;
    }
    .plot__key--point {
      background: var(--mat-sys-primary);
    }
    .plot__key--device {
      background: var(--mat-sys-error);
      border-radius: 50%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PositionPlot {
  readonly point = input.required<Position>();
  readonly device = input.required<Position>();
  readonly accuracyM = input<number | null>(null);

  protected readonly size = size;
  protected readonly metres = formatMetres;
  protected readonly layout = computed(() =>
    plotLayout(this.point(), this.device(), this.accuracyM(), size),
  );
  protected readonly distance = computed(() => greatCircleDistanceM(this.point(), this.device()));
  protected readonly description = computed(
    () =>
      `The interview was recorded ${formatMetres(this.distance())} from the assigned point` +
      (this.accuracyM() === null
        ? '.'
        : `, with a fix accurate to ${Math.round(this.accuracyM()!)} m.`),
  );
}
