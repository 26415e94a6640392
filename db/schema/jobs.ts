import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { adoptedCodes, foundationTypes, loadStandardEditions, roofTypes } from '@/shared/schemas/jobs';
import { organizations } from './organizations';
import { users } from './users';

/** Columns mirror `jobInputSchema` in shared/schemas/jobs.ts: lengths in ft, slope in inches per 12, snow in psf. */
export const jobs = sqliteTable(
  'jobs',
  {
    id: text('id').primaryKey(),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    address: text('address').notNull(),
    yearBuilt: integer('year_built'),
    stories: integer('stories').notNull(),
    roofType: text('roof_type', { enum: roofTypes }).notNull(),
    roofPitchIn12: real('roof_pitch_in12').notNull(),
    buildingWidthFt: real('building_width_ft'),
    adoptedCode: text('adopted_code', { enum: adoptedCodes }),
    loadStandard: text('load_standard', { enum: loadStandardEditions }).notNull(),
    groundSnowPsf: real('ground_snow_psf').notNull(),
    groundSnowSource: text('ground_snow_source').notNull(),
    foundation: text('foundation', { enum: foundationTypes }).notNull(),
    notes: text('notes').notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
    archivedAt: text('archived_at'),
    /** 1 on create, +1 on every change: a device's edit names the version it was made on. */
    version: integer('version').notNull().default(1),
  },
  (t) => [index('jobs_org_created').on(t.orgId, t.createdAt)],
);
