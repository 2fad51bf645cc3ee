import { contingentValuation as cv } from '../../../tests/fixtures/checks/contingent-valuation';
import { gaborGranger as gg } from '../../../tests/fixtures/checks/gabor-granger';
import {
  newtonMillerSmith as nms,
  vanWestendorp as vw,
} from '../../../tests/fixtures/checks/van-westendorp';
import { EstimationError } from '@shared/estimation/estimation-error';
import { numberAt, valueAt } from '../../../tests/support/json-path';
import type { DataTable } from '../data-table';
import { priceLadderMethod } from './price-ladder';
import { priceThresholdsMethod } from './price-thresholds';
import { wtpCardMethod } from './wtp-card';
import { wtpDoubleMethod } from './wtp-double';
import { wtpOpenMethod } from './wtp-open';
import { wtpSingleMethod } from './wtp-single';
import { refusalOf } from '../../../tests/support/estimation-refusal';

/** An in-memory table with the contract's two readers, refusing unknown columns like the CSV reader. */
function tableOf(columns: Record<string, readonly (string | number)[]>): DataTable {
  const column = (name: string) => {
    const cells = columns[name];
    if (!cells) throw new EstimationError('missing-column', `there is no column ${name}`, name);
    return cells;
  };
  return {
    path: 'memory',
    columns: Object.keys(columns),
    rowCount: Object.values(columns)[0]?.length ?? 0,
    has: (name: string) => name in columns,
    texts: (name: string) => column(name).map(String),
    numbers: (name: string) =>
      column(name).map((cell, i) => {
        const value = Number(cell);
        if (cell === '' || !Number.isFinite(value)) {
          throw new EstimationError(
            'invalid-value',
            `column ${name}, row ${i + 1} is not a number`,
            name,
          );
        }
        return value;
      }),
  };
}

describe('price-ladder method', () => {
  it('reports shares, prices and n from respondent, price and buy columns', () => {
    const respondent: string[] = [];
    const price: number[] = [];
    const buy: number[] = [];
    let id = 0;
    const addGroup = (count: number, level: number) => {
      for (let r = 0; r < count; r++, id++) {
        gg.prices.forEach((p, j) => {
          respondent.push(`r${id}`);
          price.push(p);
          buy.push(j <= level ? 1 : 0);
        });
      }
    };
    addGroup(gg.respondents - gg.buyers[0], -1);
    gg.buyers.forEach((count, j) => addGroup(count - (gg.buyers[j + 1] ?? 0), j));
    const out = priceLadderMethod.run(tableOf({ respondent, price, buy }), {
      cost: '6',
      grid: '10:20:6',
    });
    // CHECKS.md §5 (published: Gabor & Granger): grid maxima 12 and 14; logit revenue maximum 12.3071781027.
    expect(valueAt(out, 'n')).toBe(200);
    expect(valueAt(out, 'revenueMaxPrice')).toBe(12);
    expect(valueAt(out, 'profitMaxPrice')).toBe(14);
    expect(
      Math.abs(numberAt(out, 'logistic.revenueMaxPrice.estimate') - 12.3071781027),
    ).toBeLessThan(1e-8);
    expect(numberAt(out, 'demandSchedule.rows.length')).toBe(6);
    expect(JSON.parse(JSON.stringify(out))).toEqual(out);
  });

  it('names a missing column', () => {
    expect(
      refusalOf(() => priceLadderMethod.run(tableOf({ respondent: ['a'], price: [1] }), {})),
    ).toMatchObject({ code: 'missing-column', field: 'buy' });
  });

  it('refuses a cost that is not a number', () => {
    const table = tableOf({ respondent: ['a', 'a'], price: [1, 2], buy: [1, 0] });
    expect(refusalOf(() => priceLadderMethod.run(table, { cost: 'cheap' }))).toMatchObject({
      field: 'cost',
    });
  });
});

