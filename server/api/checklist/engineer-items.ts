import type { DbOrTx } from '@/db/client';
import type { EngineerChecklistItem } from '@/shared/schemas/job-checklist';
import { listItemPhotos, type EngineerItemListRow } from './engineer-items.repository';

/** The engineer's items as the checklist shows them, each with its photos' names and captions. */
export function engineerItemsOf(db: DbOrTx, rows: readonly EngineerItemListRow[]): EngineerChecklistItem[] {
  const photos = listItemPhotos(
    db,
    rows.flatMap((r) => r.row.photoIds),
  );
  return rows.map(({ row, requestNumber, updatedByName }) => ({
    id: row.id,
    requestId: row.requestId,
    requestNumber,
    version: row.version,
    item: row.item,
    photoAsked: row.photoAsked,
    photos: row.photoIds.flatMap((id) => {
      const photo = photos.find((p) => p.id === id);
      return photo ? [{ id, fileName: photo.fileName, caption: photo.caption }] : [];
    }),
    state: row.state,
    note: row.note,
    updatedBy: row.updatedBy,
    updatedByName: row.updatedBy ? updatedByName : null,
    updatedAt: row.updatedAt,
  }));
}
