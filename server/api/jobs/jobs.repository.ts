import { and, desc, eq, getTableColumns, isNotNull, isNull, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { namedAfter, rawPreparedPerDb } from '@/db/prepared';
import { jobs, members } from '@/db/schema';
import type { Job, JobPatch, MemberStateCounts, jobInputSchema } from '@/shared/schemas/jobs';
import type { z } from 'zod';

export type JobFields = z.output<typeof jobInputSchema>;

function toJob(row: typeof jobs.$inferSelect): Job {
  const { createdBy: _createdBy, ...job } = row;
  return job;
}

/** A job's columns but its maker: every column is plain text or a number, so the list reads them raw. */
const { createdBy: _createdBy, ...jobColumns } = getTableColumns(jobs);

const jobsOf = (archived: boolean) =>
  rawPreparedPerDb(
    (db) =>
      db
        .select(jobColumns)
        .from(jobs)
        .where(
          and(
            eq(jobs.orgId, sql.placeholder('orgId')),
            archived ? isNotNull(jobs.archivedAt) : isNull(jobs.archivedAt),
          ),
        )
        // rowid breaks ties between rows written in the same millisecond, keeping insertion order.
        .orderBy(desc(jobs.createdAt), desc(sql`${jobs}.rowid`)),
    namedAfter<Job>(jobColumns),
  );
const openJobsOf = jobsOf(false);
const archivedJobsOf = jobsOf(true);

const jobById = rawPreparedPerDb(
  (db) =>
    db
      .select(jobColumns)
      .from(jobs)
      .where(and(eq(jobs.id, sql.placeholder('jobId')), eq(jobs.orgId, sql.placeholder('orgId')))),
  namedAfter<Job>(jobColumns),
);

export function listJobs(db: DbOrTx, orgId: string, archived: boolean): Job[] {
  return (archived ? archivedJobsOf : openJobsOf).all(db, orgId);
}

const memberState = sql<string>`json_extract(${members.summary}, '$.state')`;

/** One grouped query for every job of the firm: its members counted by the state their summary holds. */
const memberStateColumns = { jobId: members.jobId, state: memberState, count: sql<number>`count(*)` };
const memberStatesOf = rawPreparedPerDb(
  (db) =>
    db
      .select(memberStateColumns)
      .from(members)
      .where(eq(members.orgId, sql.placeholder('orgId')))
      .groupBy(members.jobId, memberState),
  namedAfter<{ jobId: string; state: string; count: number }>(memberStateColumns),
);

export const noMembers = (): MemberStateCounts => ({
  passes: 0,
  fails: 0,
  'engineer-needed': 0,
  'load-path-open': 0,
});

/** The firm's members counted by state, per job (a job with no members has no entry). */
export function memberStatesByJob(db: DbOrTx, orgId: string): Map<string, MemberStateCounts> {
  const out = new Map<string, MemberStateCounts>();
  for (const row of memberStatesOf.all(db, orgId)) {
    const counts = out.get(row.jobId) ?? noMembers();
    if (row.state in counts) counts[row.state as keyof MemberStateCounts] += row.count;
    out.set(row.jobId, counts);
  }
  return out;
}

/** Only a job of `orgId`: another firm's id reads as missing. */
export function findJob(db: DbOrTx, orgId: string, jobId: string): Job | undefined {
  return jobById.get(db, jobId, orgId);
}

/** The job holding `jobId` in whatever firm, with its maker: only for checking a device-chosen id. */
export function findJobInAnyFirm(db: DbOrTx, jobId: string): (Job & { createdBy: string }) | undefined {
  return db.select().from(jobs).where(eq(jobs.id, jobId)).get();
}

/** Makes the job with `id` (a device-chosen one) or a new id. */
export function insertJob(
  db: DbOrTx,
  orgId: string,
  createdBy: string,
  fields: JobFields,
  id: string = newId(),
): Job {
  const now = new Date().toISOString();
  const row = {
    id,
    orgId,
    createdBy,
    ...fields,
    createdAt: now,
    updatedAt: now,
    archivedAt: null,
    version: 1,
  };
  db.insert(jobs).values(row).run();
  return toJob(row);
}

export function updateJob(
  db: DbOrTx,
  orgId: string,
  jobId: string,
  patch: Omit<JobPatch, 'baseVersion'>,
): Job | undefined {
  const row = db
    .update(jobs)
    .set({ ...patch, updatedAt: new Date().toISOString(), version: sql`${jobs.version} + 1` })
    .where(and(eq(jobs.id, jobId), eq(jobs.orgId, orgId)))
    .returning()
    .get();
  return row && toJob(row);
}

/** Sets `archived_at` once; archiving an archived job keeps its first date. */
export function archiveJob(db: DbOrTx, orgId: string, jobId: string): Job | undefined {
  const now = new Date().toISOString();
  const job = findJob(db, orgId, jobId);
  if (!job || job.archivedAt) return job;
  const row = db
    .update(jobs)
    .set({ archivedAt: now, updatedAt: now, version: sql`${jobs.version} + 1` })
    .where(and(eq(jobs.id, jobId), eq(jobs.orgId, orgId)))
    .returning()
    .get();
  return row && toJob(row);
}
