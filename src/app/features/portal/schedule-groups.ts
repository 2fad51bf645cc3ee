import type { ScheduleVersionSummary } from '@shared/analysis/schedule-version';
import { currentVersionIds } from '../analysis/publish/current-versions';

/** One study's published schedules: the versions in force first, then the replaced ones. */
export interface StudySchedules {
  readonly studyId: string;
  readonly studyName: string;
  readonly productName: string;
  readonly current: readonly ScheduleVersionSummary[];
  readonly replaced: readonly ScheduleVersionSummary[];
}

/** Groups published versions by study, studies by name, versions newest first. */
export function groupByStudy(versions: readonly ScheduleVersionSummary[]): StudySchedules[] {
  const byStudy = new Map<string, ScheduleVersionSummary[]>();
  for (const version of versions) {
    byStudy.set(version.studyId, [...(byStudy.get(version.studyId) ?? []), version]);
  }
  return [...byStudy.values()]
    .map((list) => {
      const sorted = [...list].sort((a, b) => b.version - a.version);
      const inForce = currentVersionIds(sorted);
      return {
        studyId: sorted[0].studyId,
        studyName: sorted[0].studyName,
        productName: sorted[0].productName,
        current: sorted.filter((v) => inForce.has(v.id)),
        replaced: sorted.filter((v) => !inForce.has(v.id)),
      };
    })
    .sort((a, b) => a.studyName.localeCompare(b.studyName));
}
