// The submittal's drawing pages: every schematic sheet (the supply sheet first), the backplate layout, the
// terminal plan and the panel marking, drawn into the PDF from the same SVG the Drawings section shows (svg-to-pdfkit), landscape.
import SVGtoPDF from 'svg-to-pdfkit';
import type PDFDocument from 'pdfkit';
import type { SubmittalDrawings, TerminalRow } from '../../../shared/drawings/panel-drawings';
import { pdfSafe } from './pdf-writer';

export type { SubmittalDrawings };

const MARGIN = 24;
const safe = (s: string) =>
  pdfSafe(s.replace(/ · /g, ', ').replace(/→/g, '->').replace(/↔/g, '<->').replace(/φ/g, 'ph').replace(/[✖⚠]/g, '!'));

/** Adds the drawing pages to an open document; the caller's page style continues after them. */
export function writeDrawingPages(
  doc: InstanceType<typeof PDFDocument>,
  d: SubmittalDrawings,
  fonts: { regular: string; bold: string },
): void {
  const fontCallback = (_family: string, bold: boolean) => (bold ? fonts.bold : fonts.regular);
  const svgPage = (svg: string) => {
    doc.addPage({ size: 'LETTER', layout: 'landscape', margin: MARGIN });
    const w = doc.page.width - 2 * MARGIN;
    const h = doc.page.height - 2 * MARGIN;
    SVGtoPDF(doc as never, safe(svg), MARGIN, MARGIN, {
      width: w,
      height: h,
      preserveAspectRatio: 'xMidYMid meet',
      fontCallback,
      warningCallback: () => undefined,
    });
  };
  for (const s of d.sheets) svgPage(s);
  if (d.layoutSvg) svgPage(d.layoutSvg);

  // Terminal plan: a table drawn with pdfkit
  doc.addPage({ size: 'LETTER', layout: 'landscape', margin: MARGIN });
  doc.font(fonts.bold).fontSize(14).fillColor('#1f2731').text(`Terminal plan - ${d.drawingNumber}`, MARGIN, MARGIN);
  doc
    .font(fonts.regular)
    .fontSize(8)
    .fillColor('#55606c')
    .text(
      safe(`${d.terminals.length} terminals: the ${d.bomTerminalBlocks} terminal blocks of the bill of materials. ${d.colourPractice}`),
      MARGIN,
      doc.y + 2,
      { width: doc.page.width - 2 * MARGIN },
    );
  const cols: Array<[string, number, (t: TerminalRow) => string]> = [
    ['Terminal', 0.08, (t) => t.ref],
    ['Wire', 0.06, (t) => t.wire],
    ['Purpose', 0.26, (t) => `${t.purpose}${t.inBom ? '' : ' (not in the bill of materials)'}`],
    ['Panel side', 0.13, (t) => t.panelSide],
    ['Field side', 0.22, (t) => t.field],
    ['Conductor', 0.15, (t) => t.conductor],
    ['Colour', 0.1, (t) => t.colour],
  ];
  const width = doc.page.width - 2 * MARGIN;
  const head = () => {
    let x = MARGIN;
    const y = doc.y + 6;
    doc.font(fonts.bold).fontSize(8).fillColor('#1f2731');
    for (const [h, f] of cols) {
      doc.text(h, x, y, { width: f * width - 4, lineBreak: false });
      x += f * width;
    }
    doc
      .moveTo(MARGIN, y + 11)
      .lineTo(MARGIN + width, y + 11)
      .strokeColor('#a8652f')
      .lineWidth(0.6)
      .stroke();
    doc.y = y + 14;
  };
  head();
  doc.font(fonts.regular).fontSize(7.5);
  for (const t of d.terminals) {
    if (doc.y > doc.page.height - MARGIN - 12) {
      doc.addPage({ size: 'LETTER', layout: 'landscape', margin: MARGIN });
      doc.y = MARGIN;
      head();
      doc.font(fonts.regular).fontSize(7.5);
    }
    let x = MARGIN;
    const y = doc.y;
    doc.fillColor(t.inBom ? '#1f2731' : '#a23b2a');
    for (const [, f, v] of cols) {
      doc.text(safe(v(t)), x, y, { width: f * width - 4, lineBreak: false, ellipsis: true });
      x += f * width;
    }
    doc.y = y + 10;
  }

  if (d.nameplateSvg) {
    doc.addPage({ size: 'LETTER', layout: 'landscape', margin: MARGIN });
    doc.font(fonts.bold).fontSize(14).fillColor('#1f2731').text(`Panel marking - ${d.drawingNumber}`, MARGIN, MARGIN);
    doc
      .font(fonts.regular)
      .fontSize(8)
      .fillColor('#55606c')
      .text(
        'Label to print (NEC 2023 409.110, UL 508A), from the panel checks. A qualified person verifies the values before the label is fixed.',
        MARGIN,
        doc.y + 2,
      );
    SVGtoPDF(doc as never, safe(d.nameplateSvg), MARGIN, doc.y + 12, {
      width: 480,
      height: 400,
      preserveAspectRatio: 'xMinYMin meet',
      fontCallback,
      warningCallback: () => undefined,
    });
  }
  doc.addPage();
}
