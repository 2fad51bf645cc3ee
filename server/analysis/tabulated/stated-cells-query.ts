import { sql, type SQL } from 'drizzle-orm';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { statedFilter } from './stated-filter';
import type { StatedMethod } from './stated-cell';
import { statedTables } from './stated-tables';

/** One cell of the frequency table as the database sends it (answers in minor units). */
export type CellRecord = Record<string, string | number | boolean | null> & {
  readonly n: number;
  readonly region: string | null;
  readonly income_band: string | null;
  readonly household_people: number | null;
};

export interface StatedCellsAnswer {
  readonly cells: CellRecord[];
  /** sha256 (hex) of the method and each used interview's row text hashed, in interview order. */
  readonly hash: string;
  /** The [questionnaire version, block] pairs the rows come from. */
  readonly blocks: [string, string][];
  /** Interviews the filters match, whether or not they answered this method. */
  readonly matched: number;
}

/**
 * One query for everything a stated-preference fit reads: the typed rows of the block the spec
 * names (or the first of its kind) of the accepted interviews the filters match, one row per
 * respondent, counted by identical answers (and raking levels when the fit rakes) — the
 * frequency table the estimators run on; the data hash over exactly those rows; the blocks
 * they answer; and how many interviews the filters match. Rows never leave the database.
 */
export function statedCellsQuery(studyId: string, spec: FitSpec & { method: StatedMethod }): SQL {
  const table = statedTables[spec.method];
  const rakes = spec.weighting !== null;
  const levels = rakes
    ? sql.raw('sampling_points.stratum AS region, s.income_band, s.household_people')
    : sql.raw('NULL::text AS region, NULL::text AS income_band, NULL::integer AS household_people');
  const block = spec.blockId ? sql`s.block_id = ${spec.blockId}` : sql`s.block_rank = 0`;
  const filters = statedFilter(studyId, spec.filters);
  const answerColumns = sql.join(
    table.columns.map((c) => sql`${c.expression} AS ${sql.identifier(c.name)}`),
    sql`, `,
  );
  const names = sql.join(
    table.columns.map((c) => sql.identifier(c.name)),
    sql`, `,
  );
  const perRespondent = table.grouped
    ? sql`GROUP BY s.interview_id, s.questionnaire_version_id, s.block_id, s.scale${
        rakes ? sql.raw(', sampling_points.stratum, s.income_band, s.household_people') : sql``
      }`
    : sql``;
  return sql`
    WITH per AS MATERIALIZED (
      SELECT s.interview_id, s.questionnaire_version_id, s.block_id, ${answerColumns}, ${levels}
      FROM ${table.table} s
      LEFT JOIN sampling_points ON sampling_points.id = s.point_id
      WHERE ${block} AND ${filters}
      ${perRespondent}
    ), cells AS (
      SELECT ${names}, region, income_band, household_people, count(*)::int AS n
      FROM per GROUP BY ${names}, region, income_band, household_people
    )
    SELECT
      (SELECT coalesce(json_agg(cells), '[]'::json) FROM cells) AS cells,
      (SELECT encode(sha256(convert_to(${spec.method} || ':' ||
          coalesce(string_agg(md5(per::text), '' ORDER BY per.interview_id), ''), 'UTF8')), 'hex')
       FROM per) AS hash,
      (SELECT coalesce(jsonb_agg(DISTINCT jsonb_build_array(questionnaire_version_id, block_id)), '[]'::jsonb)
       FROM per) AS blocks,
      (SELECT count(*)::int FROM stated_interviews s
       LEFT JOIN sampling_points ON sampling_points.id = s.point_id
       WHERE ${filters}) AS matched`;
}
