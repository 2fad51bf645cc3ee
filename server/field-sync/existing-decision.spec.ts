import type { ExistingInterview } from './existing-interviews';
import { decideOnExisting } from './existing-decision';

const reviewedAt = new Date('2027-03-02T10:00:00Z');
const stored: ExistingInterview = {
  id: 'i',
  studyId: 's',
  enumeratorId: 'e',
  status: 'received',
  reviewedAt: null,
  fingerprint: 'A',
};
const same = { enumeratorId: 'e', studyId: 's', fingerprint: 'A' };

describe('decideOnExisting', () => {
  it('answers the same content again as a duplicate, with the stored status', () => {
    expect(decideOnExisting(stored, same)).toEqual({ kind: 'duplicate', status: 'received' });
    expect(decideOnExisting({ ...stored, status: 'accepted' }, same)).toEqual({
      kind: 'duplicate',
      status: 'accepted',
    });
  });

  it('refuses other content under a stored id, never overwriting it', () => {
    const decision = decideOnExisting(stored, { ...same, fingerprint: 'B' });
    expect(decision).toMatchObject({ kind: 'rejected', rejection: { code: 'id-conflict' } });
  });

  it('refuses another enumerator’s id even with the same content', () => {
    const decision = decideOnExisting(stored, { ...same, enumeratorId: 'other' });
    expect(decision).toMatchObject({ kind: 'rejected', rejection: { code: 'id-conflict' } });
  });

  it('takes a corrected submission of a returned interview', () => {
    const returned = { ...stored, status: 'returned' as const, reviewedAt };
    expect(decideOnExisting(returned, { ...same, fingerprint: 'B' })).toEqual({ kind: 'resubmit' });
  });

  it('takes an unchanged resubmission only when it names the return it answers', () => {
    const returned = { ...stored, status: 'returned' as const, reviewedAt };
    expect(decideOnExisting(returned, same)).toEqual({ kind: 'duplicate', status: 'returned' });
    expect(decideOnExisting(returned, { ...same, returnedAt: '2027-03-02T10:00:00.000Z' })).toEqual(
      { kind: 'resubmit' },
    );
  });
});
