import type { FitSpec } from '@shared/analysis/fit-spec';
import { questionnaireDefinitionSchema } from '@shared/questionnaire/questionnaire-definition';
import { validateQuestionnaire } from '@shared/questionnaire/validate-questionnaire';
import { validateInterviewAnswers } from '@shared/questionnaire/interview-answers';
import type { AnalysisInterview } from '../../analysis/analysis-interview';
import { runFit } from '../../analysis/run-fit';
import { lanternInterviews } from './lantern-interviews';
import { householdBlocks, shelfCheckBlocks } from './lantern-questionnaires';
import { lanternTruths } from './lantern-truths';

const interviews = lanternInterviews();
const asAnalysed: AnalysisInterview[] = interviews.map((i) => ({
  id: i.id,
  finishedAt: i.finishedAt.toISOString(),
  routeId: null,
  pointId: i.site.code,
  region: i.site.region,
  answers: i.answers,
  blocks: i.questionnaire === 'shelf' ? shelfCheckBlocks : householdBlocks,
}));
const input = { interviews: asAnalysed, currency: 'KES' };
const common = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 800, to: 2600, steps: 10 },
  unitCost: 600,
  confidenceLevel: 0.95,
};
const figure = (result: ReturnType<typeof runFit>, label: string) =>
  result.keyFigures.find((f) => f.label.startsWith(label))!;

describe('the solar-lantern demo', () => {
  it('has valid questionnaires and answers every interview validly', () => {
    for (const blocks of [shelfCheckBlocks, householdBlocks]) {
      const definition = questionnaireDefinitionSchema.parse({ blocks });
      expect(validateQuestionnaire(definition)).toEqual([]);
    }
    for (const i of interviews) {
      const blocks = i.questionnaire === 'shelf' ? shelfCheckBlocks : householdBlocks;
      expect(validateInterviewAnswers({ blocks }, i.answers)).toEqual([]);
    }
    expect(interviews.filter((i) => i.questionnaire === 'shelf')).toHaveLength(72);
    expect(interviews.filter((i) => i.questionnaire === 'household')).toHaveLength(240);
    expect(interviews.filter((i) => i.flags.length > 0)).toHaveLength(9);
  });

  it('recovers the shelf elasticity of −1.4 (the demo truth) within its 95 % interval', () => {
    const spec: FitSpec = {
      method: 'observed-prices',
      ...common,
      source: 'shelf',
      form: 'loglog',
      covariates: [],
      regionEffects: true,
      standardErrors: 'hc1',
      instrument: 'none',
    };
    const own = runFit(input, spec).elasticities.find((e) => e.kind === 'own-price')!;
    expect(own.ciLow).toBeLessThan(lanternTruths.shelfElasticity);
    expect(own.ciHigh).toBeGreaterThan(lanternTruths.shelfElasticity);
  });

  it.each([
    ['payment-card', { distribution: 'logistic' }],
    ['dichotomous-choice', {}],
    ['wtp-open', { bootstrap: { replicates: 500, seed: 7 } }],
  ] as const)('recovers the median WTP of 1500 KES (the demo truth) with %s', (method, extra) => {
    const result = runFit(input, { method, ...common, ...extra } as FitSpec);
    const median = figure(result, 'Median willingness to pay');
    expect(median.ciLow!).toBeLessThan(lanternTruths.wtpMedian);
    expect(median.ciHigh!).toBeGreaterThan(lanternTruths.wtpMedian);
  });

  it('puts the ladder’s half-share price near the WTP median (the demo truth)', () => {
    const result = runFit(input, { method: 'price-ladder', ...common });
    const half = figure(result, 'Price at which half would buy');
    expect(half.ciLow!).toBeLessThan(lanternTruths.wtpMedian);
    expect(half.ciHigh!).toBeGreaterThan(lanternTruths.wtpMedian);
  });

  it('gives the thresholds a trial curve and a schedule', () => {
    const result = runFit(input, { method: 'price-thresholds', ...common });
    expect(result.curve?.kind).toBe('piecewise-share');
    expect(result.schedule?.rows).toHaveLength(10);
  });
});
