import { frequencyResamples } from '@shared/estimation/resampling/frequency-resamples';
import { respondentResamples } from '@shared/estimation/resampling/respondent-bootstrap';

/** A respondent, or a frequency-table cell of `count` alike respondents carrying their weight. */
interface Resampled {
  readonly weight?: number;
  readonly count?: number;
}

/** The seed of respondent resampling, the same for single respondents and for cells. */
const RESAMPLE_SEED = 20_261_202;

/**
 * Respondent resamples of a method's answers (see respondentResamples). When the answers are a
 * frequency table's cells, each resample is a seeded multinomial draw of how many respondents
 * each cell gives (the same distribution, at a cost that grows with the cells, not with the
 * respondents), handed to `compute` as the drawn cells with their weight scaled to the draw.
 */
export function resampleRespondents<T extends Resampled, R>(
  answers: readonly T[],
  compute: (sample: readonly T[]) => R,
  resamples: number,
): (R | null)[] {
  if (answers.every((a) => a.count === undefined)) {
    return respondentResamples(answers, compute, resamples, RESAMPLE_SEED);
  }
  const counts = answers.map((a) => a.count ?? 1);
  return frequencyResamples(
    counts,
    (drawn) => {
      const sample: T[] = [];
      drawn.forEach((times, k) => {
        if (times === 0) return;
        const cell = answers[k];
        const weight = ((cell.weight ?? 1) * times) / counts[k];
        sample.push({ ...cell, weight, count: times });
      });
      return compute(sample);
    },
    resamples,
    RESAMPLE_SEED,
  );
}
