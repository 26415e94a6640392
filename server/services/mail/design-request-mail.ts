import { htmlBody } from './html-body';
import type { OutgoingMail } from './mailer';

export interface RequestSentMailInput {
  to: string;
  firmName: string;
  contractorName: string;
  number: number;
  version: number;
  jobName: string;
  link: string;
  /** The link is an invitation: following it makes (or signs in to) the account the request binds to. */
  invitation: boolean;
}

/**
 * To the engineer when a request is sent and on each revision; the link opens it (or invites them). Plain
 * text, and the same words and link as HTML.
 */
export function requestSentMail(input: RequestSentMailInput): OutgoingMail {
  const what = input.version === 1 ? 'sent you' : `revised (version ${input.version})`;
  const intro = `${input.contractorName} of ${input.firmName} ${what} design request ${input.number} for ${input.jobName}.`;
  const holds =
    'It holds the members with their loads, preliminary checks, photos and the questions for you.';
  const once = input.invitation ? 'The link works once and for 30 days.' : '';
  const open = input.invitation
    ? 'Open it and make your Tributary account (or sign in) with this address:'
    : 'Open it:';
  const subject = `Design request ${input.number} v${input.version} from ${input.firmName}: ${input.jobName}`;
  return {
    to: input.to,
    subject,
    text: [intro, '', `${open} ${input.link}`, '', holds, once]
      .filter((line, index, lines) => line !== '' || lines[index - 1] !== '')
      .join('\n'),
    html: htmlBody(subject, [
      intro,
      open,
      {
        href: input.link,
        label: input.invitation ? 'Open the request and make your account' : 'Open the request',
      },
      holds,
      once,
    ]),
  };
}

/** To the other side when something happens on a request: a reply, a state change, a message, a fee. */
export function requestNewsMail(input: {
  to: string;
  number: number;
  jobName: string;
  news: string;
  link: string;
}): OutgoingMail {
  const subject = `Design request ${input.number} (${input.jobName}): ${input.news}`;
  const line = `Design request ${input.number} for ${input.jobName}: ${input.news}.`;
  return {
    to: input.to,
    subject,
    text: [line, '', `Open it: ${input.link}`].join('\n'),
    html: htmlBody(subject, [line, { href: input.link, label: 'Open the request' }]),
  };
}
