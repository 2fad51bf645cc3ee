import { and, inArray, sql, type SQL } from 'drizzle-orm';
import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { notStatedLevel } from '@shared/analysis/weighting-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import type { Database } from '../db/database';
import {
  fitDemandInDatabase,
  type InDatabaseDemandFit,
} from '../estimation/demand/in-database-demand-fit';

/**
 * The observed-price fit on shelf observations, run in the database over their typed rows
 * (price per pack unit, units sold per 30 days — the same arithmetic, in the same order, as
 * the in-memory extraction), for the accepted interviews the filters match, with region fixed
 * effects and the chosen errors (clustered by sampling point). Covariates from the respondent
 * profile, raking weights and the peer-price instrument are read from the answers and stay on
 * the in-memory path: such a spec is refused here with the field at fault.
 */
export async function fitShelfInDatabase(
  db: Database,
  studyId: string,
  currency: string,
  spec: FitSpecOf<'observed-prices'>,
): Promise<InDatabaseDemandFit> {
  const unsupported =
    spec.source !== 'shelf'
      ? 'source'
      : spec.covariates.length > 0
        ? 'covariates'
        : spec.weighting !== null
          ? 'weighting'
          : spec.instrument !== 'none'
            ? 'instrument'
            : null;
  if (unsupported) {
    throw new EstimationError(
      'invalid-option',
      `the in-database shelf fit does not take ${unsupported}; it runs on the in-memory path`,
      unsupported,
    );
  }
  const scale = 10 ** minorUnitDigits(currency);
  const firstShelfBlock = sql`(SELECT b->>'id' FROM jsonb_array_elements(v.definition->'blocks') AS b
                                WHERE b->>'kind' = 'shelf-observation' LIMIT 1)`;
  const query = sql`SELECT (r.price_minor / ${scale}::float8) / r.pack_size AS price,
      ((r.quantity * r.pack_size) * 30) / r.period_days AS quantity,
      coalesce(p.stratum, ${notStatedLevel}) AS region,
      coalesce(i.point_id, i.id)::text AS point
    FROM shelf_observation_rows r
    JOIN interviews i ON i.id = r.interview_id
    JOIN questionnaire_versions v ON v.id = i.questionnaire_version_id
    LEFT JOIN sampling_points p ON p.id = i.point_id
    WHERE ${and(...conditions(studyId, spec))}
      AND r.block_id = ${spec.blockId ?? firstShelfBlock}
      AND r.period_days IS NOT NULL`;
  return fitDemandInDatabase(db, {
    source: { query },
    form: spec.form,
    quantity: 'quantity',
    price: 'price',
    covariates: [],
    fixedEffects: spec.regionEffects ? ['region'] : [],
    standardErrors:
      spec.standardErrors === 'cluster-point'
        ? { type: 'cluster', column: 'point' }
        : { type: spec.standardErrors },
    instruments: [],
    confidenceLevel: spec.confidenceLevel,
  });
}

/** The filters of an analysis as SQL over the interview i and its point p. */
function conditions(studyId: string, spec: FitSpecOf<'observed-prices'>): SQL[] {
  const filter = spec.filters;
  const where: SQL[] = [sql`i.study_id = ${studyId}`, sql`i.status = 'accepted'`];
  const day = sql`(i.finished_at at time zone 'UTC')::date`;
  if (filter.from) where.push(sql`${day} >= ${filter.from}::date`);
  if (filter.to) where.push(sql`${day} <= ${filter.to}::date`);
  if (filter.routeIds?.length) where.push(inArray(sql`i.route_id`, filter.routeIds));
  if (filter.regions?.length) where.push(inArray(sql`p.stratum`, filter.regions));
  if (filter.flagged === 'exclude') where.push(sql`i.flags = '[]'::jsonb`);
  return where;
}
