import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';

/** How the model's columns read on the screen and in reports. */
const columnNames: Readonly<Record<string, string>> = {
  price: 'price',
  income: 'income',
  household_size: 'household size',
  peer_price: 'peer price',
  region: 'region',
};

const sentence = (text: string) => `${text.charAt(0).toUpperCase()}${text.slice(1)}`;

/**
 * A regression term as people read it: "Intercept", "ln price" for a logged column, and
 * "Region: North shore (against Central)" for a fixed-effect dummy. The engine's names
 * (`price`, `region=North shore`) stay internal.
 */
export function regressionTermLabel(
  term: string,
  loggedColumns: readonly string[],
  fixedEffectBases: Readonly<Record<string, string | null>> = {},
): string {
  if (term === INTERCEPT_TERM) return 'Intercept';
  const split = term.indexOf('=');
  if (split > 0) {
    const column = term.slice(0, split);
    const base = fixedEffectBases[column];
    const against = base ? ` (against ${base})` : '';
    return `${sentence(columnNames[column] ?? column)}: ${term.slice(split + 1)}${against}`;
  }
  const name = columnNames[term] ?? term.replace(/_/g, ' ');
  return loggedColumns.includes(term) ? `ln ${name}` : sentence(name);
}

/** The two parameters of a WTP model F(α − β·P), named for what they do. */
export const wtpTermLabels: Readonly<Record<'alpha' | 'beta', string>> = {
  alpha: 'Intercept (α)',
  beta: 'Price slope (β)',
};
