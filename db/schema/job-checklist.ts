import { integer, primaryKey, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { checklistItemKeys, checklistStates } from '@/shared/schemas/job-checklist';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/** A checklist item someone has set on a job; items nobody has touched have no row (their starting state). */
export const jobChecklistItems = sqliteTable(
  'job_checklist_items',
  {
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    itemKey: text('item_key', { enum: checklistItemKeys }).notNull(),
    state: text('state', { enum: checklistStates }).notNull(),
    note: text('note').notNull(),
    updatedBy: text('updated_by')
      .notNull()
      .references(() => users.id),
    updatedAt: text('updated_at').notNull(),
    /** 1 on the first change, +1 on every change after it; an untouched item (no row) is version 0. */
    version: integer('version').notNull().default(1),
  },
  (t) => [primaryKey({ columns: [t.jobId, t.itemKey] })],
);
