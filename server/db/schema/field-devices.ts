import { index, integer, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { organisations } from './organisations';
import { users } from './users';

/**
 * A signed-in field device, as seen at its syncs: one row per device session. Supervisors and
 * admins read what it last sent and how many interviews it still held, and can sign it out.
 */
export const fieldDevices = pgTable(
  'field_devices',
  {
    id: uuid().primaryKey().defaultRandom(),
    /** The device's session (never shown to anyone); signing out ends that session. */
    sessionId: text().notNull(),
    userId: uuid()
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    organisationId: uuid()
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    /** The browser's own description of itself, shortened. */
    label: text().notNull(),
    firstSeenAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    lastSyncAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    lastSyncSent: integer().notNull(),
    lastSyncAccepted: integer().notNull(),
    /** What the device said it still had queued when it synced last; null if it did not say. */
    queuedAtLastSync: integer(),
    signedOutAt: timestamp({ withTimezone: true }),
    signedOutBy: uuid().references(() => users.id, { onDelete: 'set null' }),
  },
  (table) => [
    uniqueIndex('field_devices_session').on(table.sessionId),
    index('field_devices_user').on(table.userId, table.organisationId),
  ],
);
