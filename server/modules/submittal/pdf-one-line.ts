// The submittal's one-line diagrams: each bucket drawn with lines and symbols (our own plain style), supply
// at the top, labels to the right.
import type { LoadSelection } from '../../../shared/schemas/selection';
import { oneLineElements, type MotorFeed, type OneLineElement } from '../../../shared/calc/one-line';
import { sharedDriveOneLine } from '../../../shared/calc/shared-drive-one-line';
import type { SharedDrive } from '../../../shared/schemas/selection';
import type { GroupCircuit } from '../../../shared/schemas/group-circuit';
import { COPPER, MARGIN, SLATE, fitLine, pdfSafe, type Doc, type Writer } from './pdf-writer';

const STEP = 36;

/** One symbol of a one-line, on the vertical at x from y to y + STEP (our own plain style). */
function drawSymbol(doc: Doc, e: OneLineElement, x: number, y: number, bold: string): void {
  const mid = y + STEP / 2;
  const wire = (y1: number, y2: number) => doc.moveTo(x, y1).lineTo(x, y2);
  doc.save().lineWidth(1.2).strokeColor(SLATE);
  switch (e.kind) {
    case 'bus':
      doc
        .moveTo(x - 26, y + 14)
        .lineTo(x + 26, y + 14)
        .lineWidth(4)
        .strokeColor(COPPER)
        .stroke();
      doc.lineWidth(1.2).strokeColor(SLATE);
      wire(y + 14, y + STEP).stroke();
      break;
    case 'disconnect':
      wire(y, mid - 8).stroke();
      doc
        .moveTo(x, mid - 8)
        .lineTo(x + 10, mid + 7)
        .stroke();
      wire(mid + 8, y + STEP).stroke();
      doc.circle(x, mid - 8, 1.6).fill(SLATE);
      break;
    case 'fuse':
      wire(y, y + STEP).stroke();
      doc.rect(x - 5, mid - 11, 10, 22).fillAndStroke('#ffffff', SLATE);
      break;
    case 'breaker':
      wire(y, mid - 10).stroke();
      doc
        .moveTo(x, mid - 10)
        .quadraticCurveTo(x + 13, mid, x, mid + 10)
        .stroke();
      wire(mid + 10, y + STEP).stroke();
      break;
    case 'contactor': {
      const poles = e.poles ?? ['M'];
      const gap = 22;
      const x0 = x - ((poles.length - 1) * gap) / 2;
      const x1 = x0 + (poles.length - 1) * gap;
      wire(y, y + 6).stroke();
      wire(y + STEP - 6, y + STEP).stroke();
      if (poles.length > 1) {
        doc
          .moveTo(x0, y + 6)
          .lineTo(x1, y + 6)
          .stroke();
        doc
          .moveTo(x0, y + STEP - 6)
          .lineTo(x1, y + STEP - 6)
          .stroke();
      }
      poles.forEach((p, i) => {
        const px = x0 + i * gap;
        doc
          .moveTo(px, y + 6)
          .lineTo(px, mid - 4)
          .stroke();
        doc
          .moveTo(px - 6, mid - 4)
          .lineTo(px + 6, mid - 4)
          .stroke();
        doc
          .moveTo(px - 6, mid + 4)
          .lineTo(px + 6, mid + 4)
          .stroke();
        doc
          .moveTo(px, mid + 4)
          .lineTo(px, y + STEP - 6)
          .stroke();
        doc
          .font(bold)
          .fontSize(6.5)
          .fillColor(SLATE)
          .text(pdfSafe(p), px + 3, y + 8, { lineBreak: false });
      });
      if (e.interlocked && poles.length > 1)
        doc.moveTo(x0, mid).lineTo(x1, mid).dash(2, { space: 2 }).strokeColor(COPPER).stroke().undash();
      break;
    }
    case 'overload':
      wire(y, mid - 7).stroke();
      doc
        .moveTo(x, mid - 7)
        .lineTo(x + 6, mid - 7)
        .lineTo(x + 6, mid)
        .lineTo(x - 6, mid)
        .lineTo(x - 6, mid + 7)
        .lineTo(x, mid + 7)
        .stroke();
      wire(mid + 7, y + STEP).stroke();
      break;
    case 'vfd':
    case 'soft-starter':
      wire(y, mid - 11).stroke();
      doc.rect(x - 17, mid - 11, 34, 22).stroke();
      doc
        .font(bold)
        .fontSize(7)
        .fillColor(COPPER)
        .text(e.kind === 'vfd' ? 'VFD' : 'RVSS', x - 17, mid - 3.5, { width: 34, align: 'center', lineBreak: false });
      wire(mid + 11, y + STEP).stroke();
      break;
    case 'transformer':
      wire(y, mid - 14).stroke();
      doc.circle(x, mid - 6, 8).fillAndStroke('#ffffff', SLATE);
      doc
        .circle(x, mid + 6, 8)
        .lineWidth(1.2)
        .stroke(COPPER);
      doc.strokeColor(SLATE);
      wire(mid + 14, y + STEP).stroke();
      break;
    case 'dc-supply':
      wire(y, mid - 11).stroke();
      doc.rect(x - 17, mid - 11, 34, 22).stroke();
      doc
        .moveTo(x - 17, mid + 11)
        .lineTo(x + 17, mid - 11)
        .lineWidth(0.6)
        .stroke();
      doc
        .font(bold)
        .fontSize(6)
        .fillColor(COPPER)
        .text('AC', x - 15, mid - 9, { lineBreak: false })
        .text('DC', x + 4, mid + 3, { lineBreak: false });
      doc.lineWidth(1.2);
      wire(mid + 11, y + STEP).stroke();
      break;
    case 'motor':
      wire(y, mid - 12).stroke();
      doc.circle(x, mid, 12).lineWidth(1.4).stroke(COPPER);
      doc
        .font(bold)
        .fontSize(10)
        .fillColor(SLATE)
        .text('M', x - 12, mid - 5, { width: 24, align: 'center', lineBreak: false });
      break;
  }
  doc.restore();
}

