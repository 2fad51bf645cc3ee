import { type Role, roleLabels } from '@shared/auth/roles';

/**
 * What saving a member's new roles will do beyond the list itself, in the words the dialog
 * shows before saving: a role taken away goes from every study, and the client role takes
 * the person's access tokens with it.
 */
export function roleChangeConsequences(before: readonly Role[], after: readonly Role[]): string[] {
  const removed = before.filter((role) => !after.includes(role));
  if (removed.length === 0) return [];
  const names = removed.map((role) => roleLabels[role].toLowerCase()).join(' and ');
  const sentences = [
    `They stop being ${names} in every study too, at once; studies where that was their only role no longer show them.`,
  ];
  if (removed.includes('client'))
    sentences.push('Their read-API access tokens are revoked and stop working at once.');
  if (removed.includes('admin'))
    sentences.push('They can no longer manage members, devices or tokens.');
  return sentences;
}

/** What deactivating or reactivating a member does, for the confirmation dialog. */
export function statusChangeConsequences(action: 'deactivate' | 'reactivate'): string[] {
  return action === 'deactivate'
    ? [
        'They are signed out on every device at once and cannot sign in again.',
        'Their study roles and read-API tokens are revoked.',
        'Everything they recorded stays: interviews, reviews, fits and published schedules.',
      ]
    : [
        'They can sign in again with the organisation roles listed here.',
        'Study roles and tokens are not given back: add them to studies again, and they issue new tokens.',
      ];
}
