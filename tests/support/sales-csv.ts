/**
 * An invented sales table (outlets of an invented lamp seller, week by week): own price,
 * another product's price, household income of the catchment, a cost shifter that moves the
 * price but not demand (an instrument), a weight, a date and the units sold. Deterministic
 * (a linear congruential generator), so every run imports the same file.
 */
export function salesRows(rows: number, seed = 7): string[][] {
  let state = seed;
  const uniform = () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
  const normal = () =>
    Math.sqrt(-2 * Math.log(uniform() + 1e-12)) * Math.cos(2 * Math.PI * uniform());
  const outlets = ['North 1', 'North 2', 'Lake 3', 'Lake 4', 'Hill 5', 'Hill 6'];
  const lines: string[][] = [];
  for (let i = 0; i < rows; i++) {
    const outlet = outlets[i % outlets.length];
    const o = i % outlets.length;
    const cost = round(8 + 4 * uniform(), 3);
    const price = round(20 + o + 1.5 * cost + 2 * normal(), 2);
    const other = round(30 + 5 * uniform(), 2);
    const income = round(900 + 300 * uniform() + 40 * o, 1);
    const quantity = Math.max(
      1,
      Math.round(
        Math.exp(
          6 -
            1.3 * Math.log(price) +
            0.5 * Math.log(other) +
            0.4 * Math.log(income) +
            0.05 * o +
            0.2 * normal(),
        ),
      ),
    );
    const weight = round(0.5 + uniform(), 3);
    const day = new Date(Date.UTC(2025, 0, 1 + Math.floor(i / outlets.length)));
    lines.push([
      day.toISOString().slice(0, 10),
      outlet,
      String(price),
      String(quantity),
      String(other),
      String(income),
      String(cost),
      String(weight),
      o < 3 ? 'North shore' : 'South shore',
    ]);
  }
  return lines;
}

export const salesHeader = [
  'Week start',
  'Outlet',
  'Price',
  'Units sold',
  'Rival price',
  'Income',
  'Unit cost',
  'Weight',
  'Shore',
];

/** The mapping a researcher gives the sales table. */
export const salesMapping = [
  { source: 'Week start', name: 'week_start', role: 'date', type: 'date' },
  { source: 'Outlet', name: 'outlet', role: 'grouping', type: 'text' },
  { source: 'Price', name: 'price', role: 'price', type: 'number' },
  { source: 'Units sold', name: 'units', role: 'quantity', type: 'number' },
  { source: 'Rival price', name: 'rival_price', role: 'other-price', type: 'number' },
  { source: 'Income', name: 'income', role: 'income', type: 'number' },
  { source: 'Unit cost', name: 'unit_cost', role: 'instrument', type: 'number' },
  { source: 'Weight', name: 'weight', role: 'weight', type: 'number' },
  { source: 'Shore', name: 'shore', role: 'grouping', type: 'text' },
] as const;

export function csvText(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const quote = (v: string) => (/[",\n]/.test(v) ? `"${v.replaceAll('"', '""')}"` : v);
  return [header, ...rows].map((r) => r.map(quote).join(',')).join('\n') + '\n';
}

function round(value: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