describe('price-thresholds method', () => {
  const columns = {
    too_cheap: vw.respondents.map((r) => r[0]),
    cheap: vw.respondents.map((r) => r[1]),
    expensive: vw.respondents.map((r) => r[2]),
    too_expensive: vw.respondents.map((r) => r[3]),
  };

  it('reports the four price points and the acceptable range', () => {
    const out = priceThresholdsMethod.run(tableOf(columns), {});
    // CHECKS.md §4 (published: Van Westendorp 1976), convention A by default.
    expect(valueAt(out, 'n')).toBe(10);
    expect(numberAt(out, 'optimalPrice.price')).toBeCloseTo(vw.expected.optimal.price, 9);
    expect(numberAt(out, 'indifferencePrice.price')).toBeCloseTo(vw.expected.indifference.price, 9);
    expect(numberAt(out, 'acceptableRange.high')).toBeCloseTo(vw.expected.conventionA.pme.price, 9);
    const b = priceThresholdsMethod.run(tableOf(columns), {
      convention: 'not-cheap-not-expensive',
    });
    expect(numberAt(b, 'marginalCheapnessPrice.price')).toBeCloseTo(
      vw.expected.conventionB.pmc.price,
      9,
    );
  });

  it('adds the trial and revenue curves when the likelihood columns are there', () => {
    const table = tableOf({
      too_cheap: nms.respondents.map((r) => r[0]),
      cheap: nms.respondents.map((r) => r[1]),
      expensive: nms.respondents.map((r) => r[2]),
      too_expensive: nms.respondents.map((r) => r[3]),
      likelihood_cheap: nms.respondents.map((r) => r[4]),
      likelihood_expensive: nms.respondents.map((r) => r[5]),
    });
    const out = priceThresholdsMethod.run(table, {});
    // CHECKS.md §6 (from memory: Newton, Miller & Smith 1993): revenue maximum 4.6 at 9.
    expect(numberAt(out, 'trial.revenueMaxPrice')).toBeCloseTo(9, 9);
    expect(numberAt(out, 'trial.maxRevenue')).toBeCloseTo(4.6, 9);
  });

  it('requires the likelihood columns with --trial', () => {
    expect(
      refusalOf(() => priceThresholdsMethod.run(tableOf(columns), { trial: true })),
    ).toMatchObject({ code: 'missing-column', field: 'likelihood_cheap' });
  });

  it('refuses an unknown convention, naming the option', () => {
    expect(
      refusalOf(() => priceThresholdsMethod.run(tableOf(columns), { convention: 'C' })),
    ).toMatchObject({ field: 'convention' });
  });
});

describe('willingness-to-pay methods', () => {
  it('wtp-open reports mean and median WTP', () => {
    const out = wtpOpenMethod.run(tableOf({ wtp: cv.openEnded.wtp }), {
      replicates: '200',
    });
    // CHECKS.md §7, common practice.
    expect(valueAt(out, 'meanWtp.estimate')).toBe(27.5);
    expect(valueAt(out, 'medianWtp.estimate')).toBe(17.5);
    expect(valueAt(out, 'n')).toBe(10);
  });

  it('wtp-single reports the median WTP of the saturated example', () => {
    const bid: number[] = [...new Array<number>(10).fill(10), ...new Array<number>(10).fill(30)];
    const yes = bid.map((b, i) => (b === 10 ? (i < 8 ? 'yes' : 'no') : i - 10 < 3 ? 'yes' : 'no'));
    const out = wtpSingleMethod.run(tableOf({ bid, yes }), {});
    // CHECKS.md §7, published (Hanemann 1984): median 22.4131374364.
    expect(Math.abs(numberAt(out, 'medianWtp.estimate') - cv.singleBounded.median)).toBeLessThan(
      1e-9,
    );
    expect(valueAt(out, 'n')).toBe(20);
  });

  it('wtp-single names the row of an answer that is not yes or no', () => {
    expect(() =>
      wtpSingleMethod.run(tableOf({ bid: [10, 20], yes: ['yes', 'maybe'] }), {}),
    ).toThrow(/row 2/);
  });

  it('wtp-double reads bid, yes, bid2 and yes2', () => {
    const rows = cv.doubleBounded.answers;
    const out = wtpDoubleMethod.run(
      tableOf({
        bid: rows.map((r) => r[0]),
        bid2: rows.map((r) => r[1]),
        yes: rows.map((r) => (r[2] ? 1 : 0)),
        yes2: rows.map((r) => (r[3] ? 1 : 0)),
      }),
      {},
    );
    expect(valueAt(out, 'format')).toBe('double-bounded');
    expect(numberAt(out, 'logLikelihood')).toBeGreaterThanOrEqual(cv.doubleBounded.logLikelihood);
    expect(numberAt(out, 'medianWtp.estimate')).toBeGreaterThan(0);
  });

  it('wtp-card treats an empty upper cell as the open top interval', () => {
    const { card, picks } = cv.paymentCard;
    const upper = picks.map((p) => card[card.indexOf(p) + 1] ?? '');
    const out = wtpCardMethod.run(tableOf({ lower: picks, upper }), {});
    expect(valueAt(out, 'n')).toBe(10);
    expect(valueAt(out, 'distribution')).toBe('normal');
    // The maximum can only beat the worked example's N(20, 15²) (CHECKS.md §7).
    expect(numberAt(out, 'logLikelihood')).toBeGreaterThanOrEqual(cv.paymentCard.logLikelihood);
  });
});
