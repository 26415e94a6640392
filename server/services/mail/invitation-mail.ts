import type { Role } from '@/shared/schemas/auth';
import { htmlBody } from './html-body';
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

/** An invitation to a firm, as text and the same words as HTML; the link carries the only copy of the token. */
export function invitationMail(input: InvitationMailInput): OutgoingMail {
  const expires = input.expiresAt.toISOString().slice(0, 10);
  const subject = `${input.inviterName} invited you to ${input.orgName} on Tributary`;
  const intro = `${input.inviterName} invited you to join ${input.orgName} on Tributary as ${article(input.role)} ${input.role}.`;
  const after = `The link works once and expires on ${expires}. If you did not expect it, ignore this e-mail.`;
  return {
    to: input.to,
    subject,
    text: [intro, '', `Accept the invitation: ${input.link}`, '', after].join('\n'),
    html: htmlBody(subject, [intro, { href: input.link, label: 'Accept the invitation' }, after]),
  };
}
