import type { Writable } from 'node:stream';
import { ZipArchive } from 'archiver';
import type { Db } from '@/db/client';
import { toCsv } from '@/lib/format/csv';
import { AppError } from '@/server/app-error';
import { runTask } from '@/server/services/calc-pool';
import type { PackagePhoto } from '@/server/services/pdf/request-package-pdf';
import type { FileStorage } from '@/server/services/storage/file-storage';
import {
  REQUEST_PACKAGE_FORMAT,
  REQUEST_PACKAGE_VERSION,
  type RequestPackage,
} from '@/shared/schemas/requests/package';
import { auditRequest, openRequest, type RequestViewer } from './request-access';
import { latestReply, listAttachments, listVersions } from './requests.repository';

/** A plain name for an entry of the zip: letters, digits, dots, dashes and underscores. */
const entryName = (name: string) => name.replace(/[^\w.-]+/g, '_').slice(0, 120);

/**
 * The request's latest sent version as the engineer downloads it: the JSON package, the PDF, the load
 * table as CSV and the photos as one zip with their metadata. Each download checks access and is an audit
 * event; a Draft has nothing to download yet.
 */
export function createPackageService(deps: { db: Db; storage: FileStorage }) {
  const { db, storage } = deps;

  function load(viewer: RequestViewer, requestId: string, what: string) {
    const { row } = openRequest(db, viewer, requestId);
    const latest = listVersions(db, row.id).at(-1);
    if (!latest) throw new AppError('conflict', 'A Draft has no package yet: send the request first');
    const reply = latestReply(db, row.id);
    const pkg: RequestPackage = {
      format: REQUEST_PACKAGE_FORMAT,
      formatVersion: REQUEST_PACKAGE_VERSION,
      generatedAt: new Date().toISOString(),
      state: row.status,
      request: latest.snapshot,
      changes: latest.changes,
      reply: reply ? { version: reply.version, reply: reply.reply } : null,
    };
    db.transaction((tx) =>
      auditRequest(tx, viewer, row, 'request.download', { what, version: latest.version }),
    );
    return { row, pkg };
  }

  /** The stored rows of the photos the snapshot lists (by id; a photo is never deleted once sent). */
  function snapshotPhotos(requestId: string, pkg: RequestPackage) {
    const rows = new Map(listAttachments(db, requestId).map((file) => [file.id, file]));
    return pkg.request.files.flatMap((file) => {
      const row = rows.get(file.id);
      return row ? [{ file, row }] : [];
    });
  }

  return {
    json(viewer: RequestViewer, requestId: string): RequestPackage {
      return load(viewer, requestId, 'package.json').pkg;
    },

    async pdf(viewer: RequestViewer, requestId: string): Promise<{ bytes: Uint8Array; fileName: string }> {
      const { row, pkg } = load(viewer, requestId, 'package.pdf');
      const photos: PackagePhoto[] = [];
      for (const { file, row: stored } of snapshotPhotos(row.id, pkg)) {
        const drawable = stored.mimeType === 'image/jpeg' || stored.mimeType === 'image/png';
        const key = stored.previewKey ?? stored.storageKey;
        photos.push({
          file,
          bytes: drawable ? await storage.read(key) : null,
          mimeType: stored.previewKey ? 'image/jpeg' : stored.mimeType,
        });
      }
      // Laying out the pages and drawing the diagrams and photos is heavy: it runs in the calculation pool.
      const bytes = await runTask('packagePdf', { pkg, photos });
      return { bytes, fileName: `design-request-${pkg.request.number}-v${pkg.request.version}.pdf` };
    },

    /**
     * One row per takedown line of each member: D, L, Lr, S line loads (plf) with their extents and point
     * loads (lb) with their positions, ft from the centre of the left support (or the left overhang's tip),
     * unfactored, as the engine took them down.
     */
    csv(viewer: RequestViewer, requestId: string): { text: string; fileName: string } {
      const { pkg } = load(viewer, requestId, 'loads.csv');
      const records: (string | number)[][] = [
        [
          'member',
          'source',
          'load type',
          'kind',
          'w (plf)',
          'start (ft)',
          'end (ft)',
          'P (lb)',
          'at (ft)',
          'flag',
          'how',
        ],
      ];
      for (const member of pkg.request.members) {
        const lengthFt = member.result.spans.memberLengthFt ?? member.result.spans.designSpanFt;
        for (const line of member.result.takedown) {
          const point = line.pLb !== undefined;
          records.push([
            member.label,
            line.label,
            line.type,
            point ? 'point' : 'line',
            point ? '' : (line.wPlf ?? 0),
            point ? '' : (line.startFt ?? 0),
            point ? '' : (line.endFt ?? lengthFt),
            point ? (line.pLb ?? 0) : '',
            point ? (line.atFt ?? 0) : '',
            line.flag ?? '',
            line.expression,
          ]);
        }
      }
      return {
        text: toCsv(records),
        fileName: `design-request-${pkg.request.number}-v${pkg.request.version}-loads.csv`,
      };
    },

    /**
     * The zip of the snapshot's photos at full resolution with photos.json (place, caption, SHA-256): access
     * is checked here, the bytes are streamed by `write`.
     */
    photosZip(viewer: RequestViewer, requestId: string) {
      const { row, pkg } = load(viewer, requestId, 'photos.zip');
      const photos = snapshotPhotos(row.id, pkg);
      return {
        fileName: `design-request-${pkg.request.number}-v${pkg.request.version}-photos.zip`,
        async write(out: Writable): Promise<void> {
          const zip = new ZipArchive({ zlib: { level: 6 } });
          const done = new Promise<void>((resolve, reject) => {
            zip.on('error', reject);
            out.on('finish', resolve);
            out.on('error', reject);
          });
          zip.pipe(out);
          const metadata = [];
          for (const [index, { file, row: stored }] of photos.entries()) {
            const name = `photos/${String(index + 1).padStart(2, '0')}-${file.place}-${entryName(file.fileName)}`;
            // Photos are compressed already: stored as they are.
            zip.append(await storage.read(stored.storageKey), { name, store: true });
            metadata.push({ entry: name, ...file, widthPx: stored.widthPx, heightPx: stored.heightPx });
          }
          const about = {
            request: pkg.request.number,
            version: pkg.request.version,
            job: pkg.request.job.name,
            photos: metadata,
          };
          zip.append(`${JSON.stringify(about, null, 2)}\n`, { name: 'photos.json' });
          await zip.finalize();
          await done;
        },
      };
    },
  };
}

export type PackageService = ReturnType<typeof createPackageService>;
