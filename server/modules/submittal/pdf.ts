// The panel submittal as PDF (pdfkit): cover, load schedule, protection summary with citations,
// one-lines (drawn), nameplate and feeder, SCCR worksheet, heat calculation, control power, motor
// connection cards and the cautions; every page carries the title block (titleBlock) with its
// drawing number and "Page n of N".
import { sharedDrivesSection } from './pdf-shared-drives';
import { createRequire } from 'node:module';
import fs from 'node:fs';
import PDFDocument from 'pdfkit';
import type { SubmittalData, SubmittalPdfOptions } from './pdf-data';
import { writeDrawingPages } from './drawing-pages';
import { BOTTOM, MARGIN, Writer } from './pdf-writer';
import { openLogo, titleBlock, type TitleBlockData } from './pdf-title-block';
import {
  closingCautions,
  connectionCards,
  controlConductors,
  controlPower,
  coverPage,
  heatCalculation,
  loadSchedule,
  nameplateAndFeeder,
  oneLineDiagrams,
  otherVoltages,
  protectionSummary,
  sccrWorksheet,
} from './pdf-sections';
import { groupCircuitsSection } from './pdf-group-circuits';

export type { SubmittalData, SubmittalPdfOptions } from './pdf-data';
export { pdfSafe } from './pdf-writer';
export { SUBMITTAL_CAUTIONS } from './pdf-sections';

function resolveBarlow(): { regular: string; bold: string } | null {
  try {
    const req = createRequire(import.meta.url);
    const regular = req.resolve('@fontsource/barlow/files/barlow-latin-400-normal.woff');
    const bold = req.resolve('@fontsource/barlow/files/barlow-latin-600-normal.woff');
    return fs.existsSync(regular) && fs.existsSync(bold) ? { regular, bold } : null;
  } catch {
    return null;
  }
}

/** Write the submittal to the stream; resolves when the stream has the whole document. */
export function writeSubmittalPdf(
  data: SubmittalData,
  stream: NodeJS.WritableStream,
  options: SubmittalPdfOptions = {},
): Promise<{ font: 'Barlow' | 'Helvetica' }> {
  const doc = new PDFDocument({
    size: 'LETTER',
    margins: { top: MARGIN, left: MARGIN, right: MARGIN, bottom: BOTTOM },
    bufferPages: true,
    compress: options.compress ?? true,
    info: { Title: `Submittal ${data.job.number} ${data.panel.name} ${data.panel.revision}`, Author: data.shop.name },
  });
  const barlow = options.font === 'helvetica' ? null : resolveBarlow();
  let regular = 'Helvetica';
  let bold = 'Helvetica-Bold';
  if (barlow) {
    doc.registerFont('Barlow', barlow.regular);
    doc.registerFont('Barlow-SemiBold', barlow.bold);
    regular = 'Barlow';
    bold = 'Barlow-SemiBold';
  }
  const done = new Promise<{ font: 'Barlow' | 'Helvetica' }>((resolve, reject) => {
    stream.on('finish', () => resolve({ font: barlow ? 'Barlow' : 'Helvetica' }));
    stream.on('error', reject);
    doc.on('error', reject);
  });
  doc.pipe(stream);
  const w = new Writer(doc, regular, bold);

  // the sections, each starting where the last one ended (a heading breaks to a new page when it must)
  coverPage(w, data);
  loadSchedule(w, data);
  protectionSummary(w, data);
  oneLineDiagrams(w, data);
  nameplateAndFeeder(w, data);
  otherVoltages(w, data);
  sharedDrivesSection(w, data);
  groupCircuitsSection(w, data);
  sccrWorksheet(w, data);
  heatCalculation(w, data);
  controlPower(w, data);
  controlConductors(w, data);
  connectionCards(w, data);
  if (data.drawings) {
    // schematics, terminal plan and panel marking (drawing-pages.ts), before the closing cautions
    writeDrawingPages(doc, data.drawings, { regular, bold });
    doc.y = MARGIN;
  }
  closingCautions(w);

  // The title block on every page, now that the page count is known
  const logo = data.shop.logo ? openLogo(doc, data.shop.logo) : null;
  const block: TitleBlockData = {
    shop: data.shop,
    job: data.job,
    panel: { name: data.panel.name, revision: data.panel.revision, revisionCode: data.panel.revisionCode ?? data.panel.revision },
    signOff: data.signOff ? { by: data.signOff.by ?? null, date: data.signOff.date } : null,
  };
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    titleBlock(doc, block, { regular, bold }, i - range.start + 1, range.count, logo);
  }

  doc.end();
  return done;
}
