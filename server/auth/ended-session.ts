import { sql, type SQL } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { sessions } from '../db/schema';
import { HttpError } from '../http/http-error';

/** Why a session stopped working before its time; the device is told at its next call. */
export type SessionEndReason = 'device-signed-out' | 'member-deactivated' | 'signed-out-everywhere';

const endedMessages: Readonly<Record<SessionEndReason, string>> = {
  'device-signed-out':
    'This device was signed out by an administrator or supervisor. Sign in again to continue; interviews not yet synced stay on the device.',
  'member-deactivated':
    'Your access to this organisation has been deactivated by an administrator. Ask them if you think this is a mistake.',
  'signed-out-everywhere': 'You signed out on every device. Sign in again to continue.',
};

/**
 * Ends sessions where they are stored: the person is taken out of the session row and the reason
 * put in, so every web process refuses it at once and can say why (a deleted row would leave a
 * device only "not signed in", with no word of what happened).
 */
export async function endSessions(
  db: Executor,
  which: SQL,
  reason: SessionEndReason,
): Promise<number> {
  const ended = await db
    .update(sessions)
    .set({
      sess: sql`((${sessions.sess}::jsonb - 'userId' - 'organisationId') || jsonb_build_object('endedReason', ${reason}::text))::json`,
    })
    .where(which)
    .returning({ sid: sessions.sid });
  return ended.length;
}

/** Sessions of one person in one organisation. */
export const sessionsOf = (userId: string, organisationId: string): SQL =>
  sql`${sessions.sess}->>'userId' = ${userId} and ${sessions.sess}->>'organisationId' = ${organisationId}`;

/** The answer to any call made with a session that was ended. */
export const sessionEnded = (reason: SessionEndReason) =>
  new HttpError(401, 'session-ended', endedMessages[reason]);

export const isSessionEndReason = (value: unknown): value is SessionEndReason =>
  typeof value === 'string' && value in endedMessages;
