import { fileTypeFromBuffer } from 'file-type';

/** What a request may carry: photos from a phone or a camera, and PDF drawings or documents. */
export const UPLOAD_TYPES = ['image/jpeg', 'image/png', 'image/heic', 'application/pdf'] as const;
export type UploadType = (typeof UPLOAD_TYPES)[number];

/** Largest upload, bytes: a full-resolution phone photo or a drawing set fits. */
export const MAX_UPLOAD_BYTES = 15 * 1024 * 1024;

/**
 * The file's type read from its first bytes (its magic number), never from its name or the browser's
 * claim; undefined when it is none of UPLOAD_TYPES. HEIF stills from phones carry the `heic`/`heix` brand
 * (file-type says image/heic) or the generic `mif1` (image/heif): both are kept as HEIC.
 */
export async function sniffUploadType(bytes: Buffer): Promise<UploadType | undefined> {
  const found = await fileTypeFromBuffer(bytes);
  if (!found) return undefined;
  if (found.mime === 'image/heif') return 'image/heic';
  return (UPLOAD_TYPES as readonly string[]).includes(found.mime) ? (found.mime as UploadType) : undefined;
}
