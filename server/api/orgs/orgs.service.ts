import type { Db } from '@/db/client';
import { AppError, notFound } from '@/server/app-error';
import { recordAudit, type Actor } from '@/server/api/audit/audit.repository';
import { findUser } from '@/server/api/me/me.repository';
import { INVITATION_DAYS, newLinkToken } from '@/server/services/link-token';
import { invitationMail } from '@/server/services/mail/invitation-mail';
import type { Mailer } from '@/server/services/mail/mailer';
import { enqueueMail } from '@/server/services/mail/outbox.repository';
import type { CreateInvitationInput, InvitationRow, MembersResponse } from '@/shared/schemas/orgs';
import {
  deletePendingInvitation,
  deletePendingInvitationsFor,
  findOrganization,
  insertInvitation,
  isMemberByEmail,
  listMembers,
  listPendingInvitations,
} from './orgs.repository';

const DAY_MS = 24 * 60 * 60 * 1000;

export function createOrgsService(deps: { db: Db; mailer: Mailer; appOrigin: string }) {
  const { db } = deps;
  return {
    members(orgId: string): MembersResponse {
      return { members: listMembers(db, orgId), invitations: listPendingInvitations(db, orgId) };
    },

    /**
     * Replaces any earlier pending invitation for the same e-mail and queues the link's e-mail in the same
     * transaction: the invitation exists exactly when its mail does, whether or not SMTP is up right now.
     */
    invite(actor: Actor, input: CreateInvitationInput): InvitationRow {
      const org = findOrganization(db, actor.orgId);
      const inviter = findUser(db, actor.userId);
      if (!org || !inviter) throw notFound('Firm');
      if (isMemberByEmail(db, actor.orgId, input.email)) {
        throw new AppError('conflict', `${input.email} is already a member of ${org.name}`, {
          email: ['Already a member of this firm'],
        });
      }
      const { token, tokenHash } = newLinkToken();
      const expiresAt = new Date(Date.now() + INVITATION_DAYS * DAY_MS);
      const row = db.transaction((tx) => {
        deletePendingInvitationsFor(tx, actor.orgId, input.email);
        const created = insertInvitation(tx, {
          orgId: actor.orgId,
          email: input.email,
          role: input.role,
          tokenHash,
          invitedBy: actor.userId,
          expiresAt,
        });
        recordAudit(tx, actor, {
          action: 'invitation.create',
          subject: created.id,
          detail: { email: input.email, role: input.role },
        });
        enqueueMail(
          tx,
          invitationMail({
            to: input.email,
            orgName: org.name,
            inviterName: inviter.name,
            role: input.role,
            link: `${deps.appOrigin}/invite/${token}`,
            expiresAt,
          }),
        );
        return created;
      });
      deps.mailer.wake();
      return row;
    },

    revoke(actor: Actor, invitationId: string): void {
      db.transaction((tx) => {
        if (!deletePendingInvitation(tx, actor.orgId, invitationId)) throw notFound('Invitation');
        recordAudit(tx, actor, { action: 'invitation.revoke', subject: invitationId });
      });
    },
  };
}

export type OrgsService = ReturnType<typeof createOrgsService>;
