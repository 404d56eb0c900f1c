// The panel submittal as PDF (pdfkit): cover, load schedule, protection summary with citations,
// one-lines (drawn), nameplate and feeder, SCCR worksheet, heat calculation, control power, motor
// connection cards and the cautions; every page carries the title block (titleBlock) with its
// drawing number and "Page n of N".
import { answerValueLabel, fieldLabel, starterTypeLabel } from '../../../shared/labels';
import { createRequire } from 'node:module';
import fs from 'node:fs';
import PDFDocument from 'pdfkit';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import type { SccrResult } from '../../../shared/calc/sccr';
import type { HeatResult } from '../../../shared/calc/heat';
import type { ControlPowerResult } from '../../../shared/calc/control-power';
import type { NameplateResult } from '../../../shared/calc/nameplate';
import { motorFeed, sourcesSummary } from '../../../shared/calc/other-sources';
import type { ConnectionCard, LineName } from '../../../shared/calc/connections';
import { relayOf, relayWiringText } from '../../../shared/calc/overload';
import { perWindingText } from '../../../shared/calc/scpd';
import { motorLeadText, termination60Text, voltageDropText } from '../../../shared/calc/conductor';
import type { ControlConductorCheck } from '../../../shared/calc/control-conductors';
import { unbalanceText } from '../../../shared/standards/nema-mg1-voltage-unbalance';
import { SCPD_WORDS } from '../../../shared/calc/scpd';
import { oneLineElements, type MotorFeed, type OneLineElement } from '../../../shared/calc/one-line';
import { drawingNumber } from '../../../shared/schemas/settings';
import { writeDrawingPages, type SubmittalDrawings } from './drawing-pages';

export interface SubmittalData {
  job: {
    number: string;
    name: string;
    customer: string;
    site: string;
    availableFaultKa: number | null;
    ambientC: number;
    codeEdition: string;
  };
  /** `revision` as the reader sees it ("R1", "Draft after R0"); `revisionCode` for the drawing number ("R1", or "D" for a draft) */
  panel: { name: string; revision: string; revisionCode?: string; /** ISO date */ date: string; enclosureType: string };
  /** the shop that issues the submittal (shop settings) */
  shop: { name: string; address?: string; /** PNG or JPEG */ logo?: Buffer | null; drawingNumberScheme: string };
  selections: LoadSelection[];
  rollup: PanelRollup;
  nameplate: NameplateResult;
  sccr: SccrResult;
  /** the signed-off revision this submittal shows, with the engineer's acknowledgement of a rating below the site's fault current */
  signOff?: { revision: string; date: string; /** the engineer who signed */ by?: string | null; acknowledged: { finding: string; by: string; reason: string } | null };
  heat: HeatResult;
  controlPower: ControlPowerResult;
  /** each control conductor against its protecting device (430.72(B)) */
  controlConductors?: ControlConductorCheck;
  connectionCards: Array<{ tag: string; card: ConnectionCard }>;
  /** schematics, terminal plan and panel marking (drawing-pages.ts) */
  drawings?: SubmittalDrawings;
}

export interface SubmittalPdfOptions {
  /** false writes uncompressed content streams (tests read the text) */
  compress?: boolean;
  /** Barlow (embedded from @fontsource/barlow WOFF files) by default; Helvetica when asked or when missing */
  font?: 'barlow' | 'helvetica';
}

export const SUBMITTAL_CAUTIONS = [
  'These results support the design of a qualified person and do not replace it; a qualified person verifies every value.',
  'Local codes, the authority having jurisdiction, and the listing and instructions of the equipment take precedence.',
  'De-energise and lock out before work.',
  'Check motor rotation before coupling the load.',
  'Never run a DC series motor unloaded.',
] as const;

const SLATE = '#334155';
const COPPER = '#b87333';
const MARGIN = 48;
/** height of the title block at the foot of every page; content stops above it */
const TITLE_BLOCK_H = 58;
const BOTTOM = MARGIN + TITLE_BLOCK_H + 8;

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

