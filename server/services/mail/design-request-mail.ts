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

/** To the engineer when a request is sent and on each revision; the link opens it (or invites them). */
export function requestSentMail(input: RequestSentMailInput): OutgoingMail {
  const what = input.version === 1 ? 'sent you' : `revised (version ${input.version})`;
  const open = input.invitation
    ? `Open it and make your Tributary account (or sign in) with this address: ${input.link}`
    : `Open it: ${input.link}`;
  return {
    to: input.to,
    subject: `Design request ${input.number} v${input.version} from ${input.firmName}: ${input.jobName}`,
    text: [
      `${input.contractorName} of ${input.firmName} ${what} design request ${input.number} for ${input.jobName}.`,
      '',
      open,
      '',
      'It holds the members with their loads, preliminary checks, photos and the questions for you.',
      input.invitation ? 'The link works once and for 30 days.' : '',
    ]
      .filter((line, index, lines) => line !== '' || lines[index - 1] !== '')
      .join('\n'),
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
  return {
    to: input.to,
    subject: `Design request ${input.number} (${input.jobName}): ${input.news}`,
    text: [
      `Design request ${input.number} for ${input.jobName}: ${input.news}.`,
      '',
      `Open it: ${input.link}`,
    ].join('\n'),
  };
}
