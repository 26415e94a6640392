import { createHash } from 'node:crypto';
import type { Db } from '@/db/client';
import { newId } from '@/db/new-id';
import { AppError, idTaken, notFound } from '@/server/app-error';
import type { Created } from '@/server/api/client-ids';
import { photoFacts } from '@/server/services/uploads/photo-preview';
import { sniffUploadType } from '@/server/services/uploads/sniff-type';
import type { FileStorage } from '@/server/services/storage/file-storage';
import type { RequestFile } from '@/shared/schemas/requests/views';
import type { RequestAction } from '@/shared/schemas/requests/views';
import {
  uploadFileNameSchema,
  type RequestSide,
  type UploadFields,
} from '@/shared/schemas/requests/workflow';
import { auditRequest, openRequest, type RequestViewer } from './request-access';
import { toFile } from './request-detail';
import { assertMay } from './request-transitions';
import {
  deleteAttachment,
  findAttachment,
  findAttachmentAnywhere,
  insertAttachment,
  listAttachments,
  listVersions,
  type RequestRow,
} from './requests.repository';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const fileError = (message: string) => new AppError('bad_request', message, { file: [message] });

/** What each purpose needs: photos and sketches are the firm's, design documents the engineer's. */
const PURPOSE_ACTION: Record<UploadFields['purpose'], RequestAction> = {
  photo: 'edit',
  message: 'message',
  design: 'upload-design',
};

/**
 * A device-chosen file id already held: the same upload sent again (same request, person, fields and bytes)
 * answers that file; any other holder, in whatever firm, is 409 id_taken and says nothing of it.
 */
function sentBefore(
  db: Db,
  viewer: RequestViewer,
  requestId: string,
  fields: UploadFields,
  file: { name: string; sha256: string },
): RequestFile | undefined {
  if (!fields.id) return undefined;
  const found = findAttachmentAnywhere(db, fields.id);
  if (!found) return undefined;
  const same =
    found.requestId === requestId &&
    found.uploadedBy === viewer.userId &&
    found.purpose === fields.purpose &&
    found.place === fields.place &&
    found.caption === fields.caption &&
    found.fileName === file.name &&
    found.sha256 === file.sha256;
  if (!same) throw idTaken();
  return toFile(found);
}

function checkPurpose(row: RequestRow, side: RequestSide, purpose: UploadFields['purpose']): void {
  if (purpose === 'photo' && side !== 'firm')
    throw new AppError('forbidden', 'Photos of the job are the firm’s to add');
  assertMay(PURPOSE_ACTION[purpose], side, row.status);
}

/**
 * Files of a request, kept in `storage` under random keys. Access is checked before a byte is stored; the
 * type comes from the file's content; a file another request holds reads as missing.
 */