const fmt = (x: number | null | undefined, d = 1): string =>
  x === null || x === undefined || !Number.isFinite(x) ? '-' : (Math.round(x * 10 ** d) / 10 ** d).toString();

type Doc = InstanceType<typeof PDFDocument>;

class Writer {
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
    this.doc.moveTo(MARGIN, y).lineTo(MARGIN + this.width, y).lineWidth(1).strokeColor(COPPER).stroke();
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
      this.doc.moveTo(MARGIN, y + h).lineTo(MARGIN + this.width, y + h).lineWidth(0.4).strokeColor('#cbd5e1').stroke();
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

function starterText(s: LoadSelection): string {
  return `${starterTypeLabel(s.starter.type)}${s.starter.nemaSize !== null ? ` size ${s.starter.nemaSize}` : ''}`;
}


const STEP = 36;

/** The text cut to fit `width` on one line at the current font and size, with an ellipsis when cut. */
function fitLine(doc: Doc, text: string, width: number): string {
  const t = pdfSafe(text);
  if (doc.widthOfString(t) <= width) return t;
  let n = t.length;
  while (n > 0 && doc.widthOfString(`${t.slice(0, n).trimEnd()}…`) > width) n--;
  return `${t.slice(0, n).trimEnd()}…`;
}

/** One symbol of a one-line, on the vertical at x from y to y + STEP (our own plain style). */
function drawSymbol(doc: Doc, e: OneLineElement, x: number, y: number, bold: string): void {
  const mid = y + STEP / 2;
  const wire = (y1: number, y2: number) => doc.moveTo(x, y1).lineTo(x, y2);
  doc.save().lineWidth(1.2).strokeColor(SLATE);
  switch (e.kind) {
    case 'bus':
      doc.moveTo(x - 26, y + 14).lineTo(x + 26, y + 14).lineWidth(4).strokeColor(COPPER).stroke();
      doc.lineWidth(1.2).strokeColor(SLATE);
      wire(y + 14, y + STEP).stroke();
      break;
    case 'disconnect':
      wire(y, mid - 8).stroke();
      doc.moveTo(x, mid - 8).lineTo(x + 10, mid + 7).stroke();
      wire(mid + 8, y + STEP).stroke();
      doc.circle(x, mid - 8, 1.6).fill(SLATE);
      break;
    case 'fuse':
      wire(y, y + STEP).stroke();
      doc.rect(x - 5, mid - 11, 10, 22).fillAndStroke('#ffffff', SLATE);
      break;
    case 'breaker':
      wire(y, mid - 10).stroke();
      doc.moveTo(x, mid - 10).quadraticCurveTo(x + 13, mid, x, mid + 10).stroke();
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
        doc.moveTo(x0, y + 6).lineTo(x1, y + 6).stroke();
        doc.moveTo(x0, y + STEP - 6).lineTo(x1, y + STEP - 6).stroke();
      }
      poles.forEach((p, i) => {
        const px = x0 + i * gap;
        doc.moveTo(px, y + 6).lineTo(px, mid - 4).stroke();
        doc.moveTo(px - 6, mid - 4).lineTo(px + 6, mid - 4).stroke();
        doc.moveTo(px - 6, mid + 4).lineTo(px + 6, mid + 4).stroke();
        doc.moveTo(px, mid + 4).lineTo(px, y + STEP - 6).stroke();
        doc.font(bold).fontSize(6.5).fillColor(SLATE).text(pdfSafe(p), px + 3, y + 8, { lineBreak: false });
      });
      if (e.interlocked && poles.length > 1) doc.moveTo(x0, mid).lineTo(x1, mid).dash(2, { space: 2 }).strokeColor(COPPER).stroke().undash();
      break;
    }
    case 'overload':
      wire(y, mid - 7).stroke();
      doc.moveTo(x, mid - 7).lineTo(x + 6, mid - 7).lineTo(x + 6, mid).lineTo(x - 6, mid).lineTo(x - 6, mid + 7).lineTo(x, mid + 7).stroke();
      wire(mid + 7, y + STEP).stroke();
      break;
    case 'vfd':
    case 'soft-starter':
      wire(y, mid - 11).stroke();
      doc.rect(x - 17, mid - 11, 34, 22).stroke();
      doc.font(bold).fontSize(7).fillColor(COPPER).text(e.kind === 'vfd' ? 'VFD' : 'RVSS', x - 17, mid - 3.5, { width: 34, align: 'center', lineBreak: false });
      wire(mid + 11, y + STEP).stroke();
      break;
    case 'transformer':
      wire(y, mid - 14).stroke();
      doc.circle(x, mid - 6, 8).fillAndStroke('#ffffff', SLATE);
      doc.circle(x, mid + 6, 8).lineWidth(1.2).stroke(COPPER);
      doc.strokeColor(SLATE);
      wire(mid + 14, y + STEP).stroke();
      break;
    case 'dc-supply':
      wire(y, mid - 11).stroke();
      doc.rect(x - 17, mid - 11, 34, 22).stroke();
      doc.moveTo(x - 17, mid + 11).lineTo(x + 17, mid - 11).lineWidth(0.6).stroke();
      doc.font(bold).fontSize(6).fillColor(COPPER).text('AC', x - 15, mid - 9, { lineBreak: false }).text('DC', x + 4, mid + 3, { lineBreak: false });
      doc.lineWidth(1.2);
      wire(mid + 11, y + STEP).stroke();
      break;
    case 'motor':
      wire(y, mid - 12).stroke();
      doc.circle(x, mid, 12).lineWidth(1.4).stroke(COPPER);
      doc.font(bold).fontSize(10).fillColor(SLATE).text('M', x - 12, mid - 5, { width: 24, align: 'center', lineBreak: false });
      break;
  }
  doc.restore();
}

