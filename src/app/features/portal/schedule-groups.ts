import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { currentVersionIds } from '../analysis/publish/current-versions';

/**
 * A version no longer in force, with the newer version of the same schedule that took its place:
 * the correction that names it, or else the newest version published under its title.
 */
export interface EarlierVersion {
  readonly version: ScheduleVersionSummary;
  readonly newer: ScheduleVersionSummary;
  readonly corrected: boolean;
}

/** One study's published schedules: the versions in force first, then the earlier ones. */
export interface StudySchedules {
  readonly studyId: string;
  readonly studyName: string;
  readonly productName: string;
  readonly current: readonly ScheduleVersionSummary[];
  readonly earlier: readonly EarlierVersion[];
}

/** Groups published versions by study, studies by name, versions newest first. */
export function groupByStudy(versions: readonly ScheduleVersionSummary[]): StudySchedules[] {
  const byStudy = new Map<string, ScheduleVersionSummary[]>();
  for (const version of versions) {
    byStudy.set(version.studyId, [...(byStudy.get(version.studyId) ?? []), version]);
  }
  return [...byStudy.values()]
    .map(studySchedules)
    .sort((a, b) => a.studyName.localeCompare(b.studyName));
}

function studySchedules(list: readonly ScheduleVersionSummary[]): StudySchedules {
  const sorted = [...list].sort((a, b) => b.version - a.version);
  const inForce = currentVersionIds(sorted);
  const current: ScheduleVersionSummary[] = [];
  const earlier: EarlierVersion[] = [];
  for (const version of sorted) {
    const newer = inForce.has(version.id) ? undefined : newerOf(version, sorted, inForce);
    // Only a newer version of the same schedule makes one earlier; without it the client would
    // lose sight of a version that is still the latest they have.
    if (newer) earlier.push({ version, newer, corrected: newer.id === version.replacedById });
    else current.push(version);
  }
  const [first] = sorted;
  return { ...studyOf(first), current, earlier };
}

function newerOf(
  version: ScheduleVersionSummary,
  sorted: readonly ScheduleVersionSummary[],
  inForce: ReadonlySet<string>,
): ScheduleVersionSummary | undefined {
  if (version.replacedById) return sorted.find((v) => v.id === version.replacedById);
  const title = titleKey(version.title);
  return sorted.find(
    (v) => inForce.has(v.id) && v.version > version.version && titleKey(v.title) === title,
  );
}

// The same comparison current-versions makes, so both screens agree on what one schedule is.
const titleKey = (title: string) => title.trim().toLowerCase();

const studyOf = ({ studyId, studyName, productName }: ScheduleVersionSummary) => ({
  studyId,
  studyName,
  productName,
});
