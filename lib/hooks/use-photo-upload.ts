import { useCallback } from 'react';
import { keys } from '@/lib/api/keys';
import { cacheKey, queueWrite } from '@/lib/offline/queue-write';
import { requestFileSchema } from '@/shared/schemas/requests/views';
import { useMe } from './use-me';

/** The queue's group of a request's uploads: sent in the order they were taken. */
export const requestUploadGroup = (requestId: string) => `request:${requestId}`;

/**
 * Attaches a photo or sketch to a design request through the device's queue: the file is kept in the
 * person's device store and uploads in the background (again after a reload) until the server has it once.
 * Answers whether it is on the server already.
 */
export function usePhotoUpload(requestId: string) {
  const { data: me } = useMe();
  return useCallback(
    async (file: Blob, fileName: string, fields: { place?: string; caption?: string }) => {
      if (!me) throw new Error('Sign in again to upload.');
      const id = crypto.randomUUID();
      const blobId = crypto.randomUUID();
      const saved = await queueWrite(
        requestFileSchema,
        {
          key: crypto.randomUUID(),
          orgId: me.activeOrgId,
          entity: 'photo',
          create: true,
          recordId: id,
          group: requestUploadGroup(requestId),
          label: `Photo ${fields.caption || fileName}`,
          method: 'POST',
          path: `/api/requests/${encodeURIComponent(requestId)}/attachments`,
          body: { purpose: 'photo', ...fields, id },
          blobId,
          cache: { listKey: cacheKey(keys.request(me.activeOrgId, requestId)) },
        },
        { id: blobId, blob: file, name: fileName, type: file.type },
      );
      return saved.state === 'sent';
    },
    [me, requestId],
  );
}
