import { and, desc, eq, isNull, sql } from 'drizzle-orm';
import type { FieldDevice } from '@shared/field-sync/field-device';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import type { Database, Executor } from '../db/database';
import { fieldDevices, sessions, studyMembers, users } from '../db/schema';
import { endSessions } from '../auth/ended-session';
import { notFound } from '../http/http-error';

/** What one sync tells about the device that sent it. */
export interface DeviceSync {
  sessionId: string;
  userId: string;
  organisationId: string;
  userAgent: string | undefined;
  outboxCount: number | undefined;
  result: SyncBatchResult;
}

/** Records the device's last sync: what it sent, what was stored, what it still holds. */
export async function recordDeviceSync(db: Executor, sync: DeviceSync): Promise<void> {
  const values = {
    lastSyncAt: new Date(sync.result.receivedAt),
    lastSyncSent: sync.result.results.length,
    lastSyncAccepted: sync.result.results.filter((r) => r.outcome === 'accepted').length,
    queuedAtLastSync: sync.outboxCount ?? null,
  };
  await db
    .insert(fieldDevices)
    .values({
      sessionId: sync.sessionId,
      userId: sync.userId,
      organisationId: sync.organisationId,
      label: (sync.userAgent ?? 'Unknown browser').slice(0, 160),
      ...values,
    })
    .onConflictDoUpdate({ target: fieldDevices.sessionId, set: values });
}

const deviceColumns = {
  id: fieldDevices.id,
  userId: fieldDevices.userId,
  enumeratorName: users.name,
  label: fieldDevices.label,
  firstSeenAt: fieldDevices.firstSeenAt,
  lastSyncAt: fieldDevices.lastSyncAt,
  lastSyncSent: fieldDevices.lastSyncSent,
  lastSyncAccepted: fieldDevices.lastSyncAccepted,
  queuedAtLastSync: fieldDevices.queuedAtLastSync,
  signedOutAt: fieldDevices.signedOutAt,
};

/** The devices of the study's enumerators, most recently synced first. */
export async function listStudyDevices(
  db: Executor,
  studyId: string,
  organisationId: string,
): Promise<FieldDevice[]> {
  const rows = await db
    .select(deviceColumns)
    .from(fieldDevices)
    .innerJoin(users, eq(users.id, fieldDevices.userId))
    .innerJoin(
      studyMembers,
      and(eq(studyMembers.userId, fieldDevices.userId), eq(studyMembers.studyId, studyId)),
    )
    .where(eq(fieldDevices.organisationId, organisationId))
    .orderBy(desc(fieldDevices.lastSyncAt))
    .limit(500);
  return rows.map((row) => ({
    ...row,
    firstSeenAt: row.firstSeenAt.toISOString(),
    lastSyncAt: row.lastSyncAt.toISOString(),
    signedOutAt: row.signedOutAt?.toISOString() ?? null,
  }));
}

/**
 * Signs one device of the study out: its session ends (every web process refuses it at once) and
 * it is told why at its next call. Signing out twice changes nothing.
 */
export async function signOutDevice(
  db: Database,
  studyId: string,
  organisationId: string,
  deviceId: string,
  byUserId: string,
): Promise<FieldDevice> {
  return db.transaction(async (tx) => {
    const [device] = await tx
      .select({ sessionId: fieldDevices.sessionId })
      .from(fieldDevices)
      .innerJoin(
        studyMembers,
        and(eq(studyMembers.userId, fieldDevices.userId), eq(studyMembers.studyId, studyId)),
      )
      .where(and(eq(fieldDevices.id, deviceId), eq(fieldDevices.organisationId, organisationId)))
      .for('update', { of: fieldDevices });
    if (!device) throw notFound('That device');
    await tx
      .update(fieldDevices)
      .set({ signedOutAt: new Date(), signedOutBy: byUserId })
      .where(and(eq(fieldDevices.id, deviceId), isNull(fieldDevices.signedOutAt)));
    await endSessions(
      tx,
      sql`${sessions.sid} = ${device.sessionId} and ${sessions.sess}->>'userId' is not null`,
      'device-signed-out',
    );
    const listed = await listStudyDevices(tx, studyId, organisationId);
    const found = listed.find((d) => d.id === deviceId);
    if (!found) throw notFound('That device');
    return found;
  });
}
