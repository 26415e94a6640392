import type { OutgoingMail } from './mailer';

/** Plain-text e-mail confirmation; the link carries the only copy of the token. */
export function verificationMail(input: { to: string; name: string; link: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Confirm your e-mail address for Tributary',
    text: [
      `Hello ${input.name},`,
      '',
      `Confirm this address to invite people and send design requests: ${input.link}`,
      '',
      'The link works once. If you did not make a Tributary account, ignore this e-mail.',
    ].join('\n'),
  };
}
