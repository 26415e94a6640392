import type { DbOrTx } from '@/db/client';
import type { RequestDetail, RequestFile, RequestListItem } from '@/shared/schemas/requests/views';
import type { RequestSide } from '@/shared/schemas/requests/workflow';
import { actionsFor } from './request-transitions';
import {
  findNames,
  latestReply,
  listAttachments,
  listThread,
  listVersions,
  type AttachmentRow,
  type ListRow,
  type RequestRow,
} from './requests.repository';

/** HEIC photos are kept as sent: the image library here cannot decode them to make a smaller copy. */
export const HEIC_NOTE = 'HEIC photo kept as sent: no smaller copy could be made here; download the original';

export function toFile(file: AttachmentRow): RequestFile {
  return {
    id: file.id,
    side: file.side,
    purpose: file.purpose,
    place: file.place,
    caption: file.caption,
    fileName: file.fileName,
    mimeType: file.mimeType,
    sizeBytes: file.sizeBytes,
    sha256: file.sha256,
    hasPreview: file.previewKey !== null,
    previewNote: file.mimeType === 'image/heic' ? HEIC_NOTE : null,
    widthPx: file.widthPx,
    heightPx: file.heightPx,
    messageId: file.messageId,
    version: file.version,
    uploadedBy: file.uploadedBy,
    createdAt: file.createdAt,
  };
}

const unreadFor = (row: RequestRow, side: RequestSide) =>
  side === 'firm' ? row.firmUnread : row.engineerUnread;

export function toListItem({ row, jobName, firmName }: ListRow, side: RequestSide): RequestListItem {
  return {
    id: row.id,
    number: row.number,
    jobId: row.jobId,
    jobName,
    firmName,
    status: row.status,
    version: row.version,
    engineerEmail: row.engineerEmail,
    unread: unreadFor(row, side),
    sentAt: row.sentAt,
    updatedAt: row.updatedAt,
  };
}

/** Everything the viewer's side may see of one request. */
export function describeRequest(db: DbOrTx, row: RequestRow, side: RequestSide): RequestDetail {
  const versions = listVersions(db, row.id);
  const latest = versions.at(-1);
  const files = listAttachments(db, row.id);
  const reply = latestReply(db, row.id);
  const names = findNames(db, row);
  return {
    id: row.id,
    number: row.number,
    jobId: row.jobId,
    ...names,
    status: row.status,
    version: row.version,
    viewer: side,
    engineerEmail: row.engineerEmail,
    engineerBound: row.engineerUserId !== null,
    fee:
      row.feeUsd !== null && row.feeQuotedAt
        ? {
            feeUsd: row.feeUsd,
            turnaroundDays: row.turnaroundDays ?? 0,
            siteVisit: row.siteVisit ?? false,
            note: row.feeNote ?? '',
            quotedAt: row.feeQuotedAt,
            acceptedAt: row.feeAcceptedAt,
          }
        : null,
    declineReason: row.declineReason,
    draft: side === 'firm' ? row.draft : null,
    versions: versions.map((v) => ({
      version: v.version,
      sentAt: v.sentAt,
      note: v.note,
      changes: v.changes,
    })),
    snapshot: latest?.snapshot ?? null,
    thread: listThread(db, row.id).map(({ entry, authorName }) => ({
      id: entry.id,
      kind: entry.kind,
      side: entry.side,
      authorName,
      body: entry.body,
      event: entry.event,
      version: entry.version,
      createdAt: entry.createdAt,
      files: files.filter((file) => file.messageId === entry.id).map(toFile),
    })),
    files: files.map(toFile),
    reply: reply ? { version: reply.version, reply: reply.reply, createdAt: reply.createdAt } : null,
    actions: actionsFor(side, row.status),
    sentAt: row.sentAt,
    updatedAt: row.updatedAt,
  };
}
