import { htmlBody } from './html-body';
import type { OutgoingMail } from './mailer';

/** The e-mail confirmation, as text and the same words as HTML; the link carries the only copy of the token. */
export function verificationMail(input: { to: string; name: string; link: string }): OutgoingMail {
  const subject = 'Confirm your e-mail address for Tributary';
  const hello = `Hello ${input.name},`;
  const why = 'Confirm this address to invite people and send design requests:';
  const once = 'The link works once. If you did not make a Tributary account, ignore this e-mail.';
  return {
    to: input.to,
    subject,
    text: [hello, '', `${why} ${input.link}`, '', once].join('\n'),
    html: htmlBody(subject, [hello, why, { href: input.link, label: 'Confirm the address' }, once]),
  };
}
