import { Router, type RequestHandler, type Response } from 'express';
import multer from 'multer';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { AppError } from '@/server/app-error';
import { sendCreated } from '@/server/api/client-ids';
import { requireMember } from '@/server/middleware/auth';
import { idempotentUpload } from '@/server/middleware/idempotency';
import { validate } from '@/server/middleware/validate';
import { MAX_UPLOAD_BYTES } from '@/server/services/uploads/sniff-type';
import { fieldErrors } from '@/shared/errors';
import { uploadFieldsSchema } from '@/shared/schemas/requests/workflow';
import type { AttachmentsService } from './attachments.service';
import { viewerOf } from './requests.router';

const requestParams = z.object({ requestId: z.string().min(1).max(100) });
const fileParams = requestParams.extend({ attachmentId: z.string().min(1).max(100) });
const downloadQuery = z.object({ size: z.enum(['original', 'preview']).default('original') });

/** One file part in memory (at most MAX_UPLOAD_BYTES) and a few short text fields; nothing touches disk here. */
const readUpload = multer({
  storage: multer.memoryStorage(),
  // Keep the name as sent, folders and all, so a name with `../` is refused rather than quietly cut down.
  preservePath: true,
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 5, fieldSize: 2000, parts: 6 },
}).single('file');

const MULTER_MESSAGES: Record<string, string> = {
  LIMIT_FILE_SIZE: `The file is too big: at most ${MAX_UPLOAD_BYTES / 1024 / 1024} MB`,
  LIMIT_FILE_COUNT: 'Send one file at a time',
  LIMIT_UNEXPECTED_FILE: 'Send the file in the part named "file", one at a time',
};

/** Runs multer and turns its refusals into the API's field errors (400). */
const upload: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) {
    throw new AppError('bad_request', 'Send the file as multipart/form-data', { file: ['Send a file'] });
  }
  readUpload(req, res, (error: unknown) => {
    if (!error) return next();
    if (error instanceof multer.MulterError) {
      const message = MULTER_MESSAGES[error.code] ?? 'The upload could not be read';
      return next(new AppError('bad_request', message, { file: [message] }));
    }
    next(
      new AppError('bad_request', 'The upload could not be read', { file: ['The upload could not be read'] }),
    );
  });
};

/** A name safe in a Content-Disposition header (the stored name is already a plain one). */
const dispositionName = (name: string) => name.replace(/[^\w.\- ]/g, '_');

function sendFile(res: Response, file: { bytes: Buffer; mimeType: string; fileName: string }) {
  res.setHeader('Content-Type', file.mimeType);
  res.setHeader('Content-Disposition', `attachment; filename="${dispositionName(file.fileName)}"`);
  res.send(file.bytes);
}

/** `/api/requests/:requestId/attachments`: upload, list and download a request's files. */
export function attachmentsRouter(deps: { db: Db; attachments: AttachmentsService }): Router {
  const router = Router({ mergeParams: true });
  router.use(requireMember(deps.db));

  router.get('/', validate({ params: requestParams }), (req, res) => {
    res.json({ files: deps.attachments.list(viewerOf(res), req.params.requestId) });
  });

  router.post('/', validate({ params: requestParams }), upload, idempotentUpload, async (req, res) => {
    const fields = uploadFieldsSchema.safeParse(req.body ?? {});
    if (!fields.success)
      throw new AppError('bad_request', 'Some fields need attention', fieldErrors(fields.error));
    sendCreated(
      res,
      await deps.attachments.upload(viewerOf(res), req.params.requestId, req.file, fields.data),
    );
  });

  router.get('/:attachmentId', validate({ params: fileParams, query: downloadQuery }), async (req, res) => {
    const { requestId, attachmentId } = req.params;
    sendFile(
      res,
      await deps.attachments.download(viewerOf(res), requestId, attachmentId, req.query.size === 'preview'),
    );
  });

  return router;
}
