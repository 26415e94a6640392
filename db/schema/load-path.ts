import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import {
  joistRelations,
  loadPathEnds,
  throughKinds,
  type LoadPathElementData,
} from '@/shared/schemas/calc/load-path';
import { jobs } from './jobs';
import { organizations } from './organizations';
import { users } from './users';

/**
 * A job's existing framing on the load path (shared/schemas/load-path-elements.ts): `element` is the parsed
 * engine element data (`loadPathElementDataSchema`, never a member); `kind` repeats its kind for listing.
 */
export const loadPathElements = sqliteTable(
  'load_path_elements',
  {
    id: text('id').primaryKey(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    kind: text('kind').notNull(),
    label: text('label').notNull(),
    element: text('element', { mode: 'json' }).$type<LoadPathElementData>().notNull(),
    createdBy: text('created_by')
      .notNull()
      .references(() => users.id),
    createdAt: text('created_at').notNull(),
    updatedAt: text('updated_at').notNull(),
  },
  (t) => [index('load_path_elements_job').on(t.jobId, t.createdAt)],
);

/**
 * What one end of a member or an existing element (`from_id`) bears on (`onto_id`, a member or element of
 * the same job). One row per end; rows go when either side is deleted (the services delete them).
 */
export const loadPathBearings = sqliteTable(
  'load_path_bearings',
  {
    id: text('id').primaryKey(),
    jobId: text('job_id')
      .notNull()
      .references(() => jobs.id, { onDelete: 'cascade' }),
    orgId: text('org_id')
      .notNull()
      .references(() => organizations.id, { onDelete: 'cascade' }),
    fromId: text('from_id').notNull(),
    end: text('end', { enum: loadPathEnds }).notNull(),
    ontoId: text('onto_id').notNull(),
    atFt: real('at_ft'),
    hanger: integer('hanger', { mode: 'boolean' }),
    through: text('through', { enum: throughKinds }),
    joistRelation: text('joist_relation', { enum: joistRelations }),
    updatedAt: text('updated_at').notNull(),
  },
  (t) => [
    uniqueIndex('load_path_bearings_end').on(t.fromId, t.end),
    index('load_path_bearings_job').on(t.jobId),
  ],
);
