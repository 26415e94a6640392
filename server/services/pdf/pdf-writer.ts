import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import fontkit from '@pdf-lib/fontkit';
import { PDFDocument, rgb, type PDFFont, type PDFPage } from 'pdf-lib';

/** US Letter in PDF points (1/72 in), with 0.6 in margins. */
export const PAGE = { width: 612, height: 792, margin: 44 } as const;
export const INK = rgb(0.1, 0.12, 0.18);
export const MUTED = rgb(0.38, 0.4, 0.45);
export const RULE = rgb(0.78, 0.77, 0.74);
export const ACCENT = rgb(0.72, 0.36, 0.12);
export const PAPER = rgb(0.97, 0.96, 0.93);

const require = createRequire(__filename);
const fontFile = (weight: string) =>
  require.resolve(`@expo-google-fonts/inter/${weight}/Inter_${weight}.ttf`);

export interface TextOptions {
  size?: number;
  bold?: boolean;
  color?: ReturnType<typeof rgb>;
  indent?: number;
  width?: number;
}

/**
 * A top-to-bottom page writer over pdf-lib: wrapped text, table rows and boxes, a new page when the next
 * piece would not fit, and a footer on every page. Inter is embedded whole (subsetting drops glyphs).
 */
export class PdfWriter {
  page!: PDFPage;
  y = 0;
  private constructor(
    readonly doc: PDFDocument,
    readonly font: PDFFont,
    readonly bold: PDFFont,
    private readonly footer: string,
  ) {}

  static async create(title: string, footer: string): Promise<PdfWriter> {
    const doc = await PDFDocument.create();
    doc.registerFontkit(fontkit);
    doc.setTitle(title);
    doc.setCreator('Tributary');
    const [regular, bold] = await Promise.all([
      readFile(fontFile('400Regular')),
      readFile(fontFile('600SemiBold')),
    ]);
    const writer = new PdfWriter(
      doc,
      await doc.embedFont(regular, { subset: false }),
      await doc.embedFont(bold, { subset: false }),
      footer,
    );
    writer.newPage();
    return writer;
  }

  get contentWidth(): number {
    return PAGE.width - 2 * PAGE.margin;
  }

  newPage(): void {
    this.page = this.doc.addPage([PAGE.width, PAGE.height]);
    this.y = PAGE.height - PAGE.margin;
  }

  /** Starts a new page unless `height` points still fit above the footer. */
  ensure(height: number): void {
    if (this.y - height < PAGE.margin + 40) this.newPage();
  }

  space(points: number): void {
    this.y -= points;
  }

  /** Splits `text` into lines no wider than `width` at `size`, breaking at spaces (and inside very long words). */
  wrap(text: string, width: number, size: number, bold = false): string[] {
    const font = bold ? this.bold : this.font;
    const lines: string[] = [];
    for (const paragraph of text.split('\n')) {
      let line = '';
      for (const word of paragraph.split(/\s+/).filter(Boolean)) {
        const candidate = line ? `${line} ${word}` : word;
        if (font.widthOfTextAtSize(candidate, size) <= width) {
          line = candidate;
          continue;
        }
        if (line) lines.push(line);
        line = word;
        while (font.widthOfTextAtSize(line, size) > width && line.length > 1) {
          let cut = line.length - 1;
          while (cut > 1 && font.widthOfTextAtSize(line.slice(0, cut), size) > width) cut -= 1;
          lines.push(line.slice(0, cut));
          line = line.slice(cut);
        }
      }
      lines.push(line);
    }
    return lines;
  }

  text(text: string, options: TextOptions = {}): void {
    const size = options.size ?? 9.5;
    const indent = options.indent ?? 0;
    const width = options.width ?? this.contentWidth - indent;
    for (const line of this.wrap(text, width, size, options.bold)) {
      this.ensure(size * 1.35);
      this.y -= size * 1.35;
      this.page.drawText(line, {
        x: PAGE.margin + indent,
        y: this.y,
        size,
        font: options.bold ? this.bold : this.font,
        color: options.color ?? INK,
      });
    }
  }