const oneLineHeight = (s: LoadSelection, feed: MotorFeed = null) => oneLineElements(s, feed).length * STEP + 8;

/** A bucket's one-line drawn with lines and symbols, supply at the top, labels to the right. */
function drawOneLine(w: Writer, s: LoadSelection, feed: MotorFeed): void {
  const elements = oneLineElements(s, feed);
  const height = oneLineHeight(s, feed);
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
function titleBlock(doc: Doc, t: TitleBlockData, fonts: { regular: string; bold: string }, page: number, pages: number, logo: unknown): void {
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
    if (i > 0) doc.moveTo(x, y0).lineTo(x, y0 + TITLE_BLOCK_H).lineWidth(0.5).strokeColor(SLATE).stroke();
    const cw = cols[i];
    doc.font(fonts.regular).fontSize(6).fillColor('#64748b').text(label.toUpperCase(), x + 5, y0 + 5, { lineBreak: false });
    let y = y0 + 15;
    for (const l of lines) {
      let size = l.bold ? 8.5 : 7.5;
      doc.font(l.bold ? fonts.bold : fonts.regular).fontSize(size).fillColor(SLATE);
      while (l.shrink && size > 6.5 && doc.widthOfString(pdfSafe(l.text)) > cw - 10) doc.fontSize((size -= 0.5));
      doc.text(fitLine(doc, l.text, cw - 10), x + 5, y, { lineBreak: false });
      y += l.bold ? 11 : 10;
    }
    x += cw;
  };
  const address = (t.shop.address ?? '').split(/\r?\n|,\s*/).map((a) => a.trim()).filter(Boolean);
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
  cell(0, 'Shop', [{ text: t.shop.name, bold: true, shrink: true }, ...address.slice(0, 1).map((text) => ({ text })), ...(address.length > 1 ? [{ text: address.slice(1).join(', ') }] : [])]);
  cell(1, 'Job / panel', [{ text: `Job ${t.job.number}`, bold: true }, { text: t.job.name }, { text: `Panel ${t.panel.name}` }]);
  cell(2, 'Revision', [{ text: t.panel.revisionCode, bold: true }, { text: t.signOff ? '' : 'draft' }]);
  cell(3, 'Signed off', t.signOff ? [{ text: t.signOff.by ?? 'engineer', bold: true }, { text: `on ${t.signOff.date}` }] : [{ text: 'Not signed off', bold: true }]);
  cell(4, 'Drawing', [{ text: '' }, { text: `Page ${page} of ${pages}` }]);
  // the drawing number whole on one line: smaller type for a long one, never wrapped or cut
  const number = pdfSafe(drawingNumber(t.shop.drawingNumberScheme, { job: t.job.number, panel: t.panel.name, rev: t.panel.revisionCode, sheet: page }));
  let size = 8.5;
  doc.font(fonts.bold);
  while (size > 5 && doc.fontSize(size).widthOfString(number) > cols[4] - 10) size -= 0.5;
  doc.fillColor(SLATE).text(number, x - cols[4] + 5, y0 + 15, { lineBreak: false });
  doc.restore();
  doc.page.margins.bottom = bottomMargin;
}

