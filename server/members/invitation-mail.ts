import { roleLabels, type Role } from '@shared/auth/role';
import type { OutgoingMail } from '../mail/mailer';

/** The invitation e-mail: who invited, which roles, and the link that signs the person in. */
export function invitationMail(options: {
  to: string;
  name: string;
  inviterName: string;
  organisationName: string;
  roles: readonly Role[];
  link: string;
}): OutgoingMail {
  const roleList = options.roles.map((role) => roleLabels[role]).join(', ');
  return {
    to: options.to,
    subject: `${options.inviterName} invited you to ${options.organisationName} on Fieldcurve`,
    text: [
      `Hello ${options.name},`,
      '',
      `${options.inviterName} has invited you to join ${options.organisationName} on Fieldcurve as: ${roleList}.`,
      '',
      'Open this link to accept and sign in (it works once and expires in 7 days):',
      options.link,
      '',
      'If you did not expect this invitation, you can ignore this message.',
    ].join('\n'),
  };
}
