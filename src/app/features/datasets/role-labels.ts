import type { ColumnRole } from '@shared/datasets/dataset-columns';

/** How each column role reads on screen. */
export const roleLabels: Record<ColumnRole, string> = {
  price: 'Price',
  quantity: 'Quantity',
  'other-price': 'Other product’s price',
  income: 'Income',
  grouping: 'Grouping (outlet, region, period)',
  weight: 'Weight',
  instrument: 'Instrument',
  date: 'Date',
  covariate: 'Numeric covariate',
  ignore: 'Leave out',
};
