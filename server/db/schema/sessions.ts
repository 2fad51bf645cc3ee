import { index, json, pgTable, timestamp, varchar } from 'drizzle-orm/pg-core';

/** Browser sessions, in the layout connect-pg-simple reads and writes. */
export const sessions = pgTable(
  'sessions',
  {
    sid: varchar().primaryKey(),
    sess: json().notNull(),
    expire: timestamp({ precision: 6 }).notNull(),
  },
  (table) => [index('sessions_expire_idx').on(table.expire)],
);
