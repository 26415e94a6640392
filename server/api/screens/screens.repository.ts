import { and, asc, desc, eq, lt, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { bearingScreenVersions, bearingScreens, users } from '@/db/schema';
import type { Screen, ScreenVersion } from '@/shared/schemas/bearing-screens';

/** What a save writes besides the ids, the people, the dates and the version. */
export type ScreenFields = Pick<Screen, 'wallLabel' | 'answers' | 'outcome' | 'result' | 'engineVersion'>;

const screenColumns = {
  id: bearingScreens.id,
  jobId: bearingScreens.jobId,
  wallLabel: bearingScreens.wallLabel,
  answers: bearingScreens.answers,
  outcome: bearingScreens.outcome,
  result: bearingScreens.result,
  version: bearingScreens.version,
  engineVersion: bearingScreens.engineVersion,
  createdBy: bearingScreens.createdBy,
  updatedBy: bearingScreens.updatedBy,
  updatedByName: users.name,
  createdAt: bearingScreens.createdAt,
  updatedAt: bearingScreens.updatedAt,
};

const selectScreens = (db: DbOrTx) =>
  db.select(screenColumns).from(bearingScreens).innerJoin(users, eq(users.id, bearingScreens.updatedBy));

/** The job's screens in the order they were made. */
export function listScreens(db: DbOrTx, orgId: string, jobId: string): Screen[] {
  return (
    selectScreens(db)
      .where(and(eq(bearingScreens.jobId, jobId), eq(bearingScreens.orgId, orgId)))
      // rowid breaks ties between rows written in the same millisecond, keeping insertion order.
      .orderBy(asc(bearingScreens.createdAt), asc(sql`${bearingScreens}.rowid`))
      .all()
  );
}

/** Screens of every open job of the firm that say engineer required (for the jobs list). */
export function listEngineerScreens(db: DbOrTx, orgId: string): { jobId: string }[] {
  return db
    .select({ jobId: bearingScreens.jobId })
    .from(bearingScreens)
    .where(and(eq(bearingScreens.orgId, orgId), eq(bearingScreens.outcome, 'engineer-required')))
    .all();
}

/** Who made the screen holding `screenId`, in whatever firm, and what: only for checking a device-chosen id. */
export function findScreenInAnyFirm(
  db: DbOrTx,
  screenId: string,
): (Pick<Screen, 'jobId' | 'wallLabel' | 'answers' | 'createdBy'> & { orgId: string }) | undefined {
  return db
    .select({
      orgId: bearingScreens.orgId,
      jobId: bearingScreens.jobId,
      wallLabel: bearingScreens.wallLabel,
      answers: bearingScreens.answers,
      createdBy: bearingScreens.createdBy,
    })
    .from(bearingScreens)
    .where(eq(bearingScreens.id, screenId))
    .get();
}

/** Only a screen of `orgId`: another firm's id reads as missing. */
export function findScreen(db: DbOrTx, orgId: string, screenId: string): Screen | undefined {
  return selectScreens(db)
    .where(and(eq(bearingScreens.id, screenId), eq(bearingScreens.orgId, orgId)))
    .get();
}

/** The screen's versions before `beforeVersion`, newest first. */
export function listScreenVersions(
  db: DbOrTx,
  orgId: string,
  screenId: string,
  beforeVersion: number,
): ScreenVersion[] {
  return db
    .select({
      version: bearingScreenVersions.version,
      wallLabel: bearingScreenVersions.wallLabel,
      answers: bearingScreenVersions.answers,
      outcome: bearingScreenVersions.outcome,
      savedBy: bearingScreenVersions.savedBy,
      savedByName: users.name,
      savedAt: bearingScreenVersions.savedAt,
    })
    .from(bearingScreenVersions)
    .innerJoin(users, eq(users.id, bearingScreenVersions.savedBy))
    .where(
      and(
        eq(bearingScreenVersions.screenId, screenId),
        eq(bearingScreenVersions.orgId, orgId),
        lt(bearingScreenVersions.version, beforeVersion),
      ),
    )
    .orderBy(desc(bearingScreenVersions.version))
    .all();
}

function insertVersion(
  db: DbOrTx,
  orgId: string,
  screenId: string,
  version: number,
  savedBy: string,
  at: string,
  fields: ScreenFields,
): void {
  db.insert(bearingScreenVersions)
    .values({
      id: newId(),
      screenId,
      orgId,
      version,
      wallLabel: fields.wallLabel,
      answers: fields.answers,
      outcome: fields.outcome,
      savedBy,
      savedAt: at,
    })
    .run();
}

export function insertScreen(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  fields: ScreenFields,
  id: string = newId(),
): string {
  const at = new Date().toISOString();
  db.insert(bearingScreens)
    .values({
      id,
      jobId: owner.jobId,
      orgId: owner.orgId,
      ...fields,
      version: 1,
      createdBy: owner.userId,
      updatedBy: owner.userId,
      createdAt: at,
      updatedAt: at,
    })
    .run();
  insertVersion(db, owner.orgId, id, 1, owner.userId, at, fields);
  return id;
}

/** Writes the next version of the screen and keeps it in the history. */
export function updateScreen(
  db: DbOrTx,
  orgId: string,
  saved: Screen,
  updatedBy: string,
  fields: ScreenFields,
): void {
  const at = new Date().toISOString();
  const version = saved.version + 1;
  db.update(bearingScreens)
    .set({ ...fields, version, updatedBy, updatedAt: at })
    .where(and(eq(bearingScreens.id, saved.id), eq(bearingScreens.orgId, orgId)))
    .run();
  insertVersion(db, orgId, saved.id, version, updatedBy, at, fields);
}
