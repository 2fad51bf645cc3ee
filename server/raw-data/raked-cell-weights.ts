import { sql } from 'drizzle-orm';
import type { WeightingSpec } from '@shared/analysis/weighting-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { rake } from '@shared/estimation/weighting/raking';
import type { Block } from '@shared/questionnaire/block';
import type { LayoutVersion } from '@shared/raw-data/raw-data-layout';
import { respondentProfile } from '../analysis/respondent-profile';
import type { Executor } from '../db/database';
import { HttpError } from '../http/http-error';
import type { RawDataSource } from './raw-data-source';

/** The raking weight of each downloaded interview, read from its answers and region. */
export interface InterviewWeights {
  weightOf(
    versionId: string,
    answers: Readonly<Record<string, unknown>>,
    region: string | null,
  ): number;
}

/**
 * Rakes the matched interviews to the researcher's margins without holding them: every
 * interview in the same cell (the same level of every raked variable) gets the same weight under
 * raking, so the database counts the cells and raking runs on those counts as base weights. The
 * weights are those of raking each interview (same iterations, same result), scaled to sum to
 * the number of interviews.
 */
export async function rakedCellWeights(
  db: Executor,
  source: RawDataSource,
  weighting: WeightingSpec,
): Promise<InterviewWeights> {
  const variables = weighting.margins.map((m) => m.variable);
  const blocksOf = new Map(source.versions.map((v) => [v.id, v.blocks]));
  const cellOf = (
    versionId: string,
    answers: Readonly<Record<string, unknown>>,
    region: string | null,
  ) => {
    const profile = respondentProfile(
      {
        id: '',
        finishedAt: '',
        routeId: null,
        pointId: null,
        region,
        answers,
        blocks: blocksOf.get(versionId) ?? [],
      },
      source.digits,
    );
    return variables.map((v) => profile.levels[v]);
  };
  const counts = new Map<string, { levels: string[]; count: number }>();
  for (const group of await cellCounts(db, source)) {
    const levels = cellOf(group.versionId, groupAnswers(source.versions, group), group.region);
    const key = JSON.stringify(levels);
    const cell = counts.get(key) ?? { levels, count: 0 };
    cell.count += group.count;
    counts.set(key, cell);
  }
  const cells = [...counts.entries()];
  refuseEmptiedLevels(
    weighting,
    cells.map(([, cell]) => cell.levels),
  );
  const total = cells.reduce((sum, [, cell]) => sum + cell.count, 0);
  if (total === 0) return { weightOf: () => 1 };
  const raked = rakeOrRefuse({
    variables: Object.fromEntries(
      variables.map((name, j) => [name, cells.map(([, cell]) => cell.levels[j])]),
    ),
    targets: Object.fromEntries(weighting.margins.map((m) => [m.variable, m.targets])),
    baseWeights: cells.map(([, cell]) => cell.count),
    maxIterations: weighting.maxIterations ?? 100,
    tolerance: 1e-9,
  });
  // Raking returns cell totals summing to the number of cells; spread each over its interviews.
  const perInterview = new Map(
    cells.map(([key, cell], i) => [key, ((raked[i] / cell.count) * total) / cells.length]),
  );
  return {
    weightOf: (versionId, answers, region) =>
      perInterview.get(JSON.stringify(cellOf(versionId, answers, region))) ?? 1,
  };
}

interface CellGroup {
  versionId: string;
  region: string | null;
  band: string | null;
  people: string | null;
  count: number;
}

/** Matched interviews counted by version, region, income-band answer and household size. */
async function cellCounts(db: Executor, source: RawDataSource): Promise<CellGroup[]> {
  if (source.versions.length === 0) return [];
  const keys = source.versions.map(
    (v) =>
      sql`(${v.id}::uuid, ${firstOf(v.blocks, 'income-band') ?? null}::text, ${firstOf(v.blocks, 'household-size') ?? null}::text)`,
  );
  const result = await db.execute<Record<string, unknown>>(sql`
    SELECT interviews.questionnaire_version_id AS version_id, sampling_points.stratum AS region,
      interviews.answers -> keys.income ->> 'band' AS band,
      interviews.answers -> keys.household ->> 'people' AS people, count(*) AS count
    FROM interviews
    LEFT JOIN sampling_points ON sampling_points.id = interviews.point_id
    JOIN (VALUES ${sql.join(keys, sql`, `)}) AS keys (version_id, income, household)
      ON keys.version_id = interviews.questionnaire_version_id
    WHERE ${source.where}
    GROUP BY 1, 2, 3, 4`);
  return result.rows.map((row) => ({
    versionId: String(row['version_id']),
    region: (row['region'] as string | null) ?? null,
    band: (row['band'] as string | null) ?? null,
    people: (row['people'] as string | null) ?? null,
    count: Number(row['count']),
  }));
}

function firstOf(blocks: readonly Block[], kind: Block['kind']): string | undefined {
  return blocks.find((b) => b.kind === kind)?.id;
}

/** The answers a cell group stands for, as the respondent profile reads them. */
function groupAnswers(
  versions: readonly LayoutVersion[],
  group: CellGroup,
): Record<string, unknown> {
  const blocks = versions.find((v) => v.id === group.versionId)?.blocks ?? [];
  const answers: Record<string, unknown> = {};
  const income = firstOf(blocks, 'income-band');
  const household = firstOf(blocks, 'household-size');
  if (income && group.band !== null) answers[income] = { band: group.band };
  if (household && group.people !== null) answers[household] = { people: Number(group.people) };
  return answers;
}

/** A level with interviews but a target of 0 would weight them 0: say so rather than hide them. */
function refuseEmptiedLevels(weighting: WeightingSpec, cellLevels: readonly string[][]): void {
  weighting.margins.forEach((margin, j) => {
    for (const levels of cellLevels) {
      if (margin.targets[levels[j]] !== 0) continue;
      const message = `${margin.variable} = ${levels[j]} has interviews but a target of 0; give it a share or filter them out`;
      throw new HttpError(400, 'invalid-input', `${message}.`, [
        { path: `weighting.margins.${j}.targets.${levels[j]}`, message },
      ]);
    }
  });
}

function rakeOrRefuse(spec: Parameters<typeof rake>[0]): number[] {
  try {
    return rake(spec).weights;
  } catch (error) {
    if (!(error instanceof EstimationError)) throw error;
    throw new HttpError(400, 'invalid-input', `The weighting cannot be met: ${error.message}.`, [
      { path: 'weighting.margins', message: error.message },
    ]);
  }
}
