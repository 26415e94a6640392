import { z } from 'zod';
import { clientIdSchema } from '../sync';
import { requestPatchSchema } from './compose';
import { photoPlaceSchema } from './snapshot';

/**
 * A design request's states (DESIGN.md §3) and the bodies that move it. The fee is a step inside In review
 * or Needs info, not a state: the engineer quotes it, the contractor accepts it, and only then can the
 * engineer mark the request Designed.
 */
export const requestStates = [
  'draft',
  'sent',
  'in-review',
  'needs-info',
  'designed',
  'closed',
  'declined',
] as const;
export const requestStateSchema = z.enum(requestStates);
export type RequestState = z.infer<typeof requestStateSchema>;

/** The state names a person reads. */
export const REQUEST_STATE_LABELS: Record<RequestState, string> = {
  draft: 'Draft',
  sent: 'Sent',
  'in-review': 'In review',
  'needs-info': 'Needs info',
  designed: 'Designed',
  closed: 'Closed',
  declined: 'Declined',
};

/** The two parties of a request: the sending firm and the addressed engineer. */
export const requestSides = ['firm', 'engineer'] as const;
export type RequestSide = (typeof requestSides)[number];

const reason = z.string().trim().max(2000, { message: 'At most 2000 characters' });

/**
 * `POST /api/requests/:requestId/status`. Declined needs a reason; Needs info carries the question into the
 * thread. Which side may make which change from which state is the service's rule (request-transitions.ts).
 */
export const statusChangeSchema = z
  .object({
    to: z.enum(['in-review', 'needs-info', 'designed', 'closed', 'declined']),
    reason: reason.default(''),
  })
  .refine((body) => body.to !== 'declined' || body.reason.length > 0, {
    path: ['reason'],
    message: 'Say why the request is declined',
  })
  .refine((body) => body.to !== 'needs-info' || body.reason.length > 0, {
    path: ['reason'],
    message: 'Ask what you need to know',
  });
export type StatusChange = z.output<typeof statusChangeSchema>;

/** `POST /api/requests/:requestId/fee`: the engineer's fee (US dollars) and turnaround (working days). */
export const feeQuoteSchema = z.object({
  feeUsd: z.number().min(0, { message: 'A fee cannot be negative' }).max(1_000_000),
  turnaroundDays: z.number().int().min(1, { message: 'At least 1 day' }).max(365),
  siteVisit: z.boolean().default(false),
  note: reason.default(''),
});
export type FeeQuote = z.output<typeof feeQuoteSchema>;

/**
 * `POST /api/requests/:requestId/revisions`: what changed, in words; a Designed request needs a question.
 * `draft` edits the working copy first, in the same transaction as the new version: a refused edit sends
 * nothing and keeps the working copy as it was.
 */
export const revisionSchema = z.object({
  note: reason.default(''),
  question: reason.default(''),
  draft: requestPatchSchema.optional(),
});
export type Revision = z.output<typeof revisionSchema>;

/** `POST /api/requests/:requestId/messages`: text and files uploaded to the request beforehand. */
export const messageCreateSchema = z
  .object({
    body: reason.default(''),
    attachmentIds: z.array(z.string().min(1).max(100)).max(10, { message: 'At most 10 files' }).default([]),
  })
  .refine((message) => message.body.length > 0 || message.attachmentIds.length > 0, {
    path: ['body'],
    message: 'Write a message or attach a file',
  });
export type MessageCreate = z.output<typeof messageCreateSchema>;

/** `GET /api/requests`: optionally one state only. */
export const requestListQuerySchema = z.object({ state: requestStateSchema.optional() });

/**
 * The text fields of `POST /api/requests/:requestId/attachments` (multipart, beside the `file` part): what
 * the file is for, where a photo was taken and its caption. The file name must be a plain name.
 */
export const uploadFieldsSchema = z.object({
  purpose: z.enum(['photo', 'message', 'design']).default('photo'),
  place: photoPlaceSchema.default('other'),
  caption: z.string().trim().max(300, { message: 'At most 300 characters' }).default(''),
  /** The id the device chose when it took the photo offline. */
  id: clientIdSchema.optional(),
});
export type UploadFields = z.output<typeof uploadFieldsSchema>;

/** A plain file name: no folder parts, no `..`, no control characters, at most 200 characters. */
export const uploadFileNameSchema = z
  .string()
  .min(1, { message: 'The file has no name' })
  .max(200, { message: 'Use a file name of at most 200 characters' })
  .refine((name) => !/[\\/]|\.\.|[\p{Cc}]/u.test(name), { message: 'Use a plain file name without folders' });
