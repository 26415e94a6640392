import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import type { MemberCheckInput, MemberCheckResult, PrescriptiveResult } from '@/shared/schemas/calc/member';
import { memberKinds } from '@/shared/schemas/calc/member';
import type { MemberSummary } from '@/shared/schemas/members';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/**
 * A member saved on a job (shared/schemas/members.ts). `org_id` repeats the job's firm so every query can
 * filter by firm without a join. `input` is the parsed `memberCheckInputSchema` value; `result`, `summary`
 * and `prescriptive` are what the server computed from it with the engine named by `engine_version`.
 */
export const members = sqliteTable(
  'members',
  {
    id: text('id').primaryKey(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    kind: text('kind', { enum: memberKinds }).notNull(),
    label: text('label').notNull(),
    wall: text('wall').notNull(),
    input: text('input', { mode: 'json' }).$type<MemberCheckInput>().notNull(),
    materialId: text('material_id').notNull(),
    sizeId: text('size_id').notNull(),
    summary: text('summary', { mode: 'json' }).$type<MemberSummary>().notNull(),
    result: text('result', { mode: 'json' }).$type<MemberCheckResult>().notNull(),
    prescriptive: text('prescriptive', { mode: 'json' }).$type<PrescriptiveResult>(),
    engineVersion: text('engine_version').notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    updatedBy: text('updated_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
    /** 1 on create, +1 on every change (a recompute after a job change included). */
    version: integer('version').notNull().default(1),
  },
  (t) => [index('members_job_created').on(t.jobId, t.createdAt)],
);
