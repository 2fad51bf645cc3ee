import type { SyncPhase } from './outbox-sync';

/** How the sync state reads on the sync page and in the toolbar. */
export const syncPhaseWords: Readonly<Record<SyncPhase, string>> = {
  idle: 'Up to date with the server',
  syncing: 'Syncing…',
  offline: 'No network: work is kept on this device',
  retrying: 'Sync failed; trying again soon',
  failed: 'Sync stopped',
};
