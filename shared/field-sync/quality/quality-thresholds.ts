/**
 * The limits the automatic quality checks use. They are Fieldcurve's own choices (common
 * practice in field survey checking, not taken from a published standard); each flag records
 * the limit it was tested against, so a stored flag stays readable if a limit changes.
 */
export const qualityThresholds = {
  /**
   * An interview is too short below this many seconds per answered block (consent included).
   * Reading a question out and hearing the answer rarely takes under 20 s, and a household
   * interview of about eight blocks is announced to the respondent as about ten minutes: one done
   * in a minute or two was not asked in full. The demo's flagged interviews use this same limit.
   */
  minSecondsPerAnsweredBlock: 20,
  /** A ladder with at least this many answered prices, all with one answer, is straight-lined. */
  minStraightLadderSteps: 4,
  /** The device's fix is far from the point beyond this great-circle distance, in metres. */
  maxMetresFromPoint: 250,
} as const;
