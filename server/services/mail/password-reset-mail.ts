import type { OutgoingMail } from './mailer';

/** Plain-text password reset; the link carries the only copy of the token. */
export function passwordResetMail(input: {
  to: string;
  name: string;
  link: string;
  minutes: number;
}): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Tributary password',
    text: [
      `Hello ${input.name},`,
      '',
      `Someone asked to reset the password of this Tributary account. Choose a new one: ${input.link}`,
      '',
      `The link works once and for ${input.minutes} minutes. Using it signs the account out everywhere else.`,
      'If you did not ask, ignore this e-mail: your password stays as it is.',
    ].join('\n'),
  };
}
