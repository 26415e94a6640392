import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Db, DbOrTx } from '@/db/client';
import { requestInvitations } from '@/db/schema';
import { AppError } from '@/server/app-error';
import { recordAudit } from '@/server/api/audit/audit.repository';
import {
  findUserByEmail,
  insertMembership,
  insertOrganization,
  insertUser,
  markEmailVerified,
} from '@/server/api/auth/auth.repository';
import { listMemberships } from '@/server/api/me/me.repository';
import { hashLinkToken } from '@/server/services/link-token';
import { hashPassword } from '@/server/services/password';
import { PASSWORD_IS_EMAIL, passwordMatchesEmail } from '@/shared/schemas/auth';
import type { AcceptRequestInvitation, RequestInvitationPreview } from '@/shared/schemas/requests/views';
import { findNames, findRequest, updateRequest } from './requests.repository';

const GONE = 'This link is not valid any more. Ask the contractor to send the request again.';

function findOpen(db: DbOrTx, token: string) {
  const invitation = db
    .select()
    .from(requestInvitations)
    .where(
      and(
        eq(requestInvitations.tokenHash, hashLinkToken(token)),
        isNull(requestInvitations.acceptedAt),
        gt(requestInvitations.expiresAt, new Date().toISOString()),
      ),
    )
    .get();
  const request = invitation && findRequest(db, invitation.requestId);
  // A request already bound to an account, or sent to another address since, is not this link's to bind.
  if (!invitation || !request || request.engineerUserId || request.engineerEmail !== invitation.email) {
    throw new AppError('not_found', GONE);
  }
  return { invitation, request };
}

export interface AcceptedRequest {
  userId: string;
  orgId: string;
  requestId: string;
  newAccount: boolean;
}

/**
 * The link mailed to an engineer the request could not be bound to at send. Following it binds the request
 * to the account of that address: a new one (with its own engineering firm) made here, or the existing one,
 * signed in. The link reached the address, so it confirms it, as an invitation does.
 */
export function createRequestInvitationsService(db: Db) {
  return {
    preview(token: string): RequestInvitationPreview {
      const { invitation, request } = findOpen(db, token);
      const names = findNames(db, request);
      return {
        email: invitation.email,
        firmName: names.firmName,
        jobName: names.jobName,
        number: request.number,
        hasAccount: findUserByEmail(db, invitation.email) !== undefined,
      };
    },

    async accept(
      token: string,
      input: AcceptRequestInvitation,
      signedInUserId?: string,
    ): Promise<AcceptedRequest> {
      const { invitation } = findOpen(db, token);
      const existing = findUserByEmail(db, invitation.email);
      let fresh: { name: string; passwordHash: string; firmName: string } | undefined;
      let engineerOrgId: string | undefined;
      if (existing) {
        if (!signedInUserId) throw new AppError('unauthorized', `Sign in as ${invitation.email} to open it`);
        if (signedInUserId !== existing.id)
          throw new AppError('forbidden', `This request is for ${invitation.email}`);
        engineerOrgId = listMemberships(db, existing.id).find((m) => m.role === 'engineer')?.orgId;
        if (!engineerOrgId) {
          throw new AppError(
            'conflict',
            'This address belongs to a contracting firm’s account, not an engineer’s',
          );
        }
      } else {
        const fields: Record<string, string[]> = {};
        if (!input.name) fields.name = ['Enter your name'];
        if (!input.password) fields.password = ['Choose a password'];
        else if (passwordMatchesEmail(input.password, invitation.email))
          fields.password = [PASSWORD_IS_EMAIL];
        if (!input.firmName) fields.firmName = ['Enter your firm’s name'];
        if (Object.keys(fields).length > 0)
          throw new AppError('bad_request', 'Some fields need attention', fields);
        fresh = {
          name: input.name!,
          passwordHash: await hashPassword(input.password!),
          firmName: input.firmName!,
        };
      }
      return db.transaction((tx) => {
        const again = findOpen(tx, token);
        const now = new Date();
        let userId: string;
        let orgId: string;
        if (existing && engineerOrgId) {
          userId = existing.id;
          orgId = engineerOrgId;
          markEmailVerified(tx, userId, now);
        } else {
          const made = fresh!;
          userId = insertUser(tx, {
            email: invitation.email,
            name: made.name,
            passwordHash: made.passwordHash,
            emailVerifiedAt: now.toISOString(),
          });
          orgId = insertOrganization(tx, { name: made.firmName, kind: 'engineering' });
          insertMembership(tx, { userId, orgId, role: 'engineer' });
        }
        tx.update(requestInvitations)
          .set({ acceptedAt: now.toISOString() })
          .where(eq(requestInvitations.id, invitation.id))
          .run();
        updateRequest(tx, again.request.id, { engineerUserId: userId, engineerUnread: true });
        recordAudit(
          tx,
          { userId, orgId: again.request.orgId },
          { action: 'request.bind', subject: again.request.id, detail: { newAccount: !existing } },
        );
        return { userId, orgId, requestId: again.request.id, newAccount: !existing };
      });
    },
  };
}

export type RequestInvitationsService = ReturnType<typeof createRequestInvitationsService>;
