import type { QualityFlag } from './quality-flag';
import { qualityThresholds } from './quality-thresholds';

/**
 * Flags an interview that took fewer than `minSecondsPerBlock` seconds per answered block
 * (from the device's start to end time). No flag when nothing was answered.
 */
export function tooShortFlag(
  startedAt: string,
  finishedAt: string,
  answeredBlocks: number,
  minSecondsPerBlock: number = qualityThresholds.minSecondsPerAnsweredBlock,
): QualityFlag | null {
  if (answeredBlocks <= 0) return null;
  const durationSeconds = (Date.parse(finishedAt) - Date.parse(startedAt)) / 1000;
  const secondsPerBlock = durationSeconds / answeredBlocks;
  if (secondsPerBlock >= minSecondsPerBlock) return null;
  return {
    kind: 'too-short',
    durationSeconds,
    answeredBlocks,
    secondsPerBlock,
    minSecondsPerBlock,
  };
}
