import {
  check,
  date,
  foreignKey,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { samplingPoints } from './sampling-points';
import { studies } from './studies';
import { users } from './users';

/** An enumerator's ordered round of sampling points within a date window. */
export const routes = pgTable(
  'routes',
  {
    id: uuid().primaryKey().defaultRandom(),
    studyId: uuid()
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    name: text().notNull(),
    enumeratorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    windowStart: date({ mode: 'string' }).notNull(),
    windowEnd: date({ mode: 'string' }).notNull(),
    assignedAt: timestamp({ withTimezone: true }),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    check('routes_window', sql`${table.windowEnd} >= ${table.windowStart}`),
    unique('routes_study_id').on(table.studyId, table.id),
    // Every sync batch and every device's assignment download starts from the enumerator's routes.
    index('routes_enumerator').on(table.enumeratorId),
  ],
);

/** One point on a route, its place in the order and its interview quota. */
export const routeStops = pgTable(
  'route_stops',
  {
    routeId: uuid().notNull(),
    studyId: uuid().notNull(),
    pointId: uuid().notNull(),
    position: integer().notNull(),
    quota: integer().notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.routeId, table.pointId] }),
    foreignKey({
      columns: [table.studyId, table.routeId],
      foreignColumns: [routes.studyId, routes.id],
    }).onDelete('cascade'),
    foreignKey({
      columns: [table.studyId, table.pointId],
      foreignColumns: [samplingPoints.studyId, samplingPoints.id],
    }).onDelete('restrict'),
    check('route_stops_quota', sql`${table.quota} > 0`),
  ],
);