/** What else shapes a bucket's one-line: the drive it shares with other motors, or its 430.53 group's device. */
export interface OneLineShare {
  drive?: SharedDrive | null;
  group?: GroupCircuit | null;
}

const elementsOf = (s: LoadSelection, feed: MotorFeed, share: OneLineShare) =>
  share.drive ? sharedDriveOneLine(s, share.drive) : oneLineElements(s, feed, share.group ?? null);

export const oneLineHeight = (s: LoadSelection, feed: MotorFeed = null, share: OneLineShare = {}) =>
  elementsOf(s, feed, share).length * STEP + 8;

/** A bucket's one-line drawn with lines and symbols, supply at the top, labels to the right. */
export function drawOneLine(w: Writer, s: LoadSelection, feed: MotorFeed, share: OneLineShare = {}): void {
  const elements = elementsOf(s, feed, share);
  const height = oneLineHeight(s, feed, share);
  w.ensure(height + 24);
  w.sub(s.tag);
  const doc = w.doc;
  const top = doc.y + 4;
  const x = MARGIN + 40;
  elements.forEach((e, i) => {
    const y = top + i * STEP;
    drawSymbol(doc, e, x, y, w.bold);
    doc.font(w.bold).fontSize(8.5).fillColor(SLATE);
    doc.text(fitLine(doc, e.label, w.width - 90), x + 44, y + STEP / 2 - 9, { lineBreak: false });
    if (e.detail) {
      doc.font(w.regular).fontSize(7);
      doc.text(fitLine(doc, e.detail.replace(/ · /g, '; '), w.width - 90), x + 44, y + STEP / 2 + 1, { lineBreak: false });
    }
  });
  doc.x = MARGIN;
  doc.y = top + height;
}
