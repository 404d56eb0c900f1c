// The submittal's page writer (pdfkit): colours, margins, headings, paragraphs and tables that break across
// pages above the title block, and the text helpers every part of the PDF uses.
import type PDFDocument from 'pdfkit';

export const SLATE = '#334155';
export const COPPER = '#b87333';
export const MARGIN = 48;
/** height of the title block at the foot of every page; content stops above it */
export const TITLE_BLOCK_H = 58;
export const BOTTOM = MARGIN + TITLE_BLOCK_H + 8;

/** Replace characters outside the fonts' Latin range. */
export function pdfSafe(s: string): string {
  return s
    .replace(/≥/g, '>=')
    .replace(/≤/g, '<=')
    .replace(/Δ/g, 'delta ')
    .replace(/√/g, 'sqrt')
    .replace(/·/g, '*')
    .replace(/−/g, '-')
    .replace(/≈/g, '~')
    .replace(/[^\x20-\x7E\u00A0-\u00FF\u2013\u2014\u2018\u2019\u201C\u201D\u2026\n]/g, '?');
}

export const fmt = (x: number | null | undefined, d = 1): string =>
  x === null || x === undefined || !Number.isFinite(x) ? '-' : (Math.round(x * 10 ** d) / 10 ** d).toString();

export type Doc = InstanceType<typeof PDFDocument>;

export class Writer {
  constructor(
    readonly doc: Doc,
    readonly regular: string,
    readonly bold: string,
  ) {}

  get width(): number {
    return this.doc.page.width - 2 * MARGIN;
  }

  ensure(h: number): void {
    if (this.doc.y + h > this.doc.page.height - BOTTOM) this.doc.addPage();
  }

  heading(t: string): void {
    this.ensure(60);
    this.doc.moveDown(0.6);
    this.doc.font(this.bold).fontSize(14).fillColor(SLATE).text(pdfSafe(t), MARGIN, this.doc.y);
    const y = this.doc.y + 2;
    this.doc
      .moveTo(MARGIN, y)
      .lineTo(MARGIN + this.width, y)
      .lineWidth(1)
      .strokeColor(COPPER)
      .stroke();
    this.doc.moveDown(0.4);
  }

  sub(t: string): void {
    this.ensure(40);
    this.doc.moveDown(0.3);
    this.doc.font(this.bold).fontSize(10.5).fillColor(SLATE).text(pdfSafe(t), MARGIN, this.doc.y);
  }

  para(t: string, size = 9): void {
    this.ensure(20);
    this.doc.font(this.regular).fontSize(size).fillColor(SLATE).text(pdfSafe(t), MARGIN, this.doc.y, { width: this.width });
  }

  kv(rows: Array<[string, string]>): void {
    this.table(['Item', 'Value'], [0.35, 0.65], rows);
  }

  table(head: string[], fractions: number[], rows: string[][], highlight?: (i: number) => boolean): void {
    const widths = fractions.map((f) => f * this.width);
    const size = 8;
    const rowH = (cells: string[], font: string): number => {
      this.doc.font(font).fontSize(size);
      return Math.max(...cells.map((c, i) => this.doc.heightOfString(pdfSafe(c), { width: widths[i] - 6 }))) + 6;
    };
    const drawRow = (cells: string[], font: string, fill?: string): void => {
      const h = rowH(cells, font);
      if (this.doc.y + h > this.doc.page.height - BOTTOM) this.doc.addPage();
      const y = this.doc.y;
      if (fill) this.doc.rect(MARGIN, y, this.width, h).fill(fill);
      let x = MARGIN;
      this.doc.font(font).fontSize(size).fillColor(SLATE);
      cells.forEach((c, i) => {
        this.doc.text(pdfSafe(c), x + 3, y + 3, { width: widths[i] - 6 });
        x += widths[i];
      });
      this.doc
        .moveTo(MARGIN, y + h)
        .lineTo(MARGIN + this.width, y + h)
        .lineWidth(0.4)
        .strokeColor('#cbd5e1')
        .stroke();
      this.doc.x = MARGIN;
      this.doc.y = y + h;
    };
    drawRow(head, this.bold, '#e2e8f0');
    rows.forEach((r, i) => {
      drawRow(r, highlight?.(i) ? this.bold : this.regular, highlight?.(i) ? '#f3e3d3' : undefined);
    });
    this.doc.moveDown(0.3);
  }
}

/** The text cut to fit `width` on one line at the current font and size, with an ellipsis when cut. */
export function fitLine(doc: Doc, text: string, width: number): string {
  const t = pdfSafe(text);
  if (doc.widthOfString(t) <= width) return t;
  let n = t.length;
  while (n > 0 && doc.widthOfString(`${t.slice(0, n).trimEnd()}…`) > width) n--;
  return `${t.slice(0, n).trimEnd()}…`;
}
