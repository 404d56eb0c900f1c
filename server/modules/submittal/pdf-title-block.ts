// The title block at the foot of every submittal page, and the shop's logo opened once for all of them.
import { drawingNumber } from '../../../shared/schemas/settings';
import type { SubmittalData } from './pdf-data';
import { MARGIN, SLATE, TITLE_BLOCK_H, fitLine, pdfSafe, type Doc } from './pdf-writer';

export interface TitleBlockData {
  shop: SubmittalData['shop'];
  job: { number: string; name: string };
  panel: { name: string; revision: string; revisionCode: string };
  signOff: { by: string | null; date: string } | null;
}

/**
 * The title block at the foot of one page: shop (and logo), job, panel, revision, drawing number from
 * the shop's scheme, page n of N, and who signed off when. Drawn on every page once the document is
 * complete (pages are buffered), so a page added anywhere gets it too.
 */
export function titleBlock(
  doc: Doc,
  t: TitleBlockData,
  fonts: { regular: string; bold: string },
  page: number,
  pages: number,
  logo: unknown,
): void {
  const bottomMargin = doc.page.margins.bottom;
  doc.page.margins.bottom = 0; // text in the foot must not start a new page
  const x0 = MARGIN;
  const w = doc.page.width - 2 * MARGIN;
  const y0 = doc.page.height - MARGIN - TITLE_BLOCK_H;
  const cols = [0.27, 0.26, 0.1, 0.16, 0.21].map((f) => f * w);
  doc.save();
  doc.rect(x0, y0, w, TITLE_BLOCK_H).lineWidth(0.8).strokeColor(SLATE).stroke();
  let x = x0;
  /** `shrink`: smaller type (down to 6.5 pt) before the text is cut */
  const cell = (i: number, label: string, lines: Array<{ text: string; bold?: boolean; shrink?: boolean }>) => {
    if (i > 0)
      doc
        .moveTo(x, y0)
        .lineTo(x, y0 + TITLE_BLOCK_H)
        .lineWidth(0.5)
        .strokeColor(SLATE)
        .stroke();
    const cw = cols[i];
    doc
      .font(fonts.regular)
      .fontSize(6)
      .fillColor('#64748b')
      .text(label.toUpperCase(), x + 5, y0 + 5, { lineBreak: false });
    let y = y0 + 15;
    for (const l of lines) {
      let size = l.bold ? 8.5 : 7.5;
      doc
        .font(l.bold ? fonts.bold : fonts.regular)
        .fontSize(size)
        .fillColor(SLATE);
      while (l.shrink && size > 6.5 && doc.widthOfString(pdfSafe(l.text)) > cw - 10) doc.fontSize((size -= 0.5));
      doc.text(fitLine(doc, l.text, cw - 10), x + 5, y, { lineBreak: false });
      y += l.bold ? 11 : 10;
    }
    x += cw;
  };
  const address = (t.shop.address ?? '')
    .split(/\r?\n|,\s*/)
    .map((a) => a.trim())
    .filter(Boolean);
  let shopX = 0;
  if (logo) {
    try {
      doc.image(logo as Buffer, x0 + 5, y0 + 14, { fit: [36, 36] });
      shopX = 42;
    } catch {
      shopX = 0; // an image pdfkit cannot read: the name stands alone
    }
  }
  x += shopX;
  cols[0] -= shopX;
  cell(0, 'Shop', [
    { text: t.shop.name, bold: true, shrink: true },
    ...address.slice(0, 1).map((text) => ({ text })),
    ...(address.length > 1 ? [{ text: address.slice(1).join(', ') }] : []),
  ]);
  cell(1, 'Job / panel', [{ text: `Job ${t.job.number}`, bold: true }, { text: t.job.name }, { text: `Panel ${t.panel.name}` }]);
  cell(2, 'Revision', [{ text: t.panel.revisionCode, bold: true }, { text: t.signOff ? '' : 'draft' }]);
  cell(
    3,
    'Signed off',
    t.signOff
      ? [{ text: t.signOff.by ?? 'engineer', bold: true }, { text: `on ${t.signOff.date}` }]
      : [{ text: 'Not signed off', bold: true }],
  );
  cell(4, 'Drawing', [{ text: '' }, { text: `Page ${page} of ${pages}` }]);
  // the drawing number whole on one line: smaller type for a long one, never wrapped or cut
  const number = pdfSafe(
    drawingNumber(t.shop.drawingNumberScheme, { job: t.job.number, panel: t.panel.name, rev: t.panel.revisionCode, sheet: page }),
  );
  let size = 8.5;
  doc.font(fonts.bold);
  while (size > 5 && doc.fontSize(size).widthOfString(number) > cols[4] - 10) size -= 0.5;
  doc.fillColor(SLATE).text(number, x - cols[4] + 5, y0 + 15, { lineBreak: false });
  doc.restore();
  doc.page.margins.bottom = bottomMargin;
}

/** The logo read once (pdfkit embeds an opened image once however many pages show it); null when unreadable. */
export function openLogo(doc: Doc, logo: Buffer): unknown {
  try {
    return doc.openImage(logo);
  } catch {
    return null;
  }
}

declare global {
  namespace PDFKit {
    interface PDFDocument {
      /** pdfkit's own (untyped in @types/pdfkit): reads an image once, to be placed on many pages */
      openImage(src: Buffer): unknown;
    }
  }
}