export function createAttachmentsService(deps: { db: Db; storage: FileStorage }) {
  const { db, storage } = deps;

  return {
    async upload(
      viewer: RequestViewer,
      requestId: string,
      file: UploadedFile | undefined,
      fields: UploadFields,
    ): Promise<Created<RequestFile>> {
      const { row, side } = openRequest(db, viewer, requestId);
      checkPurpose(row, side, fields.purpose);
      if (!file) throw fileError('Choose a file to upload');
      const name = uploadFileNameSchema.safeParse(file.originalname);
      if (!name.success) throw fileError(name.error.issues[0].message);
      const sha256 = createHash('sha256').update(file.buffer).digest('hex');
      const before = sentBefore(db, viewer, requestId, fields, { name: name.data, sha256 });
      if (before) return { record: before, replayed: true };
      const mimeType = await sniffUploadType(file.buffer);
      if (!mimeType)
        throw fileError('Send a JPEG, PNG, HEIC or PDF file (judged by its content, not its name)');
      const facts = await photoFacts(file.buffer, mimeType).catch(() => {
        throw fileError('This image cannot be read: it may be damaged');
      });
      const storageKey = await storage.put(file.buffer);
      const previewKey = facts.preview
        ? await storage.put(facts.preview).catch(async (error: unknown) => {
            await storage.remove(storageKey);
            throw error;
          })
        : null;
      try {
        const saved = db.transaction((tx): RequestFile => {
          // The state may have moved while the file was read and stored.
          const again = openRequest(tx, viewer, requestId);
          checkPurpose(again.row, again.side, fields.purpose);
          const saved = {
            id: fields.id ?? newId(),
            requestId,
            side,
            purpose: fields.purpose,
            place: fields.place,
            caption: fields.caption,
            messageId: null,
            version: fields.purpose === 'design' ? again.row.version : null,
            fileName: name.data,
            mimeType,
            sizeBytes: file.buffer.length,
            storageKey,
            sha256,
            previewKey,
            widthPx: facts.widthPx,
            heightPx: facts.heightPx,
            uploadedBy: viewer.userId,
            createdAt: new Date().toISOString(),
          };
          insertAttachment(tx, saved);
          auditRequest(tx, viewer, again.row, 'request.upload', {
            attachmentId: saved.id,
            purpose: saved.purpose,
            mimeType,
            sizeBytes: saved.sizeBytes,
          });
          return toFile(saved);
        });
        return { record: saved, replayed: false };
      } catch (error) {
        await storage.remove(storageKey);
        if (previewKey) await storage.remove(previewKey);
        throw error;
      }
    },

    list(viewer: RequestViewer, requestId: string): RequestFile[] {
      openRequest(db, viewer, requestId);
      return listAttachments(db, requestId).map(toFile);
    },

    /**
     * Removes a photo or sketch from the working copy: the sending firm's only, and only one no sent version
     * holds yet (a sent version's snapshot lists its photos and never changes). The row and the audit event are one
     * transaction; the stored bytes go after it commits.
     */
    async remove(viewer: RequestViewer, requestId: string, attachmentId: string): Promise<void> {
      const removed = db.transaction((tx) => {
        const { row, side } = openRequest(tx, viewer, requestId);
        if (side !== 'firm') throw new AppError('forbidden', 'Photos of the job are the firm’s to remove');
        assertMay('edit', side, row.status);
        const file = findAttachment(tx, requestId, attachmentId);
        if (!file) throw notFound('File');
        const sentWith = listVersions(tx, requestId).find((v) =>
          v.snapshot.files.some((f) => f.id === attachmentId),
        );
        if (file.purpose !== 'photo' || sentWith) {
          throw new AppError(
            'conflict',
            sentWith
              ? `This photo went with version ${sentWith.version}: a sent version keeps its photos`
              : 'Only a photo or sketch of the working copy can be removed',
          );
        }
        deleteAttachment(tx, requestId, attachmentId);
        auditRequest(tx, viewer, row, 'request.file-remove', {
          attachmentId,
          fileName: file.fileName,
          sha256: file.sha256,
        });
        return file;
      });
      await storage.remove(removed.storageKey);
      if (removed.previewKey) await storage.remove(removed.previewKey);
    },

    /** The original, or with `preview` the downscaled copy when there is one (else the original). */
    async download(viewer: RequestViewer, requestId: string, attachmentId: string, preview: boolean) {
      const { row } = openRequest(db, viewer, requestId);
      const file = findAttachment(db, requestId, attachmentId);
      if (!file) throw notFound('File');
      const key = preview && file.previewKey ? file.previewKey : file.storageKey;
      const bytes = await storage.read(key);
      db.transaction((tx) =>
        auditRequest(tx, viewer, row, 'request.download', { attachmentId, preview: key === file.previewKey }),
      );
      return {
        bytes,
        mimeType: key === file.previewKey ? 'image/jpeg' : file.mimeType,
        fileName: file.fileName,
      };
    },
  };
}

export type AttachmentsService = ReturnType<typeof createAttachmentsService>;
