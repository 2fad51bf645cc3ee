import { eq } from 'drizzle-orm';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import type { Executor } from '../../db/database';
import { studies } from '../../db/schema';
import { notFound } from '../../http/http-error';
import type { AnalysisDataset } from '../analysis-dataset';
import { respondentWeights } from '../respondent-weights';
import type { PreparedFit } from '../run-fit';
import { cellRespondents } from './cell-patterns';
import { blockDesign } from './design-levels';
import { frequencyTable, type StatedMethod } from './stated-cell';
import { statedCellsQuery, type StatedCellsAnswer } from './stated-cells-query';
import { statedTables } from './stated-tables';

/** Whether a spec's method fits from the frequency table of its typed rows. */
export const isStated = (spec: FitSpec): spec is FitSpec & { method: StatedMethod } =>
  spec.method !== 'observed-prices';

/**
 * A stated-preference fit's data from the database: the frequency table of the typed rows the
 * filters match (one query; no answer leaves the database, only the cells), the blocks' design,
 * the data hash over exactly the rows counted, and the raking weights of the cells. What comes
 * to this process grows with the distinct answers, not with the interviews.
 */
export async function prepareTabulatedFit(
  db: Executor,
  studyId: string,
  spec: FitSpec & { method: StatedMethod },
): Promise<PreparedFit> {
  const [study] = await db
    .select({ currency: studies.currency })
    .from(studies)
    .where(eq(studies.id, studyId));
  if (!study) throw notFound('That study');
  const digits = minorUnitDigits(study.currency);
  const answer = (await db.execute(statedCellsQuery(studyId, spec)))
    .rows[0] as unknown as StatedCellsAnswer;
  const respondents = cellRespondents(spec.method, answer.cells, digits, spec.weighting !== null);
  const { rows, profiles } = frequencyTable(respondents);
  const used = respondents.reduce((s, r) => s + r.count, 0);
  const design = await blockDesign(db, answer.blocks, digits);
  if (design.bounds.size > 1) {
    throw new EstimationError(
      'invalid-value',
      'the dichotomous-choice blocks of these interviews mix single and double bounds; choose one block',
      'blockId',
    );
  }
  const left = answer.matched - used;
  const dataset: AnalysisDataset = {
    method: spec.method,
    rows,
    blockIds: design.blockIds,
    designLevels: design.designLevels,
    bounds: design.bounds.size === 1 ? [...design.bounds][0] : null,
    profiles,
    interviewsMatched: answer.matched,
    skipped: left > 0 ? [{ reason: statedTables[spec.method].missing, count: left }] : [],
  };
  if (rows.length === 0) {
    const why = dataset.skipped.map((s) => `${s.count}: ${s.reason}`).join('; ');
    throw new EstimationError(
      'too-few-observations',
      `none of the ${dataset.interviewsMatched} interviews the filters match has answers for this method` +
        (why ? ` (${why})` : ''),
      'filters',
    );
  }
  return {
    dataset,
    dataHash: answer.hash,
    weights: respondentWeights(dataset, spec.weighting),
    currency: study.currency,
  };
}
