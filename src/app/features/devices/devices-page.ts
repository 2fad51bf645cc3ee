import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButton } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIcon } from '@angular/material/icon';
import { MatProgressBar } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { FieldDevice } from '@shared/field-sync/field-device';
import { catchError, of, switchMap } from 'rxjs';
import { readApiProblem } from '../../core/api-problem';
import { DevicesApi } from './devices-api';

/**
 * One study's field devices: what each last synced and still held, and signing a lost one out
 * (asked first, saying what happens to the interviews still on it).
 */
@Component({
  selector: 'app-devices-page',
  imports: [DatePipe, MatButton, MatCardModule, MatIcon, MatProgressBar, RouterLink],
  templateUrl: './devices-page.html',
  styleUrl: './devices-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DevicesPage {
  private readonly api = inject(DevicesApi);
  /** From the route (`/devices/:studyId`). */
  readonly studyId = input.required<string>();

  protected readonly devices = signal<readonly FieldDevice[]>([]);
  protected readonly loading = signal(true);
  protected readonly problem = signal<string | null>(null);
  protected readonly confirming = signal<string | null>(null);
  protected readonly studyName = toSignal(
    toObservable(this.studyId).pipe(
      switchMap((id) => this.api.study(id)),
      catchError(() => of(null)),
    ),
  );

  constructor() {
    toObservable(this.studyId).subscribe((id) => this.load(id));
  }

  protected load(studyId = this.studyId()): void {
    this.loading.set(true);
    this.problem.set(null);
    this.api.devices(studyId).subscribe({
      next: (devices) => {
        this.devices.set(devices);
        this.loading.set(false);
      },
      error: (error: unknown) => {
        this.problem.set(readApiProblem(error).message);
        this.loading.set(false);
      },
    });
  }

  protected signOut(device: FieldDevice): void {
    this.problem.set(null);
    this.api.signOut(this.studyId(), device.id).subscribe({
      next: (signedOut) => {
        this.confirming.set(null);
        this.devices.update((list) => list.map((d) => (d.id === device.id ? signedOut : d)));
      },
      error: (error: unknown) => this.problem.set(readApiProblem(error).message),
    });
  }
}