const LINES: LineName[] = ['L1', 'L2', 'L3', 'A+', 'A-'];

/** The logo read once (pdfkit embeds an opened image once however many pages show it); null when unreadable. */
function openLogo(doc: Doc, logo: Buffer): unknown {
  try {
    return (doc as unknown as { openImage(src: Buffer): unknown }).openImage(logo);
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

  // Cover
  doc.rect(0, 0, doc.page.width, 110).fill('#1e293b');
  doc.font(bold).fontSize(24).fillColor('#ffffff').text('Panel submittal', MARGIN, 40);
  doc.font(regular).fontSize(11).fillColor(COPPER).text(pdfSafe(data.shop.name), MARGIN, 74);
  doc.y = 140;
  w.kv([
    ['Job', `${data.job.number} - ${data.job.name}`],
    ['Customer', data.job.customer],
    ['Site', data.job.site],
    ['Panel', data.panel.name],
    ['Revision', data.panel.revision],
    ['Date', data.panel.date],
    ['Enclosure', `Type ${data.panel.enclosureType}`],
    ['Available fault current', data.job.availableFaultKa === null ? 'not given' : `${data.job.availableFaultKa} kA`],
    ['Ambient', `${data.job.ambientC} °C`],
    ['Code edition', data.job.codeEdition],
    ...(data.signOff ? [['Signed off', `${data.signOff.revision} on ${data.signOff.date}${data.signOff.by ? ` by ${data.signOff.by}` : ''}`] as [string, string]] : []),
  ]);
  w.sub('Cautions');
  for (const c of SUBMITTAL_CAUTIONS) w.para(`- ${c}`);

  // Load schedule
  doc.addPage();
  w.heading('Load schedule');
  w.table(
    ['Tag', 'Description', 'hp', 'V', 'FLC A', 'FLA A', 'Starter', 'Branch SCPD', 'OL max A', 'Conductor'],
    [0.08, 0.17, 0.06, 0.06, 0.07, 0.07, 0.13, 0.14, 0.08, 0.14],
    data.selections.map((s) => [
      s.tag,
      s.description ?? '',
      s.hp === null ? '-' : String(s.hp),
      String(s.volts),
      fmt(s.flcAmps),
      fmt(s.flaAmps),
      starterText(s),
      `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]}`,
      s.overload.providedByDrive ? 'by drive' : fmt(s.overload.maxSettingAmps, 2),
      `${s.conductor.size} ${s.conductor.material} ${s.conductor.tempRatingC} °C`,
    ]),
  );

  // Protection summary
  w.heading('Protection summary');
  for (const s of data.selections) {
    w.sub(`${s.tag}${s.description ? ` - ${s.description}` : ''}`);
    w.table(
      ['Item', 'Choice', 'Basis'],
      [0.18, 0.32, 0.5],
      [
        ['Full-load current', `${fmt(s.flcAmps)} A`, s.flcSource],
        ['Starter', starterText(s), s.starter.basis],
        [
          'Branch SCPD',
          `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]} (max ${s.scpd.maxPercent} % = ${fmt(s.scpd.computedMaxAmps)} A)${perWindingText(s) ? `; ${perWindingText(s)}` : ''}`,
          s.scpd.perWinding ? `${s.scpd.basis}; per half-winding: ${s.scpd.perWinding.basis}` : s.scpd.basis,
        ],
        [
          'Overload',
          s.overload.providedByDrive
            ? 'drive electronic overload'
            : `class ${s.overload.tripClass}, max ${fmt(s.overload.maxSettingAmps, 2)} A (${s.overload.maxPercent} %)${relayWiringText(s) ? `; ${relayWiringText(s)}` : ''}`,
          relayWiringText(s) ? `${s.overload.basis}; relay: ${relayOf(s).basis}` : s.overload.basis,
        ],
        [
          'Conductor',
          `${s.conductor.size} ${s.conductor.material}, ${s.conductor.ampacity} A (min ${fmt(s.conductor.minAmpacity)} A)${termination60Text(s) ? `; ${termination60Text(s)}` : ''}${motorLeadText(s) ? `; ${motorLeadText(s)}` : ''}${voltageDropText(s) ? `; ${voltageDropText(s)}` : ''}`,
          s.conductor.motorLeads ? `line side: ${s.conductor.basis}; ${s.conductor.motorLeads.basis}` : s.conductor.basis,
        ],
        ...(s.unbalance
          ? [['Voltage unbalance', unbalanceText(s.unbalance), s.unbalance.basis]]
          : []),
        ['Disconnect', `>= ${fmt(s.disconnect.minAmps)} A${s.disconnect.minHp !== null ? `, >= ${s.disconnect.minHp} hp` : ''}`, s.disconnect.basis],
      ],
    );
    for (const a of s.assumed) w.para(`Assumed input: ${fieldLabel(a.field) ?? a.field} = ${answerValueLabel(a.field, a.assumed)} (${a.note})`, 8);
    for (const c of s.cautions) w.para(`Caution: ${c}`, 8);
  }

  // One-lines (the heading kept with the first diagram)
  if (data.selections.length) w.ensure(oneLineHeight(data.selections[0], motorFeed(data.rollup, data.selections[0].tag)) + 90);
  w.heading('One-line diagrams');
  for (const s of data.selections) drawOneLine(w, s, motorFeed(data.rollup, s.tag));

  // Nameplate and feeder
  w.heading('Panel nameplate and feeder');
  w.table(['Marking', 'Value', 'Basis'], [0.25, 0.35, 0.4], data.nameplate.lines.map((l) => [l.label, l.value, l.basis]));
  const f = data.nameplate.feeder;
  w.table(
    ['Item', 'Value', 'Basis'],
    [0.25, 0.35, 0.4],
    [
      ['Feeder conductor', `${f.conductor.size} (min ${fmt(f.conductor.minAmpacity)} A)`, f.conductor.basis],
      ['Supply protective device', `max ${f.supplyProtection.maxAmps} A`, f.supplyProtection.basis],
      ['Main disconnect', `${f.mainDisconnect.sizeAmps} A (min ${fmt(f.mainDisconnect.minAmps, 2)} A)`, f.mainDisconnect.basis],
    ],
  );
  for (const warn of data.nameplate.warnings) w.para(`Note: ${warn}`, 8);

  // Motors at another voltage than the supply
  const other = sourcesSummary(data.rollup);
  if (other.lines.length > 0) {
    w.heading('Motors at another voltage');
    for (const line of other.lines) w.para(line);
    for (const src of other.sources) {
      w.table(
        ['Item', 'Value', 'Basis'],
        [0.25, 0.35, 0.4],
        [
          [src.tag, src.kind === 'transformer' ? `${src.kva} kVA ${src.primaryVolts}-${src.secondaryLabel} (load ${fmt(src.loadKva, 2)} kVA)` : `${src.secondaryLabel}, >= ${fmt(src.secondaryAmps, 2)} A`, src.basis],
          ['Primary protection', `${src.primaryProtection.ratingAmps} A (limit ${fmt(src.primaryProtection.maxAmps, 2)} A)`, src.primaryProtection.basis],
          ...(src.secondaryProtection ? [['Secondary protection', `${src.secondaryProtection.ratingAmps} A (limit ${fmt(src.secondaryProtection.maxAmps, 2)} A)`, src.secondaryProtection.basis]] : []),
        ],
      );
    }
  }

  // SCCR worksheet
  w.heading('Short-circuit current rating worksheet');
  w.para(data.sccr.basis, 8);
  w.table(
    ['Location', 'Component', 'Type', 'Rating kA', 'Source', 'Basis'],
    [0.1, 0.2, 0.13, 0.09, 0.12, 0.36],
    data.sccr.rows.map((r) => [
      r.location,
      `${r.code} ${r.description}${r.limiting ? ' (LIMITING)' : ''}`,
      r.category,
      fmt(r.ratingKa, 2),
      r.source,
      r.basis,
    ]),
    (i) => data.sccr.rows[i].limiting,
  );
  w.para(
    `Panel SCCR: ${data.sccr.panelSccrKa === null ? 'not established' : `${fmt(data.sccr.panelSccrKa, 2)} kA`}. ` +
      `Available fault current: ${data.sccr.availableFaultKa === null ? 'not given' : `${data.sccr.availableFaultKa} kA`}. ` +
      `Verdict: ${data.sccr.verdict} (NEC 409.22).`,
    10,
  );
  if (data.signOff?.acknowledged) {
    const a = data.signOff.acknowledged;
    w.para(`Signed off ${data.signOff.revision} with this rating. Finding: ${a.finding}. Reason given by ${a.by}: ${a.reason}`, 10);
  }
  for (const n of data.sccr.notes) w.para(n, 8);
  if (data.sccr.waysOut.length > 0) {
    w.sub('Ways out');
    w.table(
      ['Change', 'Resulting SCCR kA', 'Resolves', 'Cost difference'],
      [0.55, 0.15, 0.1, 0.2],
      data.sccr.waysOut.map((o) => [o.description, fmt(o.resultingSccrKa, 2), o.resolves ? 'yes' : 'no', o.costDifference === null ? '-' : fmt(o.costDifference, 2)]),
    );
  }

  // Heat
  const h = data.heat;
  w.heading('Heat calculation');
  w.para(h.basis, 8);
  w.table(
    ['Face', 'Area m²', 'Factor b', 'Effective m²'],
    [0.25, 0.25, 0.25, 0.25],
    h.faces.map((x) => [x.face, fmt(x.areaM2, 3), String(x.factor), fmt(x.effectiveM2, 3)]),
  );
  w.table(
    ['Bucket', 'Part', 'Loss W', 'Basis'],
    [0.15, 0.3, 0.12, 0.43],
    h.sources.map((x) => [x.bucketTag ?? 'Panel', `${x.code} ${x.description}`, fmt(x.watts), x.basis]),
  );
  w.sub('Heat by bucket');
  const maxW = Math.max(1, ...h.byBucket.map((b) => b.watts));
  for (const b of h.byBucket) {
    w.ensure(16);
    const y = doc.y;
    doc.font(regular).fontSize(8).fillColor(SLATE).text(pdfSafe(b.bucketTag), MARGIN, y + 2, { width: 90 });
    doc.rect(MARGIN + 95, y, Math.max(1, (b.watts / maxW) * (w.width - 170)), 10).fill(COPPER);
    doc.font(regular).fontSize(8).fillColor(SLATE).text(`${fmt(b.watts)} W`, MARGIN + w.width - 70, y + 2, { width: 70, align: 'right' });
    doc.x = MARGIN;
    doc.y = y + 14;
  }
  w.kv([
    ['Total losses', `${fmt(h.totalLossW)} W`],
    ['Effective cooling surface Ae', `${fmt(h.aeM2, 3)} m²`],
    ['Temperature rise', `${fmt(h.deltaTK)} K = P / (k x Ae), k = ${h.k} W/(m² K)`],
    ['Internal temperature', `${fmt(h.internalTempC)} °C at ${h.ambientC} °C ambient (limit ${h.internalLimitC} °C)`],
    ['Verdict', h.exceeded ? 'limit exceeded: cooling needed' : 'within the limit'],
    ...(h.cooling
      ? ([
          ['Excess heat', `${fmt(h.cooling.excessW)} W (${h.cooling.basis})`],
          ['Filter fan', h.cooling.fan ? `${fmt(h.cooling.fan.cfm)} cfm (${fmt(h.cooling.fan.m3h)} m³/h); ${h.cooling.fan.basis}` : 'a fan cannot cool below the ambient'],
          ['Air conditioner', `${fmt(h.cooling.airConditionerW)} W`],
        ] as Array<[string, string]>)
      : []),
  ]);
  for (const n of h.notes) w.para(n, 8);

  // Control power
  const cp = data.controlPower;
  w.heading('Control power transformer');
  w.kv([
    ['Sealed VA', fmt(cp.sealedVa)],
    ['Inrush VA', fmt(cp.inrushVa)],
    ['Selection VA = sqrt(sealed² + inrush²)', fmt(cp.selectionVa)],
    ['Transformer size', `${cp.sizeVa} VA (inrush capacity ${cp.inrushCapacityVa} VA at 40 % PF: ${cp.inrushOk ? 'OK' : 'NOT OK'})`],
    ['Primary protection', `${cp.primary.ratingAmps} A (${fmt(cp.primary.currentA, 3)} A x ${cp.primary.maxPercent} % = ${fmt(cp.primary.maxAmps, 3)} A) - ${cp.primary.basis}`],
    ['Secondary protection', `${cp.secondary.ratingAmps} A (${fmt(cp.secondary.currentA, 3)} A x ${cp.secondary.maxPercent} % = ${fmt(cp.secondary.maxAmps, 3)} A) - ${cp.secondary.basis}`],
  ]);
  for (const n of [...cp.basis, ...cp.notes]) w.para(n, 8);

  // Control-circuit conductors (430.72(A), (B), Table 430.72(B))
  const cc = data.controlConductors;
  if (cc) {
    w.heading('Control-circuit conductors');
    w.table(
      ['Bucket', 'Conductor', 'Protected by', 'Table 430.72(B)', 'Max (A)', 'Verdict'],
      [0.14, 0.14, 0.3, 0.16, 0.1, 0.16],
      cc.rows.map((r) => [r.bucket, `${r.conductor} ${r.material === 'cu' ? 'Cu' : 'Al'}`, `${r.device.kind}${r.device.amps !== null ? ` ${r.device.amps} A` : ''}`, `column ${r.column}`, r.maxAmps === null ? '-' : String(r.maxAmps), r.ok === null ? 'not checked' : r.ok ? 'OK' : 'TOO SMALL']),
    );
    for (const f of cc.findings) w.para(`- ${f}`, 9);
    w.para(cc.basis, 8);
  }

  // Connection cards
  w.heading('Motor connection cards');
  for (const { tag, card } of data.connectionCards) {
    w.sub(`${tag}: ${card.title}`);
    for (const st of card.steps) {
      const lines = LINES.filter((l) => st.lineGroups[l]);
      w.table(
        [st.label, ...lines],
        [0.25, ...lines.map(() => 0.75 / lines.length)],
        [
          ['Leads', ...lines.map((l) => st.lineGroups[l]!.join(', '))],
          ...(st.joined.length ? [['Join', st.joined.map((g) => g.join('-')).join('  '), ...lines.slice(1).map(() => '')]] : []),
          ...(st.insulated.length ? [['Insulate', st.insulated.join(', '), ...lines.slice(1).map(() => '')]] : []),
        ],
      );
    }
    w.para(`To reverse: ${card.reverse}`);
    for (const c of card.cautions) w.para(`- ${c}`, 8);
    w.para(`${card.basis}. ${card.notes.join(' ')}`, 8);
  }

  if (data.drawings) {
    writeDrawingPages(doc, data.drawings, { regular, bold });
    doc.y = MARGIN;
  }

  // Cautions
  w.heading('Cautions');
  for (const c of SUBMITTAL_CAUTIONS) w.para(`- ${c}`, 10);

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
