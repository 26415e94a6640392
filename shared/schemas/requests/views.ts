import { z } from 'zod';
import { acceptInvitationSchema } from '@/shared/schemas/orgs';
import { visibleTextSchema } from '@/shared/schemas/visible-text';
import { requestComposeSchema } from './compose';
import { engineerReplySchema } from './reply';
import { changeLineSchema, photoPlaceSchema, requestSnapshotSchema } from './snapshot';
import { requestStateSchema, requestSides } from './workflow';

/** What the API answers about design requests (the viewer is the sending firm or the addressed engineer). */

export const requestSideSchema = z.enum(requestSides);

export const requestListItemSchema = z.object({
  id: z.string(),
  number: z.number().int(),
  jobId: z.string(),
  jobName: z.string(),
  firmName: z.string(),
  status: requestStateSchema,
  version: z.number().int(),
  engineerEmail: z.string().nullable(),
  /** News for the viewer's side since it last opened the request. */
  unread: z.boolean(),
  sentAt: z.string().nullable(),
  updatedAt: z.string(),
});
export type RequestListItem = z.infer<typeof requestListItemSchema>;

export const requestListSchema = z.object({ requests: z.array(requestListItemSchema) });

export const requestFileSchema = z.object({
  id: z.string(),
  side: requestSideSchema,
  purpose: z.enum(['photo', 'message', 'design']),
  place: photoPlaceSchema,
  caption: z.string(),
  fileName: z.string(),
  mimeType: z.string(),
  sizeBytes: z.number().int(),
  sha256: z.string(),
  /** A downscaled copy exists for the page and the PDF. */
  hasPreview: z.boolean(),
  /** Why there is no downscaled copy, when there is none for a photo (HEIC cannot be decoded here). */
  previewNote: z.string().nullable(),
  widthPx: z.number().int().nullable(),
  heightPx: z.number().int().nullable(),
  messageId: z.string().nullable(),
  /** The version a design document answers. */
  version: z.number().int().nullable(),
  uploadedBy: z.string(),
  createdAt: z.string(),
});
export type RequestFile = z.infer<typeof requestFileSchema>;

export const threadEntrySchema = z.object({
  id: z.string(),
  kind: z.enum(['message', 'event']),
  side: requestSideSchema,
  authorName: z.string(),
  body: z.string(),
  event: z.string().nullable(),
  version: z.number().int(),
  createdAt: z.string(),
  files: z.array(requestFileSchema),
});
export type ThreadEntry = z.infer<typeof threadEntrySchema>;

export const requestVersionSchema = z.object({
  version: z.number().int(),
  sentAt: z.string(),
  note: z.string(),
  changes: z.array(changeLineSchema),
});
export type RequestVersion = z.infer<typeof requestVersionSchema>;

/** `GET /api/requests/:requestId/versions/:version`: one sent version as it was frozen. */
export const requestVersionSnapshotSchema = z.object({
  version: z.number().int(),
  sentAt: z.string(),
  note: z.string(),
  snapshot: requestSnapshotSchema,
});
export type RequestVersionSnapshot = z.infer<typeof requestVersionSnapshotSchema>;

/** Who may do what next, for the viewer: the screens show only these. */
export const requestActions = [
  'edit',
  'send',
  'revise',
  'reopen',
  'accept-fee',
  'quote-fee',
  'reply',
  'upload-design',
  'message',
  'to-in-review',
  'to-needs-info',
  'to-designed',
  'to-closed',
  'to-declined',
] as const;
export type RequestAction = (typeof requestActions)[number];

export const requestDetailSchema = z.object({
  id: z.string(),
  number: z.number().int(),
  jobId: z.string(),
  jobName: z.string(),
  firmName: z.string(),
  status: requestStateSchema,
  version: z.number().int(),
  viewer: requestSideSchema,
  engineerEmail: z.string().nullable(),
  engineerBound: z.boolean(),
  fee: z
    .object({
      feeUsd: z.number(),
      turnaroundDays: z.number().int(),
      siteVisit: z.boolean(),
      note: z.string(),
      quotedAt: z.string(),
      acceptedAt: z.string().nullable(),
    })
    .nullable(),
  declineReason: z.string().nullable(),
  /** The working copy the next send or revision freezes; the sending firm's only. */
  draft: requestComposeSchema.nullable(),
  versions: z.array(requestVersionSchema),
  /** The latest sent version, read-only. */
  snapshot: requestSnapshotSchema.nullable(),
  thread: z.array(threadEntrySchema),
  files: z.array(requestFileSchema),
  reply: z
    .object({ version: z.number().int(), reply: engineerReplySchema, createdAt: z.string() })
    .nullable(),
  actions: z.array(z.enum(requestActions)),
  sentAt: z.string().nullable(),
  updatedAt: z.string(),
});
export type RequestDetail = z.infer<typeof requestDetailSchema>;

/** `GET /api/request-invitations/:token` (public): what the invited engineer sees before accepting. */
export const requestInvitationPreviewSchema = z.object({
  email: z.string(),
  firmName: z.string(),
  number: z.number().int(),
  jobName: z.string(),
  hasAccount: z.boolean(),
});
export type RequestInvitationPreview = z.infer<typeof requestInvitationPreviewSchema>;

/**
 * `POST /api/request-invitations/:token/accept`: a new engineer sends a name, a password and the name of
 * their firm; a person with an account signs in first and sends nothing.
 */
export const acceptRequestInvitationSchema = acceptInvitationSchema.extend({
  firmName: visibleTextSchema('Enter your firm’s name', 160).optional(),
});
export type AcceptRequestInvitation = z.infer<typeof acceptRequestInvitationSchema>;
