import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import { recordAudit } from '@/server/api/audit/audit.repository';
import {
  findUserByEmail,
  insertMembership,
  insertUser,
  markEmailVerified,
} from '@/server/api/auth/auth.repository';
import { listMemberships } from '@/server/api/me/me.repository';
import { hashLinkToken } from '@/server/services/link-token';
import { hashPassword } from '@/server/services/password';
import { passwordRuleProblem } from '@/server/services/password-rules';
import type { AcceptInvitationInput, InvitationPreview } from '@/shared/schemas/orgs';
import { findOpenInvitation, markAccepted } from './invitations.repository';

const GONE = 'This invitation is not valid any more. Ask for a new one.';

export interface AcceptResult {
  userId: string;
  orgId: string;
  /** True when accepting made a new account (the caller opens a session for it). */
  newAccount: boolean;
}

/** A new person must send a name and a password; the password is hashed before any write. */
async function newAccountFields(
  input: AcceptInvitationInput,
  email: string,
): Promise<{ name: string; passwordHash: string }> {
  const passwordProblem =
    input.password === undefined
      ? undefined
      : passwordRuleProblem(input.password, { email, name: input.name });
  if (!input.name || !input.password || passwordProblem) {
    const fields: Record<string, string[]> = {};
    if (!input.name) fields.name = ['Enter your name'];
    if (!input.password) fields.password = ['Choose a password'];
    if (passwordProblem) fields.password = [passwordProblem];
    throw new AppError('bad_request', 'Some fields need attention', fields);
  }
  return { name: input.name, passwordHash: await hashPassword(input.password) };
}

export function createInvitationsService(db: Db) {
  const open = (token: string) => {
    const invitation = findOpenInvitation(db, hashLinkToken(token), new Date());
    if (!invitation) throw new AppError('not_found', GONE);
    return invitation;
  };

  return {
    preview(token: string): InvitationPreview {
      const invitation = open(token);
      return {
        orgName: invitation.orgName,
        email: invitation.email,
        role: invitation.role,
        invitedBy: invitation.invitedBy,
        expiresAt: invitation.expiresAt,
        hasAccount: findUserByEmail(db, invitation.email) !== undefined,
      };
    },

    /**
     * An existing account must be the signed-in user; a new person sends a name and password and gets an
     * account. Either way the membership and the invitation's use are one transaction.
     */
    async accept(
      token: string,
      input: AcceptInvitationInput,
      signedInUserId?: string,
    ): Promise<AcceptResult> {
      const invitation = open(token);
      const existing = findUserByEmail(db, invitation.email);
      if (existing) {
        if (!signedInUserId) throw new AppError('unauthorized', `Sign in as ${invitation.email} to accept`);
        if (signedInUserId !== existing.id) {
          throw new AppError('forbidden', `This invitation is for ${invitation.email}`);
        }
        if (listMemberships(db, existing.id).some((m) => m.orgId === invitation.orgId)) {
          throw new AppError('conflict', `You are already a member of ${invitation.orgName}`);
        }
      }
      const account = existing
        ? ({ kind: 'existing', userId: existing.id } as const)
        : ({ kind: 'new', fields: await newAccountFields(input, invitation.email) } as const);
      return db.transaction((tx) => {
        if (!markAccepted(tx, invitation.id, new Date())) throw new AppError('not_found', GONE);
        const userId =
          account.kind === 'existing'
            ? account.userId
            : insertUser(tx, {
                email: invitation.email,
                ...account.fields,
                // The link reached this address: that confirms it.
                emailVerifiedAt: new Date().toISOString(),
              });
        if (account.kind === 'existing') markEmailVerified(tx, userId, new Date());
        insertMembership(tx, { userId, orgId: invitation.orgId, role: invitation.role });
        recordAudit(
          tx,
          { userId, orgId: invitation.orgId },
          { action: 'invitation.accept', subject: invitation.id, detail: { role: invitation.role } },
        );
        return { userId, orgId: invitation.orgId, newAccount: !existing };
      });
    },
  };
}

export type InvitationsService = ReturnType<typeof createInvitationsService>;
