import { and, asc, eq, or, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { namedAfter, rawPreparedPerDb } from '@/db/prepared';
import { loadPathBearings, loadPathElements } from '@/db/schema';
import type { LoadPathElementData, LoadPathEnd } from '@/shared/schemas/calc/load-path';
import type { Bearing, BearingSet, Element } from '@/shared/schemas/load-path-elements';

const elementColumns = {
  id: loadPathElements.id,
  jobId: loadPathElements.jobId,
  kind: loadPathElements.kind,
  label: loadPathElements.label,
  element: loadPathElements.element,
  createdAt: loadPathElements.createdAt,
  updatedAt: loadPathElements.updatedAt,
};

const toElement = namedAfter<Element>(elementColumns);
const elementsOfJob = rawPreparedPerDb(
  (db) =>
    db
      .select(elementColumns)
      .from(loadPathElements)
      .where(
        and(
          eq(loadPathElements.jobId, sql.placeholder('jobId')),
          eq(loadPathElements.orgId, sql.placeholder('orgId')),
        ),
      )
      .orderBy(asc(loadPathElements.createdAt), asc(sql`${loadPathElements}.rowid`)),
  (values): Element => {
    const row = toElement(values);
    return { ...row, element: JSON.parse(row.element as unknown as string) as LoadPathElementData };
  },
);

/** The job's existing framing in the order it was entered (read raw: every member save reads it). */
export function listElements(db: DbOrTx, orgId: string, jobId: string): Element[] {
  return elementsOfJob.all(db, jobId, orgId);
}

/** Only an element of `orgId`: another firm's id reads as missing. */
export function findElement(db: DbOrTx, orgId: string, elementId: string): Element | undefined {
  return db
    .select(elementColumns)
    .from(loadPathElements)
    .where(and(eq(loadPathElements.id, elementId), eq(loadPathElements.orgId, orgId)))
    .get();
}

export function insertElement(
  db: DbOrTx,
  owner: { orgId: string; jobId: string; userId: string },
  fields: { label: string; element: LoadPathElementData },
): Element {
  const now = new Date().toISOString();
  const element: Element = {
    id: newId(),
    jobId: owner.jobId,
    kind: fields.element.kind,
    label: fields.label,
    element: fields.element,
    createdAt: now,
    updatedAt: now,
  };
  db.insert(loadPathElements)
    .values({ ...element, orgId: owner.orgId, createdBy: owner.userId })
    .run();
  return element;
}

export function updateElement(
  db: DbOrTx,
  orgId: string,
  saved: Element,
  fields: { label: string; element: LoadPathElementData },
): Element {
  const changes = { ...fields, kind: fields.element.kind, updatedAt: new Date().toISOString() };
  db.update(loadPathElements)
    .set(changes)
    .where(and(eq(loadPathElements.id, saved.id), eq(loadPathElements.orgId, orgId)))
    .run();
  return { ...saved, ...changes };
}

export function deleteElement(db: DbOrTx, orgId: string, elementId: string): void {
  db.delete(loadPathElements)
    .where(and(eq(loadPathElements.id, elementId), eq(loadPathElements.orgId, orgId)))
    .run();
}

const bearingColumns = {
  id: loadPathBearings.id,
  fromId: loadPathBearings.fromId,
  end: loadPathBearings.end,
  ontoId: loadPathBearings.ontoId,
  atFt: loadPathBearings.atFt,
  hanger: loadPathBearings.hanger,
  through: loadPathBearings.through,
  joistRelation: loadPathBearings.joistRelation,
};

/** A stored bearing with its empty columns left out (as the engine's schema has them: optional). */
function asBearing(row: BearingRow): Bearing {
  const out: Bearing = { id: row.id, fromId: row.fromId, end: row.end, ontoId: row.ontoId };
  if (row.atFt !== null) out.atFt = row.atFt;
  if (row.hanger !== null) out.hanger = row.hanger;
  if (row.through !== null) out.through = row.through;
  if (row.joistRelation !== null) out.joistRelation = row.joistRelation;
  return out;
}

type BearingRow = { [K in keyof typeof bearingColumns]: (typeof loadPathBearings.$inferSelect)[K] };
const toBearingRow = namedAfter<BearingRow>(bearingColumns);
const bearingsOfJob = rawPreparedPerDb(
  (db) =>
    db
      .select(bearingColumns)
      .from(loadPathBearings)
      .where(
        and(
          eq(loadPathBearings.jobId, sql.placeholder('jobId')),
          eq(loadPathBearings.orgId, sql.placeholder('orgId')),
        ),
      )
      .orderBy(asc(sql`${loadPathBearings}.rowid`)),
  (values): Bearing => {
    const row = toBearingRow(values);
    // The hanger column holds 0 or 1 (drizzle's boolean mode); read raw, it is made a boolean here.
    return asBearing({ ...row, hanger: row.hanger === null ? null : Boolean(row.hanger) });
  },
);

/** The job's bearings in the order they were set (read raw: every member save reads them). */
export function listBearings(db: DbOrTx, orgId: string, jobId: string): Bearing[] {
  return bearingsOfJob.all(db, jobId, orgId);
}

/** Writes what `fromId`'s `end` bears on, over what it bore on before. */
export function upsertBearing(
  db: DbOrTx,
  owner: { orgId: string; jobId: string },
  fromId: string,
  end: LoadPathEnd,
  bearing: Omit<BearingSet, 'onto' | 'ontoId'> & { ontoId: string },
): Bearing {
  const values = {
    ontoId: bearing.ontoId,
    atFt: bearing.atFt ?? null,
    hanger: bearing.hanger ?? null,
    through: bearing.through ?? null,
    joistRelation: bearing.joistRelation ?? null,
    updatedAt: new Date().toISOString(),
  };
  const row = db
    .insert(loadPathBearings)
    .values({ id: newId(), jobId: owner.jobId, orgId: owner.orgId, fromId, end, ...values })
    .onConflictDoUpdate({ target: [loadPathBearings.fromId, loadPathBearings.end], set: values })
    .returning(bearingColumns)
    .get();
  return asBearing(row);
}

/** True when the end bore on something. */
export function deleteBearing(db: DbOrTx, orgId: string, fromId: string, end: LoadPathEnd): boolean {
  const deleted = db
    .delete(loadPathBearings)
    .where(
      and(
        eq(loadPathBearings.orgId, orgId),
        eq(loadPathBearings.fromId, fromId),
        eq(loadPathBearings.end, end),
      ),
    )
    .returning({ id: loadPathBearings.id })
    .all();
  return deleted.length > 0;
}

/** Every bearing of `id`'s ends and every bearing onto it (when it is deleted). */
export function deleteBearingsOf(db: DbOrTx, orgId: string, id: string): void {
  db.delete(loadPathBearings)
    .where(
      and(
        eq(loadPathBearings.orgId, orgId),
        or(eq(loadPathBearings.fromId, id), eq(loadPathBearings.ontoId, id)),
      ),
    )
    .run();
}
