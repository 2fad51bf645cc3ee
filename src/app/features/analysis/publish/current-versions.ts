import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';

/**
 * The ids of the versions in force: not replaced, and the newest of their title. Versions
 * published before the server refused a second schedule under one title can share it; of those
 * only the newest is current.
 */
export function currentVersionIds(versions: readonly ScheduleVersionSummary[]): Set<string> {
  const newestByTitle = new Map<string, ScheduleVersionSummary>();
  for (const v of versions) {
    if (v.replacedById) continue;
    const key = v.title.trim().toLowerCase();
    const held = newestByTitle.get(key);
    if (!held || v.version > held.version) newestByTitle.set(key, v);
  }
  return new Set([...newestByTitle.values()].map((v) => v.id));
}
