/** The kinds of value a raw-data column holds, as the data dictionary names them. */
export const rawColumnTypes = [
  'text',
  'integer',
  'number',
  'boolean',
  'timestamp',
  'date',
  'uuid',
  'url',
] as const;
export type RawColumnType = (typeof rawColumnTypes)[number];

/** One column of the raw-data download, as the data dictionary explains it. */
export interface RawColumn {
  readonly name: string;
  readonly type: RawColumnType;
  readonly description: string;
  /** Currency code, `seconds`, `metres`, `degrees`, a pack unit… or null when unitless. */
  readonly unit: string | null;
  /** The values the column may hold, when it is a closed list. */
  readonly allowed: readonly string[] | null;
  /** Questionnaire version numbers that have this column; null for every interview's columns. */
  readonly questionnaireVersions: readonly number[] | null;
}
