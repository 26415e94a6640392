import sharp from 'sharp';

/** Longest side of the copy shown on the page and put in the PDF, px. */
export const PREVIEW_MAX_PX = 1600;

export interface PhotoFacts {
  widthPx: number | null;
  heightPx: number | null;
  /** A JPEG no larger than PREVIEW_MAX_PX each way, when the photo is larger than that. */
  preview: Buffer | null;
}

/**
 * Size of a JPEG or PNG photo, and a downscaled JPEG copy of a large one (turned upright by its EXIF
 * orientation). HEIC is not decoded by the image library here, so a HEIC photo gets neither: its original
 * is kept and served as is. PDFs are not photos.
 */
export async function photoFacts(bytes: Buffer, mimeType: string): Promise<PhotoFacts> {
  if (mimeType !== 'image/jpeg' && mimeType !== 'image/png')
    return { widthPx: null, heightPx: null, preview: null };
  const image = sharp(bytes, { failOn: 'error' });
  const meta = await image.metadata();
  const upright = (meta.orientation ?? 1) >= 5;
  const widthPx = (upright ? meta.height : meta.width) ?? null;
  const heightPx = (upright ? meta.width : meta.height) ?? null;
  const large = Math.max(widthPx ?? 0, heightPx ?? 0) > PREVIEW_MAX_PX;
  const preview = large
    ? await image
        .rotate()
        .resize({ width: PREVIEW_MAX_PX, height: PREVIEW_MAX_PX, fit: 'inside' })
        .jpeg({ quality: 80 })
        .toBuffer()
    : null;
  return { widthPx, heightPx, preview };
}
