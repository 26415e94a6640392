import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { ScreenAnswers } from '@/shared/schemas/bearing-screen-answers';
import type { StoredScreenResult } from '@/shared/schemas/bearing-screens';
import { bearingScreenOutcomes } from '@/shared/schemas/calc/framing';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/**
 * A bearing screen of one wall (shared/schemas/bearing-screens.ts). `answers` is the parsed
 * `screenAnswersSchema` value; `outcome` and `result` are what the server's lib/calc screenWall made of it.
 * `version` counts the saves; bearing_screen_versions keeps every one.
 */
export const bearingScreens = sqliteTable(
  'bearing_screens',
  {
    id: text('id').primaryKey(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    wallLabel: text('wall_label').notNull(),
    answers: text('answers', { mode: 'json' }).$type<ScreenAnswers>().notNull(),
    outcome: text('outcome', { enum: bearingScreenOutcomes }).notNull(),
    result: text('result', { mode: 'json' }).$type<StoredScreenResult>().notNull(),
    version: integer('version').notNull(),
    engineVersion: text('engine_version').notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    updatedBy: text('updated_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
  },
  (t) => [index('bearing_screens_job_created').on(t.jobId, t.createdAt)],
);

/** Every saved version of a screen, the current one included: the screen's history. */
export const bearingScreenVersions = sqliteTable(
  'bearing_screen_versions',
  {
    id: text('id').primaryKey(),
    screenId: text('screen_id')
      .notNull()
      .references(() => bearingScreens.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    wallLabel: text('wall_label').notNull(),
    answers: text('answers', { mode: 'json' }).$type<ScreenAnswers>().notNull(),
    outcome: text('outcome', { enum: bearingScreenOutcomes }).notNull(),
    savedBy: text('saved_by')
      .notNull()
      .references(() => users.id),
    savedAt: text('saved_at').notNull(),
  },
  (t) => [uniqueIndex('bearing_screen_versions_screen_version').on(t.screenId, t.version)],
);
