// The panel submittal as PDF (pdfkit): cover, load schedule, protection summary with citations,
// one-lines (as text chains), nameplate and feeder, SCCR worksheet, heat calculation, control power,
// motor connection cards and the cautions.
import { createRequire } from 'node:module';
import fs from 'node:fs';
import PDFDocument from 'pdfkit';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import type { SccrResult } from '../../../shared/calc/sccr';
import type { HeatResult } from '../../../shared/calc/heat';
import type { ControlPowerResult } from '../../../shared/calc/control-power';
import type { NameplateResult } from '../../../shared/calc/nameplate';
import type { ConnectionCard, LineName } from '../../../shared/calc/connections';
import { relayOf, relayWiringText } from '../../../shared/calc/overload';
import { perWindingText } from '../../../shared/calc/scpd';
import { motorLeadText, voltageDropText } from '../../../shared/calc/conductor';
import { unbalanceText } from '../../../shared/standards/nema-mg1-voltage-unbalance';
import { SCPD_WORDS } from '../../../shared/calc/scpd';
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
  panel: { name: string; revision: string; /** ISO date */ date: string; enclosureType: string; shopName?: string };
  selections: LoadSelection[];
  rollup: PanelRollup;
  nameplate: NameplateResult;
  sccr: SccrResult;
  /** the signed-off revision this submittal shows, with the engineer's acknowledgement of a rating below the site's fault current */
  signOff?: { revision: string; date: string; acknowledged: { finding: string; by: string; reason: string } | null };
  heat: HeatResult;
  controlPower: ControlPowerResult;
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
    if (this.doc.y + h > this.doc.page.height - MARGIN) this.doc.addPage();
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
      if (this.doc.y + h > this.doc.page.height - MARGIN) this.doc.addPage();
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
    rows.forEach((r, i) => drawRow(r, highlight?.(i) ? this.bold : this.regular, highlight?.(i) ? '#f3e3d3' : undefined));
    this.doc.moveDown(0.3);
  }
}

function starterText(s: LoadSelection): string {
  return `${s.starter.type}${s.starter.nemaSize !== null ? ` size ${s.starter.nemaSize}` : ''}`;
}


/** The one-line of a bucket as a text chain, supply to motor. */
export function oneLineText(s: LoadSelection): string {
  const parts: string[] = [`Disconnect >= ${s.disconnect.minAmps} A`, `${s.scpd.ratingAmps} A ${SCPD_WORDS[s.scpd.type]}`];
  if (s.starter.type === 'VFD' || s.starter.type === 'dc-drive') parts.push(s.vfd ? `drive >= ${s.vfd.minOutputAmps} A` : 'drive');
  else if (s.starter.type === 'RVSS') parts.push(`soft starter${s.softStarter ? ` >= ${s.softStarter.minAmps} A${s.softStarter.bypass ? ' with bypass' : ''}` : ''}`);
  else parts.push(`${s.starter.reversingContactors ? 'reversing contactors' : 'contactor'} (${starterText(s)})`);
  if (!s.overload.providedByDrive) parts.push(`overload class ${s.overload.tripClass}, ${relayWiringText(s) ?? `max ${s.overload.maxSettingAmps} A`}`);
  if (s.relays.phaseReversal) parts.push('phase-sequence relay (47)');
  if (s.relays.phaseLoss && !s.relays.phaseLossByOverload) parts.push('phase-loss relay');
  parts.push(`motor ${s.tag}${s.hp !== null ? ` ${s.hp} hp` : ''} ${s.volts} V`);
  return parts.join(' -> ');
}

const LINES: LineName[] = ['L1', 'L2', 'L3', 'A+', 'A-'];

/** Write the submittal to the stream; resolves when the stream has the whole document. */
export function writeSubmittalPdf(
  data: SubmittalData,
  stream: NodeJS.WritableStream,
  options: SubmittalPdfOptions = {},
): Promise<{ font: 'Barlow' | 'Helvetica' }> {
  const doc = new PDFDocument({
    size: 'LETTER',
    margin: MARGIN,
    compress: options.compress ?? true,
    info: { Title: `Submittal ${data.job.number} ${data.panel.name} ${data.panel.revision}`, Author: data.panel.shopName ?? 'Panelwright' },
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
  doc.font(regular).fontSize(11).fillColor(COPPER).text(pdfSafe(data.panel.shopName ?? '[Shop name]'), MARGIN, 74);
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
    ...(data.signOff ? [['Signed off', `${data.signOff.revision} on ${data.signOff.date}`] as [string, string]] : []),
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
          `${s.conductor.size} ${s.conductor.material}, ${s.conductor.ampacity} A (min ${fmt(s.conductor.minAmpacity)} A)${motorLeadText(s) ? `; ${motorLeadText(s)}` : ''}${voltageDropText(s) ? `; ${voltageDropText(s)}` : ''}`,
          s.conductor.motorLeads ? `line side: ${s.conductor.basis}; ${s.conductor.motorLeads.basis}` : s.conductor.basis,
        ],
        ...(s.unbalance
          ? [['Voltage unbalance', unbalanceText(s.unbalance), s.unbalance.basis]]
          : []),
        ['Disconnect', `>= ${fmt(s.disconnect.minAmps)} A${s.disconnect.minHp !== null ? `, >= ${s.disconnect.minHp} hp` : ''}`, s.disconnect.basis],
      ],
    );
    for (const a of s.assumed) w.para(`Assumed input: ${a.field} = ${a.assumed} (${a.note})`, 8);
    for (const c of s.cautions) w.para(`Caution: ${c}`, 8);
  }

  // One-lines
  w.heading('One-line diagrams');
  for (const s of data.selections) {
    w.sub(s.tag);
    w.para(oneLineText(s));
  }

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

  doc.end();
  return done;
}
