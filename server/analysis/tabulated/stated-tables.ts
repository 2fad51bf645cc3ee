import { sql, type SQL } from 'drizzle-orm';
import type { StatedMethod } from './stated-cell';

/**
 * Where each stated method's typed rows live and how one respondent's answers read from them:
 * `columns` are the answer columns (minor units as float8, so they arrive as numbers), and
 * `grouped` says a respondent spans several rows (a ladder: one per step), summed up per
 * interview into one text of `price:answer` pairs in price order.
 */
export interface StatedTable {
  readonly table: SQL;
  readonly columns: readonly { name: string; expression: SQL }[];
  readonly grouped: boolean;
  /** What an interview without these answers is counted as, as the in-memory path words it. */
  readonly missing: string;
}

const column = (name: string, expression: string) => ({ name, expression: sql.raw(expression) });

export const statedTables: Readonly<Record<StatedMethod, StatedTable>> = {
  'price-ladder': {
    table: sql.raw('stated_ladder_steps'),
    columns: [
      column('scale', 's.scale'),
      column(
        'steps',
        "string_agg(s.price_minor::text || ':' || s.response::text, ',' ORDER BY s.price_minor)",
      ),
    ],
    grouped: true,
    missing: 'price ladder not answered',
  },
  'price-thresholds': {
    table: sql.raw('stated_thresholds'),
    columns: [
      column('too_cheap', 's.too_cheap_minor::float8'),
      column('cheap', 's.cheap_minor::float8'),
      column('expensive', 's.expensive_minor::float8'),
      column('too_expensive', 's.too_expensive_minor::float8'),
      column('likelihood_cheap', 's.likelihood_cheap::int'),
      column('likelihood_expensive', 's.likelihood_expensive::int'),
    ],
    grouped: false,
    missing: 'price thresholds not answered',
  },
  'wtp-open': {
    table: sql.raw('stated_wtp_amounts'),
    columns: [column('amount', 's.amount_minor::float8')],
    grouped: false,
    missing: 'open willingness to pay not answered',
  },
  'payment-card': {
    table: sql.raw('stated_card_intervals'),
    columns: [column('lower', 's.lower_minor::float8'), column('upper', 's.upper_minor::float8')],
    grouped: false,
    missing: 'payment card not answered',
  },
  'dichotomous-choice': {
    table: sql.raw('stated_bid_answers'),
    columns: [
      column('bounds', 's.bounds'),
      column('bid', 's.bid_minor::float8'),
      column('yes', 's.yes'),
      column('bid2', 's.bid2_minor::float8'),
      column('yes2', 's.yes2'),
    ],
    grouped: false,
    missing: 'dichotomous choice not answered',
  },
};
