import { notFound } from '@/server/app-error';
import type { Role } from '@/shared/schemas/auth';
import type { RequestSide } from '@/shared/schemas/requests/workflow';
import type { RequestRow } from './requests.repository';

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
