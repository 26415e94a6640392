import type { Role } from '@/shared/schemas/auth';
import type { OutgoingMail } from './mailer';

export interface InvitationMailInput {
  to: string;
  orgName: string;
  inviterName: string;
  role: Role;
  link: string;
  expiresAt: Date;
}

const article = (role: Role) =>
  role === 'owner' || role === 'estimator' || role === 'engineer' ? 'an' : 'a';

/** Plain-text invitation; the link carries the only copy of the token. */
export function invitationMail(input: InvitationMailInput): OutgoingMail {
  const expires = input.expiresAt.toISOString().slice(0, 10);
  return {
    to: input.to,
    subject: `${input.inviterName} invited you to ${input.orgName} on Tributary`,
    text: [
      `${input.inviterName} invited you to join ${input.orgName} on Tributary as ${article(input.role)} ${input.role}.`,
      '',
      `Accept the invitation: ${input.link}`,
      '',
      `The link works once and expires on ${expires}. If you did not expect it, ignore this e-mail.`,
    ].join('\n'),
  };
}
