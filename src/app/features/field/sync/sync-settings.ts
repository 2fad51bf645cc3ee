import { InjectionToken } from '@angular/core';
import { defaultRetryPolicy, type RetryPolicy } from './retry-delay';

/** How often and how patiently the device syncs; replaced in unit specs. */
export interface SyncSettings {
  /** A sync is tried this often while the app is open and online. */
  readonly periodMs: number;
  readonly retry: RetryPolicy;
  /** Source of the jitter, [0, 1). */
  readonly random: () => number;
}

export const SYNC_SETTINGS = new InjectionToken<SyncSettings>('field sync settings', {
  factory: () => ({ periodMs: 2 * 60_000, retry: defaultRetryPolicy, random: Math.random }),
});
