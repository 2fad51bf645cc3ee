import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { qualityFlagLabels } from '@shared/field-sync/quality/quality-flag';
import type { InterviewStatus } from '@shared/interviews/interview-status';

export const statusLabels: Readonly<Record<InterviewStatus, string>> = {
  received: 'Received',
  flagged: 'Flagged',
  accepted: 'Accepted',
  returned: 'Returned',
  rejected: 'Rejected',
};

/** A flag's label with the figure that raised it, as the supervisor reads it. */
export function flagDetail(flag: QualityFlag): string {
  const label = qualityFlagLabels[flag.kind];
  switch (flag.kind) {
    case 'gps-far':
      return `${label}: ${formatMetres(flag.distanceM)} away (limit ${formatMetres(flag.maxDistanceM)}${
        flag.accuracyM === null ? '' : `, fix accurate to ${Math.round(flag.accuracyM)} m`
      })`;
    case 'too-short':
      return `${label}: ${flag.secondsPerBlock.toFixed(1)} s per answered block (at least ${flag.minSecondsPerBlock} s expected)`;
    case 'straight-lining':
      return `${label}: "${flag.response}" at all ${flag.steps} prices of ${flag.blockId}`;
    case 'thresholds-out-of-order':
      return `${label} in ${flag.blockId}: ${flag.violations
        .map((v) => `${v.lower} above ${v.higher}`)
        .join(', ')}`;
    case 'duplicate-respondent':
      return `${label}: same respondent as ${flag.otherInterviewIds.map(interviewReference).join(', ')}`;
  }
}

/** An interview named in words by the first group of its id, as supervisors quote it. */
export function interviewReference(id: string): string {
  return `interview ${id.slice(0, 8)}`;
}

/** Metres below a kilometre, kilometres with one decimal above. */
export function formatMetres(metres: number): string {
  return metres < 1000 ? `${Math.round(metres)} m` : `${(metres / 1000).toFixed(1)} km`;
}

/** "4 min 05 s" for a duration in seconds. */
export function formatDuration(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  const minutes = Math.floor(whole / 60);
  const rest = String(whole % 60).padStart(2, '0');
  return minutes > 0 ? `${minutes} min ${rest} s` : `${whole} s`;
}
