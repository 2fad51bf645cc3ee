/**
 * One thing wrong with a questionnaire definition. `blockIndex` and `blockId` say which block
 * it belongs to (null for the questionnaire as a whole); `path` is the field inside the block
 * (`pricesMinor.2`, `bidDesign.levels.0.afterNoMinor`), empty for the block itself.
 */
export interface QuestionnaireProblem {
  blockIndex: number | null;
  blockId: string | null;
  path: string;
  message: string;
}
