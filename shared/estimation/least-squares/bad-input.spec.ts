import { refusalOf as refusal } from '../../../tests/support/estimation-refusal';
import { fitDemandModel } from './fit-demand-model';
import { fitLinearModel } from './fit-linear-model';

const price = { name: 'price', values: [2, 3, 4, 5, 6] };
const quantity = { name: 'quantity', values: [9, 7, 6, 4, 3] };

describe('refusals of bad input', () => {
  it('refuses empty data', () => {
    const error = refusal(() =>
      fitDemandModel({
        form: 'loglog',
        quantity: { name: 'quantity', values: [] },
        price: { name: 'price', values: [] },
      }),
    );
    expect(error).toMatchObject({ code: 'empty-data', field: 'quantity' });
    expect(
      refusal(() => fitLinearModel({ response: { name: 'y', values: [] }, regressors: [] })),
    ).toMatchObject({
      code: 'empty-data',
      field: 'y',
    });
  });

  it('refuses a single price level', () => {
    const error = refusal(() =>
      fitDemandModel({
        form: 'linear',
        quantity,
        price: { name: 'price', values: [4, 4, 4, 4, 4] },
      }),
    );
    expect(error).toMatchObject({ code: 'no-price-variation', field: 'price' });
  });

  it('refuses NaN, naming the column and the row', () => {
    const error = refusal(() =>
      fitDemandModel({
        form: 'linear',
        quantity: { name: 'quantity', values: [9, 7, NaN, 4, 3] },
        price,
      }),
    );
    expect(error).toMatchObject({ code: 'invalid-value', field: 'quantity' });
    expect(error.message).toContain('row 3');
  });

  it('refuses columns of different lengths', () => {
    const error = refusal(() =>
      fitLinearModel({ response: quantity, regressors: [{ name: 'price', values: [2, 3, 4, 5] }] }),
    );
    expect(error).toMatchObject({ code: 'length-mismatch', field: 'price' });
  });

  it('refuses a duplicated column as a singular design, naming the duplicate', () => {
    const error = refusal(() =>
      fitLinearModel({
        response: quantity,
        regressors: [price, { name: 'price_again', values: [...price.values] }],
      }),
    );
    expect(error).toMatchObject({ code: 'singular-design', field: 'price_again' });
    expect(error.message).toContain('(intercept), price');
  });

  it('refuses a non-positive value under a log, naming the column and the row', () => {
    const error = refusal(() =>
      fitDemandModel({
        form: 'loglog',
        quantity: { name: 'quantity', values: [9, 7, 0, 4, 3] },
        price,
      }),
    );
    expect(error).toMatchObject({ code: 'non-positive-log', field: 'quantity' });
    expect(error.message).toMatch(/row 3: 0 is not positive/);
    const semilog = refusal(() =>
      fitDemandModel({
        form: 'semilog',
        quantity: { name: 'quantity', values: [9, -1, 6, 4, 3] },
        price,
      }),
    );
    expect(semilog).toMatchObject({ code: 'non-positive-log', field: 'quantity' });
    // The semi-log form does not log the price, so a zero price is allowed there but not in log-log.
    const zeroPrice = { name: 'price', values: [0, 3, 4, 5, 6] };
    expect(
      refusal(() => fitDemandModel({ form: 'loglog', quantity, price: zeroPrice })),
    ).toMatchObject({
      code: 'non-positive-log',
      field: 'price',
    });
    expect(fitDemandModel({ form: 'semilog', quantity, price: zeroPrice }).n).toBe(5);
  });

  it('refuses too few observations, non-positive weights, a single cluster and a bad level', () => {
    expect(
      refusal(() =>
        fitLinearModel({
          response: { name: 'y', values: [1, 2] },
          regressors: [{ name: 'x', values: [1, 2] }],
        }),
      ),
    ).toMatchObject({
      code: 'too-few-observations',
    });
    expect(
      refusal(() =>
        fitLinearModel({
          response: quantity,
          regressors: [price],
          weights: { name: 'w', values: [1, 1, 0, 1, 1] },
        }),
      ),
    ).toMatchObject({
      code: 'invalid-value',
      field: 'w',
    });
    expect(
      refusal(() =>
        fitLinearModel({
          response: quantity,
          regressors: [price],
          standardErrors: {
            type: 'cluster',
            clusters: { name: 'site', values: ['a', 'a', 'a', 'a', 'a'] },
          },
        }),
      ),
    ).toMatchObject({ code: 'too-few-clusters', field: 'site' });
    expect(
      refusal(() =>
        fitLinearModel({ response: quantity, regressors: [price], confidenceLevel: 95 }),
      ),
    ).toMatchObject({
      code: 'invalid-option',
    });
  });
});
