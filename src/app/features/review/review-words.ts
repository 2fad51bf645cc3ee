import type { QualityFlag } from '@shared/field-sync/quality/quality-flag';
import { qualityFlagLabels } from '@shared/field-sync/quality/quality-flag';
import type { Block } from '@shared/questionnaire/block';
import { thresholdNames } from './threshold-names';

export { interviewStatusLabels as statusLabels } from '@shared/interviews/interview-status';

/**
 * A flag's label with the figure that raised it, as the supervisor reads it. With the
 * questionnaire's blocks at hand a flagged block is named by its question; without them (the
 * queue lists no questionnaire) by its kind, never by its internal id.
 */
export function flagDetail(flag: QualityFlag, blocks: readonly Block[] = []): string {
  const label = qualityFlagLabels[flag.kind];
  switch (flag.kind) {
    case 'gps-far':
      return `${label}: ${formatMetres(flag.distanceM)} away (limit ${formatMetres(flag.maxDistanceM)}${
        flag.accuracyM === null ? '' : `, fix accurate to ${Math.round(flag.accuracyM)} m`
      })`;
    case 'too-short':
      return `${label}: ${flag.secondsPerBlock.toFixed(1)} s per answered block (at least ${flag.minSecondsPerBlock} s expected)`;
    case 'straight-lining':
      return `${label}: "${flag.response}" at all ${flag.steps} prices of ${
        blockName(blocks, flag.blockId) ?? 'the price ladder'
      }`;
    case 'thresholds-out-of-order':
      return `${label} in ${blockName(blocks, flag.blockId) ?? 'the price thresholds question'}: ${flag.violations
        .map((v) => `“${thresholdNames[v.lower]}” above “${thresholdNames[v.higher]}”`)
        .join(', ')}`;
    case 'duplicate-respondent':
      return `${label}: same respondent as ${flag.otherInterviewIds.map(interviewReference).join(', ')}`;
  }
}

/** The question a block puts, quoted and cut to a line; null when the block is not known. */
function blockName(blocks: readonly Block[], blockId: string): string | null {
  const prompt = blocks.find((block) => block.id === blockId)?.prompt.trim();
  if (!prompt) return null;
  const line = prompt.length > 60 ? `${prompt.slice(0, 59).trimEnd()}…` : prompt;
  return `“${line}”`;
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

/** What waits for a supervisor's decision in a study, in words. */
export function pendingWords(pending: number, flagged: number): string {
  if (pending === 0) return 'Nothing waits for a decision.';
  const interviews = `${pending} interview${pending === 1 ? '' : 's'}`;
  return flagged === 0
    ? `${interviews} wait${pending === 1 ? 's' : ''} for a decision.`
    : `${interviews} wait${pending === 1 ? 's' : ''} for a decision, ${flagged} flagged.`;
}
