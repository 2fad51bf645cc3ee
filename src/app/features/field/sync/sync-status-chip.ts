import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { OutboxSync } from './outbox-sync';
import { SyncOverviewSource } from './sync-overview';
import { syncPhaseWords } from './sync-phase-words';

/**
 * The toolbar's compact sync state for enumerators: how much waits, or that all is sent, or
 * that the device is offline. It also starts the background sync on every signed-in page.
 */
@Component({
  selector: 'app-sync-status-chip',
  imports: [MatButton, MatIcon, RouterLink],
  template: `
    <a mat-button class="chip" routerLink="/field/sync" [attr.aria-label]="label()">
      <mat-icon aria-hidden="true">{{ icon() }}</mat-icon>
      <span aria-hidden="true">{{ short() }}</span>
    </a>
  `,
  styles: `
    .chip {
      min-height: 48px;
      min-width: 48px;
      color: inherit;
      --mat-button-text-label-text-color: currentColor;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncStatusChip {
  private readonly sync = inject(OutboxSync);
  private readonly overview = toSignal(inject(SyncOverviewSource).watch());

  private readonly waiting = computed(() => this.overview()?.unsent ?? 0);
  private readonly attention = computed(() => {
    const o = this.overview();
    return o ? o.returned.length + o.rejected.length : 0;
  });

  protected readonly icon = computed(() => {
    if (this.attention() > 0) return 'assignment_late';
    if (this.sync.phase() === 'offline') return 'cloud_off';
    if (this.sync.phase() === 'syncing') return 'sync';
    return this.waiting() > 0 ? 'cloud_upload' : 'cloud_done';
  });
  protected readonly short = computed(() => {
    const waiting = this.waiting();
    return waiting > 0 ? String(waiting) : '';
  });
  protected readonly label = computed(() => {
    const o = this.overview();
    const parts = [`Sync: ${syncPhaseWords[this.sync.phase()]}`];
    if (o) parts.push(`${o.waitingInterviews} interviews and ${o.waitingPhotos} photos waiting`);
    if (this.attention() > 0) parts.push(`${this.attention()} to look at`);
    return parts.join('. ');
  });

  constructor() {
    this.sync.start();
  }
}
