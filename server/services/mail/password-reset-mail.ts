import { htmlBody } from './html-body';
import type { OutgoingMail } from './mailer';

/** A password reset, as text and the same words as HTML; the link carries the only copy of the token. */
export function passwordResetMail(input: {
  to: string;
  name: string;
  link: string;
  minutes: number;
}): OutgoingMail {
  const subject = 'Reset your Tributary password';
  const hello = `Hello ${input.name},`;
  const asked = 'Someone asked to reset the password of this Tributary account. Choose a new one:';
  const once = `The link works once and for ${input.minutes} minutes. Using it signs the account out everywhere else.`;
  const ignore = 'If you did not ask, ignore this e-mail: your password stays as it is.';
  return {
    to: input.to,
    subject,
    text: [hello, '', `${asked} ${input.link}`, '', once, ignore].join('\n'),
    html: htmlBody(subject, [
      hello,
      asked,
      { href: input.link, label: 'Choose a new password' },
      once,
      ignore,
    ]),
  };
}