  heading(text: string, size = 13): void {
    this.ensure(size * 3);
    this.space(size * 0.6);
    this.text(text, { size, bold: true });
    this.space(3);
  }

  /** "Label: value" lines, the label bold; empty values are left out. */
  facts(rows: [label: string, value: string | null | undefined][]): void {
    for (const [label, value] of rows) {
      if (value === null || value === undefined || value === '') continue;
      this.text(`${label}: ${value}`, { size: 9.5 });
    }
  }

  /**
   * A table: a bold header row, then rows; `widths` are fractions of the content width. Cells wrap; a row
   * taller than what is left of the page goes to the next one, the header repeated.
   */
  table(header: string[], rows: string[][], widths: number[], size = 8.5): void {
    const columns = widths.map((w) => w * this.contentWidth);
    const drawRow = (cells: string[], bold: boolean) => {
      const wrapped = cells.map((cell, i) => this.wrap(cell, columns[i] - 6, size, bold));
      const height = Math.max(...wrapped.map((lines) => lines.length)) * size * 1.3 + 5;
      return { wrapped, height, bold };
    };
    const head = drawRow(header, true);
    const paint = (row: ReturnType<typeof drawRow>) => {
      let x = PAGE.margin;
      row.wrapped.forEach((lines, i) => {
        lines.forEach((line, j) => {
          this.page.drawText(line, {
            x: x + 3,
            y: this.y - 3 - (j + 1) * size * 1.3 + size * 0.25,
            size,
            font: row.bold ? this.bold : this.font,
            color: INK,
          });
        });
        x += columns[i];
      });
      this.y -= row.height;
      this.page.drawLine({
        start: { x: PAGE.margin, y: this.y },
        end: { x: PAGE.margin + this.contentWidth, y: this.y },
        thickness: row.bold ? 0.8 : 0.4,
        color: RULE,
      });
    };
    this.ensure(head.height * 2);
    paint(head);
    for (const cells of rows) {
      const row = drawRow(cells, false);
      if (this.y - row.height < PAGE.margin + 40) {
        this.newPage();
        paint(head);
      }
      paint(row);
    }
    this.space(6);
  }

  /** A shaded box holding wrapped text (the caution). */
  box(text: string, size = 9): void {
    const lines = this.wrap(text, this.contentWidth - 16, size, true);
    const height = lines.length * size * 1.35 + 14;
    this.ensure(height + 6);
    this.page.drawRectangle({
      x: PAGE.margin,
      y: this.y - height,
      width: this.contentWidth,
      height,
      color: PAPER,
      borderColor: ACCENT,
      borderWidth: 1,
    });
    lines.forEach((line, i) => {
      this.page.drawText(line, {
        x: PAGE.margin + 8,
        y: this.y - 7 - (i + 1) * size * 1.35 + size * 0.3,
        size,
        font: this.bold,
        color: INK,
      });
    });
    this.y -= height + 8;
  }

  /** Writes the footer (caution line and page x of n) on every page and answers the PDF bytes. */
  async finish(): Promise<Uint8Array> {
    const pages = this.doc.getPages();
    pages.forEach((page, i) => {
      const lines = this.wrap(this.footer, this.contentWidth - 60, 6.5);
      lines.forEach((line, j) => {
        page.drawText(line, { x: PAGE.margin, y: 30 - j * 8, size: 6.5, font: this.font, color: MUTED });
      });
      const label = `Page ${i + 1} of ${pages.length}`;
      page.drawText(label, {
        x: PAGE.width - PAGE.margin - this.font.widthOfTextAtSize(label, 7),
        y: 30,
        size: 7,
        font: this.font,
        color: MUTED,
      });
    });
    return this.doc.save();
  }
}
