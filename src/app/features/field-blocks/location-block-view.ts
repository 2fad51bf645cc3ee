import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  inject,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import type { Subscription } from 'rxjs';
import type { LocationAnswer, LocationBlock } from '@shared/questionnaire/blocks/location-block';
import { GpsReader, type PositionFix } from '../field/capture/gps-reader';

/**
 * The device's position: it listens while the fix improves, says how accurate it is against the
 * block's target, and records the fix the enumerator keeps (a poor one is kept with its accuracy).
 */
@Component({
  selector: 'app-location-block-view',
  imports: [MatButton, MatIcon],
  template: `
    @if (answer(); as kept) {
      <p class="location__kept" role="status">
        <mat-icon aria-hidden="true">where_to_vote</mat-icon>
        Position recorded, accurate to {{ kept.accuracyMetres }} m.
      </p>
    }
    @if (latest(); as fix) {
      <p class="bv-hint" role="status">
        Current fix: accurate to {{ fix.accuracyMetres }} m
        {{
          fix.accuracyMetres <= block().targetAccuracyMetres
            ? '(good enough)'
            : '(waiting for ' + block().targetAccuracyMetres + ' m)'
        }}
      </p>
    }
    @if (problem(); as message) {
      <p class="bv-error" role="alert">{{ message }}</p>
    }
    <div class="location__actions">
      @if (!listening()) {
        <button mat-stroked-button type="button" class="location__button" (click)="listen()">
          <mat-icon aria-hidden="true">my_location</mat-icon>
          {{ answer() ? 'Record again' : 'Find the position' }}
        </button>
      } @else {
        <button
          mat-flat-button
          type="button"
          class="location__button"
          [disabled]="!latest()"
          (click)="keep()"
        >
          Keep this position
        </button>
      }
    </div>
  `,
  styleUrl: './block-view.scss',
  styles: `
    .location__kept {
      display: flex;
      align-items: center;
      gap: 8px;
      font: var(--mat-sys-title-medium);
    }
    .location__button {
      min-height: 56px;
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LocationBlockView {
  private readonly gps = inject(GpsReader);
  private watching: Subscription | null = null;

  readonly block = input.required<LocationBlock>();
  readonly answer = input<LocationAnswer | undefined>();
  readonly labelledBy = input<string>('');
  readonly answerChange = output<LocationAnswer | undefined>();

  protected readonly latest = signal<PositionFix | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly listening = signal(false);

  constructor() {
    inject(DestroyRef).onDestroy(() => this.watching?.unsubscribe());
  }

  protected listen(): void {
    this.problem.set(null);
    this.listening.set(true);
    this.watching?.unsubscribe();
    this.watching = this.gps.watch().subscribe((reading) => {
      if (reading.ok) this.latest.set(reading.fix);
      else this.problem.set(reading.message);
      if (!reading.ok && reading.problem === 'denied') this.stop();
    });
  }

  protected keep(): void {
    const fix = this.latest();
    if (!fix) return;
    this.answerChange.emit({ ...fix });
    this.stop();
  }

  private stop(): void {
    this.watching?.unsubscribe();
    this.watching = null;
    this.listening.set(false);
  }
}
