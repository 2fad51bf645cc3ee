/**
 * The limits the automatic quality checks use. They are Fieldcurve's own choices (common
 * practice in field survey checking, not taken from a published standard); each flag records
 * the limit it was tested against, so a stored flag stays readable if a limit changes.
 */
export const qualityThresholds = {
  /** An interview is too short below this many seconds per answered block (consent included). */
  minSecondsPerAnsweredBlock: 5,
  /** A ladder with at least this many answered prices, all with one answer, is straight-lined. */
  minStraightLadderSteps: 4,
  /** The device's fix is far from the point beyond this great-circle distance, in metres. */
  maxMetresFromPoint: 250,
} as const;
