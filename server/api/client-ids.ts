import type { Response } from 'express';
import { idTaken } from '@/server/app-error';
import { REPLAYED_HEADER } from '@/server/middleware/idempotency';
import type { Actor } from './audit/audit.repository';

/** A create's answer: the record, and whether it already existed from the same create sent before. */
export interface Created<T> {
  record: T;
  replayed: boolean;
}

/**
 * What a create with a device-chosen id meets (docs/sync-protocol.md): no record with the id (make it:
 * false), or the same create sent before — same firm, same person, `same` content (answer it: true).
 * Anything else is 409 id_taken, which says nothing about the record holding the id, in whatever firm.
 *
 * @param found the record holding the id, looked up in every firm; undefined when none does
 */
export function alreadyCreated(
  found: { orgId: string; createdBy: string } | undefined,
  actor: Actor,
  same: () => boolean,
): boolean {
  if (!found) return false;
  if (found.orgId === actor.orgId && found.createdBy === actor.userId && same()) return true;
  throw idTaken();
}

/** 201 with a new record; 200 and `Idempotent-Replayed: true` with one an earlier send made. */
export function sendCreated<T>(res: Response, created: Created<T>): void {
  if (created.replayed) res.setHeader(REPLAYED_HEADER, 'true');
  res.status(created.replayed ? 200 : 201).json(created.record);
}
