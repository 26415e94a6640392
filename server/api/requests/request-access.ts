import { notFound } from '@/server/app-error';
import type { Role } from '@/shared/schemas/auth';
import type { RequestSide } from '@/shared/schemas/requests/workflow';
import type { DbOrTx } from '@/db/client';
import { recordAudit } from '@/server/api/audit/audit.repository';
import { findRequest, type RequestRow } from './requests.repository';

/** The signed-in person as a request route sees them: their active firm and role. */
export interface RequestViewer {
  userId: string;
  orgId: string;
  role: Role;
}

export const FIRM_ROLES: readonly Role[] = ['owner', 'contractor', 'estimator'];

/**
 * Which side of the request the viewer is on: a member of the sending firm acting in it, or the engineer
 * the request is bound to (never for a Draft). Anyone else reads the request as missing, so an id alone
 * tells nothing about another firm's requests.
 */
export function sideOf(row: RequestRow | undefined, viewer: RequestViewer): RequestSide {
  if (row && FIRM_ROLES.includes(viewer.role) && row.orgId === viewer.orgId) return 'firm';
  if (row && viewer.role === 'engineer' && row.engineerUserId === viewer.userId && row.status !== 'draft') {
    return 'engineer';
  }
  throw notFound('Design request');
}

/** The request and the viewer's side of it; anything not theirs is "not found". */
export function openRequest(
  db: DbOrTx,
  viewer: RequestViewer,
  requestId: string,
): { row: RequestRow; side: RequestSide } {
  const row = findRequest(db, requestId);
  const side = sideOf(row, viewer);
  return { row: row as RequestRow, side };
}

/**
 * One audit event of an action on the request, in the sending firm's log whichever side acted, so the firm
 * sees the whole story (who: the user; which side: in the detail).
 */
export function auditRequest(
  tx: DbOrTx,
  viewer: RequestViewer,
  row: RequestRow,
  action: string,
  detail: Record<string, unknown> = {},
): void {
  const side: RequestSide = FIRM_ROLES.includes(viewer.role) ? 'firm' : 'engineer';
  recordAudit(
    tx,
    { userId: viewer.userId, orgId: row.orgId },
    { action, subject: row.id, detail: { side, ...detail } },
  );
}
