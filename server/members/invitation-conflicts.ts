import { HttpError } from '../http/http-error';
import type { Executor } from '../db/database';
import { findWaitingInvitationTo } from './invitations-repository';
import { findMemberByEmail } from './members-repository';

/**
 * A member already has a sign-in and roles here: a second link would only add roles behind the
 * role dialog's back (and its last-admin check), so the admin is sent to that dialog instead.
 */
export function alreadyMember(email: string, name: string): HttpError {
  const message = `${name} (${email}) is already a member. Change their roles in the list of people instead.`;
  return new HttpError(409, 'already-member', message, [{ path: 'email', message }]);
}

/**
 * Two open links to one address would both work and each add its roles; the admin withdraws the
 * waiting one first, so exactly one set of roles is on offer at a time.
 */
export function alreadyInvited(email: string): HttpError {
  const message = `An invitation to ${email} is already waiting. Withdraw it first to send a new one.`;
  return new HttpError(409, 'already-invited', message, [{ path: 'email', message }]);
}

/** Refuses an invitation to someone who is already a member or already has a waiting link. */
export async function refuseUnneededInvitation(
  db: Executor,
  organisationId: string,
  email: string,
): Promise<void> {
  const member = await findMemberByEmail(db, organisationId, email);
  if (member) throw alreadyMember(email, member.name);
  if (await findWaitingInvitationTo(db, organisationId, email)) throw alreadyInvited(email);
}
