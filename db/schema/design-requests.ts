import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { RequestCompose } from '@/shared/schemas/requests/compose';
import type { EngineerReply } from '@/shared/schemas/requests/reply';
import type { ChangeLine, RequestSnapshot } from '@/shared/schemas/requests/snapshot';
import { photoPlaces } from '@/shared/schemas/requests/snapshot';
import { requestSides, requestStates } from '@/shared/schemas/requests/workflow';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/**
 * A design request of a firm's job to one engineer (DESIGN.md §4). `draft` is the working copy the next
 * send or revision freezes into a row of `design_request_versions`; those rows never change. `number` counts
 * the firm's requests from 1. The two unread flags mark news for each side until that side opens it.
 */
export const designRequests = sqliteTable(
  'design_requests',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    engineerEmail: text('engineer_email'),
    /** The engineer's account once bound (at send when it exists and is confirmed, else by the invitation). */
    engineerUserId: text('engineer_user_id').references(() => users.id),
    status: text('status', { enum: requestStates }).notNull(),
    draft: text('draft', { mode: 'json' }).$type<RequestCompose>().notNull(),
    /** 0 while a Draft; the latest sent version after. */
    version: integer('version').notNull(),
    feeUsd: integer('fee_usd'),
    turnaroundDays: integer('turnaround_days'),
    siteVisit: integer('site_visit', { mode: 'boolean' }),
    feeNote: text('fee_note'),
    feeQuotedAt: text('fee_quoted_at'),
    feeAcceptedAt: text('fee_accepted_at'),
    declineReason: text('decline_reason'),
    firmUnread: integer('firm_unread', { mode: 'boolean' }).notNull().default(false),
    engineerUnread: integer('engineer_unread', { mode: 'boolean' }).notNull().default(false),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
    sentAt: text('sent_at'),
  },
  (t) => [
    uniqueIndex('design_requests_org_number').on(t.orgId, t.number),
    index('design_requests_job').on(t.jobId),
    index('design_requests_engineer').on(t.engineerUserId, t.updatedAt),
  ],
);

/** One sent version: the frozen snapshot and what changed since the version before (empty for version 1). */
export const designRequestVersions = sqliteTable(
  'design_request_versions',
  {
    id: text('id').primaryKey(),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    snapshot: text('snapshot', { mode: 'json' }).$type<RequestSnapshot>().notNull(),
    changes: text('changes', { mode: 'json' }).$type<ChangeLine[]>().notNull(),
    note: text('note').notNull(),
    sentBy: text('sent_by')
      .notNull()
      .references(() => users.id),
    sentAt: text('sent_at').notNull(),
  },
  (t) => [uniqueIndex('design_request_versions_request_version').on(t.requestId, t.version)],
);

export const threadKinds = ['message', 'event'] as const;

/** The thread: messages both ways and, as `event` rows, every state change with its reason. */
export const requestMessages = sqliteTable(
  'request_messages',
  {
    id: text('id').primaryKey(),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: threadKinds }).notNull(),
    side: text('side', { enum: requestSides }).notNull(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id),
    body: text('body').notNull(),
    /** For events: the state moved to (or the step: fee quoted, fee accepted, revised). */
    event: text('event'),
    version: integer('version').notNull(),
    createdAt: text('created_at').notNull(),
  },
  (t) => [index('request_messages_request').on(t.requestId, t.createdAt)],
);

/** The engineer's structured replies, each answering one version; the latest is the answer. */
export const engineerReplies = sqliteTable(
  'engineer_replies',
  {
    id: text('id').primaryKey(),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    reply: text('reply', { mode: 'json' }).$type<EngineerReply>().notNull(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
  },
  (t) => [index('engineer_replies_request').on(t.requestId, t.createdAt)],
);

export const attachmentPurposes = ['photo', 'message', 'design'] as const;

/**
 * A file of a request: a photo or sketch the contractor attached, a file in a message, or the engineer's
 * designed-member document (tied to the version it answers). The bytes live in storage under
 * `storage_key`; `preview_key` is a downscaled copy for the page and the PDF when one was made.
 */
export const attachments = sqliteTable(
  'attachments',
  {
    id: text('id').primaryKey(),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    side: text('side', { enum: requestSides }).notNull(),
    purpose: text('purpose', { enum: attachmentPurposes }).notNull(),
    place: text('place', { enum: photoPlaces }).notNull(),
    caption: text('caption').notNull(),
    messageId: text('message_id').references(() => requestMessages.id, { onDelete: 'set null' }),
    version: integer('version'),
    fileName: text('file_name').notNull(),
    mimeType: text('mime_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    storageKey: text('storage_key').notNull(),
    sha256: text('sha256').notNull(),
    previewKey: text('preview_key'),
    widthPx: integer('width_px'),
    heightPx: integer('height_px'),
    uploadedBy: text('uploaded_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
  },
  (t) => [index('attachments_request').on(t.requestId, t.createdAt)],
);

/** An engineer without a bound account gets a link; only the SHA-256 of its token is kept. */
export const requestInvitations = sqliteTable(
  'request_invitations',
  {
    id: text('id').primaryKey(),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    createdAt: text('created_at').notNull(),
    expiresAt: text('expires_at').notNull(),
    acceptedAt: text('accepted_at'),
  },
  (t) => [index('request_invitations_request').on(t.requestId)],
);
