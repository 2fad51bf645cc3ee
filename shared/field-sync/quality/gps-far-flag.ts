import type { InterviewAnswers } from '../../questionnaire/answer';
import type { Block } from '../../questionnaire/block';
import type { LocationAnswer } from '../../questionnaire/blocks/location-block';
import type { GpsFix } from '../field-interview';
import { greatCircleDistanceM, type LatLng } from './great-circle-distance';
import type { QualityFlag } from './quality-flag';
import { qualityThresholds } from './quality-thresholds';

/**
 * The fix an interview was taken at: the device's interview-level fix when it sent one, else
 * the first answered location block. Null when there is neither.
 */
export function interviewFix(
  gps: GpsFix | undefined,
  blocks: readonly Block[],
  answers: InterviewAnswers,
): GpsFix | null {
  if (gps) return gps;
  for (const block of blocks) {
    if (block.kind !== 'location') continue;
    const answer = answers[block.id] as LocationAnswer | undefined;
    if (answer) {
      const { latitude, longitude, accuracyMetres } = answer;
      return { latitude, longitude, accuracyM: accuracyMetres };
    }
  }
  return null;
}

/**
 * Flags a fix farther than `maxDistanceM` metres (great circle) from the assigned point, and
 * records the distance and the fix's stated accuracy so the reviewer can weigh a poor fix.
 */
export function gpsFarFlag(
  fix: GpsFix | null,
  point: LatLng,
  maxDistanceM: number = qualityThresholds.maxMetresFromPoint,
): QualityFlag | null {
  if (!fix) return null;
  const distanceM = Math.round(greatCircleDistanceM(fix, point) * 10) / 10;
  if (distanceM <= maxDistanceM) return null;
  return { kind: 'gps-far', distanceM, accuracyM: fix.accuracyM, maxDistanceM };
}
