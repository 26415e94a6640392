// Renders the installable app's icons from assets/icon.svg (the Tributary mark) into public/icons with
// sharp: 192 and 512 px on the paper colour, and a 512 px maskable icon whose mark sits inside the 80 %
// safe zone. Run after changing the mark: `node scripts/build-icons.mjs`; the PNGs are committed.
import { mkdirSync, readFileSync } from 'node:fs';
import sharp from 'sharp';

const paper = '#F6F1E7';
const mark = readFileSync('assets/icon.svg');
mkdirSync('public/icons', { recursive: true });

/** The mark scaled to `share` of the icon's side, centred on a paper square of `size` px. */
async function icon(size, share, file) {
  const markSize = Math.round(size * share);
  const drawn = await sharp(mark, { density: 72 * (markSize / 32) })
    .resize(markSize, markSize)
    .png()
    .toBuffer();
  await sharp({ create: { width: size, height: size, channels: 4, background: paper } })
    .composite([{ input: drawn, gravity: 'centre' }])
    .png()
    .toFile(`public/icons/${file}`);
  console.log(`public/icons/${file}`);
}

await icon(192, 0.75, 'icon-192.png');
await icon(512, 0.75, 'icon-512.png');
await icon(512, 0.56, 'maskable-512.png');
await icon(180, 0.7, 'apple-touch-icon.png');
