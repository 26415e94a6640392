import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { checklistStates } from '@/shared/schemas/job-checklist';
import { designRequests } from './design-requests';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/**
 * The engineer's "verify in the field" items on a job's checklist: one row per item of the structured reply
 * to one request version (`position` is its place in the reply). A new reply to the same version rebuilds
 * that version's rows; a row keeps the state, note and photos of the request's earlier row with the same
 * text. `photo_ids` are files of the request the firm uploaded for it.
 */
export const jobEngineerItems = sqliteTable(
  'job_engineer_items',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    requestId: text('request_id')
      .notNull()
      .references(() => designRequests.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    position: integer('position').notNull(),
    item: text('item').notNull(),
    photoAsked: integer('photo_asked', { mode: 'boolean' }).notNull(),
    state: text('state', { enum: checklistStates }).notNull(),
    note: text('note').notNull(),
    photoIds: text('photo_ids', { mode: 'json' }).$type<string[]>().notNull(),
    updatedBy: text('updated_by').references(() => users.id),
    updatedAt: text('updated_at'),
    createdAt: text('created_at').notNull(),
  },
  (t) => [
    uniqueIndex('job_engineer_items_request_version_position').on(t.requestId, t.version, t.position),
    index('job_engineer_items_job').on(t.jobId),
  ],
);
