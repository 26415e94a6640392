import { integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import type { ShoringPlanBody, ShoringResult } from '@/shared/schemas/shoring-plans';
import { jobs } from './jobs';
import { members } from './members';
import { organizations } from './organizations';
import { users } from './users';

/**
 * The temporary shoring plan of a member (one per member): the parsed `shoringPlanBodySchema` value and what
 * the server's lib/calc planShoring made of it with the member's loads at the time of the save.
 */
export const shoringPlans = sqliteTable('shoring_plans', {
  memberId: text('member_id')
    .primaryKey()
    .references(() => members.id, { onDelete: 'cascade' }),
  jobId: text('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' }),
  orgId: text('org_id')
    .notNull()
    .references(() => organizations.id, { onDelete: 'cascade' }),
  input: text('input', { mode: 'json' }).$type<ShoringPlanBody>().notNull(),
  result: text('result', { mode: 'json' }).$type<ShoringResult>().notNull(),
  engineVersion: text('engine_version').notNull(),
  updatedBy: text('updated_by')
    .notNull()
    .references(() => users.id),
  updatedAt: text('updated_at').notNull(),
  /**
   * The plan's own id, chosen by the device that made it (or the server); null on plans saved before plans
   * had one.
   */
  id: text('id').unique(),
  /** 1 on the first save, +1 on every save after it. */
  version: integer('version').notNull().default(1),
});
