import type { Executor } from '../db/database';
import { HttpError } from '../http/http-error';
import { alreadyInvited, alreadyMember, refuseUnneededInvitation } from './invitation-conflicts';

/**
 * A stand-in for the database whose queries answer, in turn, with the given rows: the member
 * look-up first, then the waiting-invitation look-up.
 */
function answering(...answers: unknown[][]): Executor {
  const queue = [...answers];
  const query = (): unknown =>
    new Proxy(
      {},
      {
        get: (_target, key) =>
          key === 'then'
            ? (resolve: (rows: unknown[]) => void) => resolve(queue.shift() ?? [])
            : () => query(),
      },
    );
  return { select: () => query() } as unknown as Executor;
}

const waiting = {
  id: '0d4c5b6a-7e8f-4a0b-9c1d-2e3f4a5b6c7d',
  organisationId: '1d4c5b6a-7e8f-4a0b-9c1d-2e3f4a5b6c7d',
  email: 'wren@example.test',
  name: 'Wren Halloway',
  roles: ['client'],
  tokenHash: 'x',
  invitedBy: null,
  createdAt: new Date('2026-12-01T08:00:00Z'),
  expiresAt: new Date('2099-12-08T08:00:00Z'),
  acceptedAt: null,
};

describe('refusing an invitation that is not needed', () => {
  it('refuses an address that already belongs to a member, pointing to their roles', async () => {
    const db = answering([{ userId: 'u1', name: 'Wren Halloway' }]);
    const refusal = await refuseUnneededInvitation(db, 'org', 'wren@example.test').catch(
      (error: unknown) => error,
    );
    expect(refusal).toBeInstanceOf(HttpError);
    expect(refusal).toMatchObject({ status: 409, code: 'already-member' });
    expect((refusal as HttpError).issues?.[0]?.path).toBe('email');
    expect((refusal as HttpError).message).toMatch(/already a member.*Change their roles/);
  });

  it('refuses a second open invitation to the same address, saying how to send a new one', async () => {
    const db = answering([], [waiting]);
    await expect(refuseUnneededInvitation(db, 'org', 'wren@example.test')).rejects.toMatchObject({
      status: 409,
      code: 'already-invited',
      issues: [{ path: 'email', message: expect.stringContaining('Withdraw it first') }],
    });
  });

  it('lets an invitation to a newcomer through', async () => {
    await expect(
      refuseUnneededInvitation(answering([], []), 'org', 'new@example.test'),
    ).resolves.toBeUndefined();
  });
});

describe('the refusal messages', () => {
  it('name the person and the address in plain words', () => {
    expect(alreadyMember('wren@example.test', 'Wren Halloway').message).toBe(
      'Wren Halloway (wren@example.test) is already a member. Change their roles in the list of people instead.',
    );
    expect(alreadyInvited('wren@example.test').message).toBe(
      'An invitation to wren@example.test is already waiting. Withdraw it first to send a new one.',
    );
  });
});
