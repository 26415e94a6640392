import type { Db, DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { requestInvitations } from '@/db/schema';
import { AppError, notFound } from '@/server/app-error';
import { findUserByEmail } from '@/server/api/auth/auth.repository';
import { syncEngineerItems } from '@/server/api/checklist/engineer-items.repository';
import { findJob } from '@/server/api/jobs/jobs.repository';
import { findUser, listMemberships } from '@/server/api/me/me.repository';
import { findMember } from '@/server/api/members/members.repository';
import { newLinkToken } from '@/server/services/link-token';
import { requestNewsMail, requestSentMail } from '@/server/services/mail/design-request-mail';
import type { Mailer } from '@/server/services/mail/mailer';
import { enqueueMail } from '@/server/services/mail/outbox.repository';
import type { RequestCompose, RequestPatch } from '@/shared/schemas/requests/compose';
import type { EngineerReply } from '@/shared/schemas/requests/reply';
import type {
  RequestDetail,
  RequestListItem,
  RequestVersionSnapshot,
  ThreadEntry,
} from '@/shared/schemas/requests/views';
import {
  REQUEST_STATE_LABELS,
  type FeeQuote,
  type MessageCreate,
  type RequestSide,
  type RequestState,
  type Revision,
  type StatusChange,
} from '@/shared/schemas/requests/workflow';
import { changesBetween } from './request-changes';
import { describeRequest, toListItem } from './request-detail';
import { auditRequest, openRequest, type RequestViewer } from './request-access';
import { buildSnapshot } from './request-snapshot';
import { assertMay, statusAction } from './request-transitions';
import {
  claimForMessage,
  findNames,
  insertReply,
  insertRequest,
  insertThreadEntry,
  insertVersion,
  latestReply,
  listAttachments,
  listEngineerRequests,
  listFirmRequests,
  findVersion,
  listVersions,
  updateRequest,
  type RequestRow,
} from './requests.repository';

/** How long the link of an engineer without a bound account works. */
export const REQUEST_INVITATION_DAYS = 30;

const other = (side: RequestSide): RequestSide => (side === 'firm' ? 'engineer' : 'firm');
const unreadFlag = (side: RequestSide) => (side === 'firm' ? 'firmUnread' : 'engineerUnread');

/** The job must be the firm's and open; every picked member must be one of its members. */
function checkJobAndMembers(tx: DbOrTx, orgId: string, jobId: string, memberIds: string[]): void {
  const job = findJob(tx, orgId, jobId);
  if (!job) throw notFound('Job');
  if (job.archivedAt) throw new AppError('conflict', 'This job is archived: it cannot send design requests');
  const fields: Record<string, string[]> = {};
  memberIds.forEach((id, index) => {
    if (findMember(tx, orgId, id)?.jobId !== jobId)
      fields[`memberIds.${index}`] = ['No such member on this job'];
  });
  if (new Set(memberIds).size !== memberIds.length) fields.memberIds = ['Pick each member once'];
  if (Object.keys(fields).length > 0) throw new AppError('bad_request', 'Some fields need attention', fields);
}

/** The confirmed engineer account of `email`, if there is one (an unconfirmed account is never bound). */
function confirmedEngineer(tx: DbOrTx, email: string): string | null {
  const user = findUserByEmail(tx, email);
  if (!user?.emailVerifiedAt) return null;
  return listMemberships(tx, user.id).some((m) => m.role === 'engineer') ? user.id : null;
}

export function createRequestsService(deps: { db: Db; mailer: Mailer; appOrigin: string }) {
  const { db } = deps;
  const link = (row: RequestRow) => `${deps.appOrigin}/requests/${row.id}`;

  /** Mails the other side of `side` about `news` and marks the request unread for it. */
  function tellOtherSide(tx: DbOrTx, row: RequestRow, side: RequestSide, news: string): RequestRow {
    const { jobName } = findNames(tx, row);
    const to =
      other(side) === 'firm'
        ? findUser(tx, row.createdBy)?.email
        : row.engineerUserId
          ? findUser(tx, row.engineerUserId)?.email
          : undefined;
    if (to) enqueueMail(tx, requestNewsMail({ to, number: row.number, jobName, news, link: link(row) }));
    return updateRequest(tx, row.id, { [unreadFlag(other(side))]: true });
  }

  /** Mails the engineer the new version: a link to it when bound, else an invitation that binds it. */
  function mailVersion(tx: DbOrTx, row: RequestRow, sentBy: string): void {
    const email = row.engineerEmail ?? '';
    const sender = findUser(tx, sentBy);
    const { firmName, jobName } = findNames(tx, row);
    let target = link(row);
    if (!row.engineerUserId) {
      const { token, tokenHash } = newLinkToken();
      const now = new Date();
      tx.insert(requestInvitations)
        .values({
          id: newId(),
          requestId: row.id,
          email,
          tokenHash,
          createdAt: now.toISOString(),
          expiresAt: new Date(now.getTime() + REQUEST_INVITATION_DAYS * 86_400_000).toISOString(),
        })
        .run();
      target = `${deps.appOrigin}/request-invite/${token}`;
    }
    enqueueMail(
      tx,
      requestSentMail({
        to: email,
        firmName,
        contractorName: sender?.name ?? '',
        number: row.number,
        version: row.version,
        jobName,
        link: target,
        invitation: !row.engineerUserId,
      }),
    );
  }

  function event(
    tx: DbOrTx,
    viewer: RequestViewer,
    row: RequestRow,
    side: RequestSide,
    name: string,
    body = '',
  ) {
    insertThreadEntry(tx, {
      requestId: row.id,
      kind: 'event',
      side,
      userId: viewer.userId,
      body,
      event: name,
      version: row.version,
    });
  }

  /** Writes `patch` over the working copy (the next send or revision freezes it); the engineer stays once sent. */
  function editWorkingCopy(
    tx: DbOrTx,
    viewer: RequestViewer,
    row: RequestRow,
    side: RequestSide,
    patch: RequestPatch,
  ): RequestRow {
    assertMay('edit', side, row.status);
    if (
      patch.engineerEmail !== undefined &&
      row.status !== 'draft' &&
      patch.engineerEmail !== row.engineerEmail
    ) {
      throw new AppError('conflict', 'The engineer of a sent request cannot change: start a new request', {
        engineerEmail: ['The engineer of a sent request cannot change'],
      });
    }
    const draft = {
      ...row.draft,
      ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)),
    };
    checkJobAndMembers(tx, row.orgId, row.jobId, draft.memberIds);
    auditRequest(tx, viewer, row, 'request.update', { fields: Object.keys(patch) });
    return updateRequest(tx, row.id, { draft, engineerEmail: draft.engineerEmail });
  }

  /** Freezes the next version from the working copy, with what changed since the one before. */
  function freeze(tx: DbOrTx, row: RequestRow, viewer: RequestViewer, note: string): RequestRow {
    const version = row.version + 1;
    const snapshot = buildSnapshot(tx, row, viewer.userId, version);
    const previous = listVersions(tx, row.id).at(-1);
    insertVersion(tx, {
      requestId: row.id,
      snapshot,
      changes: previous ? changesBetween(previous.snapshot, snapshot) : [],
      note,
      sentBy: viewer.userId,
    });
    return updateRequest(tx, row.id, { version });
  }

  /** Runs `change` in one transaction, wakes the mailer after it commits and answers the viewer's detail. */
  function act(
    viewer: RequestViewer,
    requestId: string,
    change: (tx: DbOrTx, row: RequestRow, side: RequestSide) => RequestRow,
  ): RequestDetail {
    const detail = db.transaction((tx) => {
      const { row, side } = openRequest(tx, viewer, requestId);
      return describeRequest(tx, change(tx, row, side), side);
    });
    deps.mailer.wake();
    return detail;
  }

  return {
    list(viewer: RequestViewer, state?: RequestState): RequestListItem[] {
      if (viewer.role === 'engineer') {
        return listEngineerRequests(db, viewer.userId, state).map((r) => toListItem(r, 'engineer'));
      }
      return listFirmRequests(db, viewer.orgId, { state }).map((r) => toListItem(r, 'firm'));
    },

    listForJob(viewer: RequestViewer, jobId: string): RequestListItem[] {
      if (!findJob(db, viewer.orgId, jobId)) throw notFound('Job');
      return listFirmRequests(db, viewer.orgId, { jobId }).map((r) => toListItem(r, 'firm'));
    },

    create(viewer: RequestViewer, jobId: string, body: RequestCompose): RequestDetail {
      return db.transaction((tx) => {
        checkJobAndMembers(tx, viewer.orgId, jobId, body.memberIds);
        const row = insertRequest(tx, { orgId: viewer.orgId, jobId, userId: viewer.userId }, body);
        auditRequest(tx, viewer, row, 'request.create', { jobId, number: row.number });
        return describeRequest(tx, row, 'firm');
      });
    },

    /** Opening a request clears the viewer's unread mark. */
    get(viewer: RequestViewer, requestId: string): RequestDetail {
      return db.transaction((tx) => {
        const { row, side } = openRequest(tx, viewer, requestId);
        const seen = row[unreadFlag(side)] ? updateRequest(tx, row.id, { [unreadFlag(side)]: false }) : row;
        return describeRequest(tx, seen, side);
      });
    },

    /** One sent version's frozen snapshot, for comparing two versions side by side. */
    version(viewer: RequestViewer, requestId: string, version: number): RequestVersionSnapshot {
      const { row } = openRequest(db, viewer, requestId);
      const found = findVersion(db, row.id, version);
      if (!found) throw notFound('Version');
      return { version: found.version, sentAt: found.sentAt, note: found.note, snapshot: found.snapshot };
    },

    thread(viewer: RequestViewer, requestId: string): ThreadEntry[] {
      const { row, side } = openRequest(db, viewer, requestId);
      return describeRequest(db, row, side).thread;
    },

    update(viewer: RequestViewer, requestId: string, patch: RequestPatch): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => editWorkingCopy(tx, viewer, row, side, patch));
    },

    send(viewer: RequestViewer, requestId: string): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay('send', side, row.status);
        checkJobAndMembers(tx, row.orgId, row.jobId, row.draft.memberIds);
        const engineerUserId = row.engineerEmail ? confirmedEngineer(tx, row.engineerEmail) : null;
        const frozen = freeze(tx, row, viewer, '');
        const sent = updateRequest(tx, row.id, {
          status: 'sent',
          sentAt: new Date().toISOString(),
          engineerUserId,
          engineerUnread: true,
        });
        event(tx, viewer, sent, side, 'sent');
        mailVersion(tx, sent, viewer.userId);
        auditRequest(tx, viewer, frozen, 'request.send', {
          version: sent.version,
          bound: engineerUserId !== null,
        });
        return sent;
      });
    },

    /** A new version from the working copy, after `body.draft`'s edits when there are any. */
    revise(viewer: RequestViewer, requestId: string, body: Revision): RequestDetail {
      return act(viewer, requestId, (tx, opened, side) => {
        const row = body.draft ? editWorkingCopy(tx, viewer, opened, side, body.draft) : opened;
        const reopening = row.status === 'designed';
        assertMay(reopening ? 'reopen' : 'revise', side, row.status);
        if (reopening && !body.question) {
          throw new AppError('bad_request', 'Ask the engineer your question', {
            question: ['A Designed request reopens with a question'],
          });
        }
        checkJobAndMembers(tx, row.orgId, row.jobId, row.draft.memberIds);
        const frozen = freeze(tx, row, viewer, body.note);
        const next = reopening ? updateRequest(tx, row.id, { status: 'in-review' }) : frozen;
        event(tx, viewer, next, side, reopening ? 'reopened' : 'revised', body.note);
        if (body.question) {
          insertThreadEntry(tx, {
            requestId: row.id,
            kind: 'message',
            side,
            userId: viewer.userId,
            body: body.question,
            version: next.version,
          });
        }
        mailVersion(tx, next, viewer.userId);
        auditRequest(tx, viewer, next, reopening ? 'request.reopen' : 'request.revise', {
          version: next.version,
        });
        return updateRequest(tx, row.id, { engineerUnread: true });
      });
    },

    setStatus(viewer: RequestViewer, requestId: string, change: StatusChange): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay(statusAction(change.to), side, row.status);
        if (change.to === 'designed') {
          const missing: string[] = [];
          if (!row.feeAcceptedAt) missing.push('the contractor has not accepted a fee');
          if (latestReply(tx, row.id)?.version !== row.version) {
            missing.push(`there is no structured reply to version ${row.version}`);
          }
          const designs = listAttachments(tx, row.id).filter(
            (f) => f.purpose === 'design' && f.version === row.version,
          );
          if (designs.length === 0) missing.push(`no design document answers version ${row.version}`);
          if (missing.length > 0) throw new AppError('conflict', `Not Designed yet: ${missing.join('; ')}`);
        }
        const moved = updateRequest(tx, row.id, {
          status: change.to,
          declineReason: change.to === 'declined' ? change.reason : row.declineReason,
        });
        event(tx, viewer, moved, side, change.to, change.reason);
        auditRequest(tx, viewer, moved, 'request.status', { from: row.status, to: change.to });
        return tellOtherSide(
          tx,
          moved,
          side,
          `now ${REQUEST_STATE_LABELS[change.to]}${change.reason ? ` (${change.reason})` : ''}`,
        );
      });
    },

    quoteFee(viewer: RequestViewer, requestId: string, quote: FeeQuote): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay('quote-fee', side, row.status);
        const quoted = updateRequest(tx, row.id, {
          feeUsd: quote.feeUsd,
          turnaroundDays: quote.turnaroundDays,
          siteVisit: quote.siteVisit,
          feeNote: quote.note,
          feeQuotedAt: new Date().toISOString(),
          feeAcceptedAt: null,
        });
        event(
          tx,
          viewer,
          quoted,
          side,
          'fee-quoted',
          `$${quote.feeUsd}, ${quote.turnaroundDays} working days`,
        );
        auditRequest(tx, viewer, quoted, 'request.fee-quote', {
          feeUsd: quote.feeUsd,
          turnaroundDays: quote.turnaroundDays,
        });
        return tellOtherSide(
          tx,
          quoted,
          side,
          `fee quoted: $${quote.feeUsd}, ${quote.turnaroundDays} working days`,
        );
      });
    },

    acceptFee(viewer: RequestViewer, requestId: string): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay('accept-fee', side, row.status);
        if (!row.feeQuotedAt) throw new AppError('conflict', 'The engineer has not quoted a fee yet');
        if (row.feeAcceptedAt) throw new AppError('conflict', 'The fee is accepted already');
        const accepted = updateRequest(tx, row.id, { feeAcceptedAt: new Date().toISOString() });
        event(tx, viewer, accepted, side, 'fee-accepted');
        auditRequest(tx, viewer, accepted, 'request.fee-accept', { feeUsd: row.feeUsd });
        return tellOtherSide(tx, accepted, side, 'fee accepted: design work can start');
      });
    },

    reply(viewer: RequestViewer, requestId: string, reply: EngineerReply): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay('reply', side, row.status);
        const sentIds = new Set(
          listVersions(tx, row.id)
            .at(-1)
            ?.snapshot.members.map((m) => m.id),
        );
        const fields: Record<string, string[]> = {};
        reply.members.forEach((member, index) => {
          if (!sentIds.has(member.memberId))
            fields[`members.${index}.memberId`] = ['Not a member of this request'];
        });
        if (Object.keys(fields).length > 0)
          throw new AppError('bad_request', 'Some fields need attention', fields);
        insertReply(tx, { requestId: row.id, version: row.version, reply, userId: viewer.userId });
        syncEngineerItems(
          tx,
          { orgId: row.orgId, jobId: row.jobId, requestId: row.id, version: row.version },
          reply.verifyInField,
        );
        event(tx, viewer, row, side, 'replied', reply.note);
        auditRequest(tx, viewer, row, 'request.reply', {
          version: row.version,
          members: reply.members.length,
        });
        return tellOtherSide(tx, row, side, `the engineer replied to version ${row.version}`);
      });
    },

    message(viewer: RequestViewer, requestId: string, message: MessageCreate): RequestDetail {
      return act(viewer, requestId, (tx, row, side) => {
        assertMay('message', side, row.status);
        const id = insertThreadEntry(tx, {
          requestId: row.id,
          kind: 'message',
          side,
          userId: viewer.userId,
          body: message.body,
          version: row.version,
        });
        if (!claimForMessage(tx, row.id, side, message.attachmentIds, id)) {
          throw new AppError('bad_request', 'Some fields need attention', {
            attachmentIds: ['Attach files you uploaded to this request for a message'],
          });
        }
        auditRequest(tx, viewer, row, 'request.message', { files: message.attachmentIds.length });
        return tellOtherSide(
          tx,
          row,
          side,
          side === 'firm' ? 'a message from the contractor' : 'a message from the engineer',
        );
      });
    },
  };
}

export type RequestsService = ReturnType<typeof createRequestsService>;
