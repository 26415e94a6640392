import { readFileSync } from 'node:fs';
import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import { formatDollars } from '@/lib/format/money';
import type { SentBudget } from '@/shared/schemas/budgets';

const REGULAR = require.resolve('@expo-google-fonts/inter/400Regular/Inter_400Regular.ttf');
const BOLD = require.resolve('@expo-google-fonts/inter/600SemiBold/Inter_600SemiBold.ttf');
const INK = rgb(0.11, 0.13, 0.2);
const MUTED = rgb(0.35, 0.37, 0.42);
const PAGE = { width: 612, height: 792, margin: 54 };

/** Splits text into lines that fit `width` points at `size`. */
function wrap(text: string, font: PDFFont, size: number, width: number): string[] {
  const lines: string[] = [];
  for (const paragraph of text.split('\n')) {
    let line = '';
    for (const word of paragraph.split(/\s+/).filter(Boolean)) {
      const next = line ? `${line} ${word}` : word;
      if (font.widthOfTextAtSize(next, size) > width && line) {
        lines.push(line);
        line = word;
      } else line = next;
    }
    lines.push(line);
  }
  return lines;
}

/**
 * The client-facing summary of a sent budget: the job, the scope, each member's range and the job's,
 * the allowances and exclusions, and the caution that the member is preliminary until the engineer designs
 * it. Only totals reach it: no unit cost, no line, no overhead or profit.
 */
export async function clientSummaryPdf(sent: SentBudget): Promise<Uint8Array> {
  const s = sent.snapshot;
  const doc = await PDFDocument.create();
  doc.registerFontkit(fontkit);
  // subset: false — subsetting drops glyphs (STACK.md).
  const regular = await doc.embedFont(readFileSync(REGULAR), { subset: false });
  const bold = await doc.embedFont(readFileSync(BOLD), { subset: false });
  doc.setTitle(`Budget summary — ${s.jobName}`);
  doc.setProducer('Tributary');
  let page: PDFPage = doc.addPage([PAGE.width, PAGE.height]);
  let y = PAGE.height - PAGE.margin;
  const width = PAGE.width - 2 * PAGE.margin;

  const write = (
    text: string,
    options: { size?: number; font?: PDFFont; color?: typeof INK; gap?: number } = {},
  ) => {
    const size = options.size ?? 10.5;
    const font = options.font ?? regular;
    for (const line of wrap(text, font, size, width)) {
      if (y < PAGE.margin + size) {
        page = doc.addPage([PAGE.width, PAGE.height]);
        y = PAGE.height - PAGE.margin;
      }
      page.drawText(line, { x: PAGE.margin, y: y - size, size, font, color: options.color ?? INK });
      y -= size * 1.45;
    }
    y -= options.gap ?? 4;
  };
  const heading = (text: string) => write(text, { size: 12.5, font: bold, gap: 2 });

  write('Budget summary', { size: 20, font: bold, gap: 6 });
  write(`${s.jobName}${s.jobAddress ? ` · ${s.jobAddress}` : ''}`, { size: 11 });
  write(`Prepared for ${s.clientName} · ${new Date(sent.sentAt).toISOString().slice(0, 10)}`, {
    color: MUTED,
    gap: 14,
  });

  heading('Budget range');
  write(`${formatDollars(s.lowCents)} to ${formatDollars(s.highCents)}`, { size: 16, font: bold, gap: 4 });
  write(
    'The range runs from the preliminary size of each member to the next size up, since the engineer’s design may call for a larger member.',
    { color: MUTED, gap: 12 },
  );

  heading('Scope');
  write(s.scope, { gap: 8 });
  for (const m of s.members)
    write(
      `• ${m.label}: ${formatDollars(m.lowCents)} to ${formatDollars(m.highCents)} (${m.lowLabel === m.highLabel ? m.lowLabel : `${m.lowLabel} to ${m.highLabel}`}, preliminary)`,
    );
  y -= 8;

  heading('Allowances');
  write(s.allowances.length ? s.allowances.map((a) => `• ${a}`).join('\n') : 'None.', { gap: 4 });
  write('An allowance is a budget figure for work whose extent shows only once the wall is open.', {
    color: MUTED,
    gap: 12,
  });

  heading('Not included');
  write(
    s.exclusions.length ? s.exclusions.map((e) => `• ${e}`).join('\n') : 'Nothing beyond the scope above.',
    { gap: 12 },
  );

  heading('Caution');
  write(
    'Each member is preliminary until a licensed engineer designs it; the budget follows the engineer’s design.',
    { gap: 2 },
  );
  write(s.caution, { color: MUTED });
  return doc.save();
}
