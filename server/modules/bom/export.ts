// Bill-of-materials export: a formatted .xlsx, streamed with exceljs' WorkbookWriter (the CSV is export-csv.ts).
// The workbook keeps real formulas for extended costs and totals so the estimator can go on working in it;
// every text is written as a string cell (never a formula), and control characters XML cannot carry are dropped.
import type { Writable } from 'node:stream';
import ExcelJS from 'exceljs';
import { CATEGORY_LABELS, type BomCategory, type BomLine } from '../../../shared/schemas/catalogue';
import { computeTotals, extendedCost, extendedLabourHours, rollupByCode } from '../../../shared/calc/bom';
import { xmlSafe } from '../catalogue/spreadsheet';

export interface BomExportJob {
  number: string;
  name: string;
  customer?: string;
  /** e.g. "R1"; shown in the titles */
  revision?: string;
  markupPercent: number;
  labourRatePerHour: number;
}
export interface BomExportPanel {
  name: string;
  lines: BomLine[];
}

const MONEY = '#,##0.00';
const HOURS = '#,##0.00';
const QTY = '#,##0';
const PERCENT = '0.0';

const SUMMARY = 'Summary';
const ROLLUP = 'Roll-up by part';

const categoryLabel = (c: BomCategory): string =>
  c in CATEGORY_LABELS ? CATEGORY_LABELS[c as keyof typeof CATEGORY_LABELS] : c[0]!.toUpperCase() + c.slice(1);

/** A text for a cell: always a string value, never a formula. */
const text = (s: string | null | undefined): string => xmlSafe(s ?? '');

/** Sheet names: ≤ 31 characters, none of []:*?/\, unique (case-insensitive), not the fixed sheets' names. */
export function sheetNames(panelNames: readonly string[]): string[] {
  const used = new Set([SUMMARY.toLowerCase(), ROLLUP.toLowerCase()]);
  return panelNames.map((raw, i) => {
    let base =
      xmlSafe(raw)
        .replace(/[[\]:*?/\\]/g, '-')
        .replace(/^'+|'+$/g, '')
        .trim() || `Panel ${i + 1}`;
    base = base.slice(0, 31);
    let name = base;
    for (let n = 2; used.has(name.toLowerCase()); n++) {
      const suffix = ` (${n})`;
      name = base.slice(0, 31 - suffix.length) + suffix;
    }
    used.add(name.toLowerCase());
    return name;
  });
}

const ref = (sheet: string, cell: string): string => `'${sheet.replace(/'/g, "''")}'!${cell}`;

/** Row layout of one panel sheet, computed before writing so the summary can point at its totals. */
interface PanelLayout {
  sheet: string;
  groups: Array<{ bucket: string; headerRow: number; firstRow: number; lastRow: number; subtotalRow: number; lines: BomLine[] }>;
  firstRow: number;
  lastRow: number;
  materialRow: number;
  hoursRow: number;
  labourCostRow: number;
  costRow: number;
  markupRow: number;
  sellRow: number;
}

const PANEL_HEADER_ROW = 4;

function layoutPanel(sheet: string, lines: readonly BomLine[]): PanelLayout {
  const byBucket = new Map<string, BomLine[]>();
  for (const l of lines) {
    const g = byBucket.get(l.bucket);
    if (g) g.push(l);
    else byBucket.set(l.bucket, [l]);
  }
  let row = PANEL_HEADER_ROW + 1;
  const firstRow = row;
  const groups: PanelLayout['groups'] = [];
  for (const [bucket, ls] of byBucket) {
    const headerRow = row++;
    const first = row;
    row += ls.length;
    groups.push({ bucket, headerRow, firstRow: first, lastRow: row - 1, subtotalRow: row++, lines: ls });
  }
  const lastRow = Math.max(firstRow, row - 1);
  row++;
  return {
    sheet,
    groups,
    firstRow,
    lastRow,
    materialRow: row,
    hoursRow: row + 1,
    labourCostRow: row + 2,
    costRow: row + 3,
    markupRow: row + 4,
    sellRow: row + 5,
  };
}

const PANEL_COLUMNS: Array<{ header: string; width: number }> = [
  { header: 'Bucket', width: 12 },
  { header: 'Category', width: 22 },
  { header: 'Code', width: 20 },
  { header: 'Description', width: 56 },
  { header: 'Qty', width: 8 },
  { header: 'Unit', width: 6 },
  { header: 'Unit cost', width: 12 },
  { header: 'Extended cost', width: 14 },
  { header: 'Labour h / unit', width: 10 },
  { header: 'Labour h', width: 10 },
  { header: 'Status', width: 10 },
  { header: 'Source', width: 9 },
  { header: 'Needs / reason', width: 48 },
];

/**
 * Write a job's (or one panel's) bill of materials as .xlsx to `stream`:
 * "Summary" (a row per panel pointing at its totals, job totals, labour rate and markup to edit),
 * one sheet per panel grouped by bucket with subtotals, and "Roll-up by part" for purchasing.
 */
type Workbook = InstanceType<typeof ExcelJS.stream.xlsx.WorkbookWriter>;

/** The job title every sheet carries. */
const jobTitle = (job: BomExportJob): string => `Job ${job.number} — ${job.name}${job.revision ? ` — ${job.revision}` : ''}`;

/** Cells of the summary that the panel sheets refer to. */
const RATE = '$B$3';
const MARKUP = '$D$3';

/**
 * Write a job's (or one panel's) bill of materials as .xlsx to `stream`:
 * "Summary" (a row per panel pointing at its totals, job totals, labour rate and markup to edit),
 * one sheet per panel grouped by bucket with subtotals, and "Roll-up by part" for purchasing.
 */
export async function writeBomWorkbook(job: BomExportJob, panels: readonly BomExportPanel[], stream: Writable): Promise<void> {
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream, useStyles: true, useSharedStrings: false });
  wb.creator = 'Panelwright';
  const names = sheetNames(panels.map((p) => p.name));
  const layouts = panels.map((p, i) => layoutPanel(names[i]!, p.lines));
  const jobLines = panels.flatMap((p) => p.lines);
  writeSummarySheet(wb, job, panels, layouts, jobLines);
  for (const [i, p] of panels.entries()) writePanelSheet(wb, job, p, layouts[i]!);
  writeRollupSheet(wb, job, jobLines);
  await wb.commit();
}

/** "Summary": a row per panel pointing at its sheet's totals, the job total, and the rate and markup to edit. */
function writeSummarySheet(
  wb: Workbook,
  job: BomExportJob,
  panels: readonly BomExportPanel[],
  layouts: readonly PanelLayout[],
  jobLines: readonly BomLine[],
): void {
  const title = jobTitle(job);
  const sum = wb.addWorksheet(SUMMARY, { views: [{ state: 'frozen', ySplit: 5 }] });
  sum.columns = [{ width: 30 }, { width: 14 }, { width: 12 }, { width: 14 }, { width: 14 }, { width: 14 }, { width: 14 }, { width: 12 }];
  const t1 = sum.addRow([text(`Bill of materials — ${title}`)]);
  t1.font = { bold: true, size: 14 };
  t1.commit();
  sum.addRow([text(job.customer ? `Customer: ${job.customer}` : '')]).commit();
  const rateRow = sum.addRow(['Labour rate per hour', job.labourRatePerHour, 'Markup %', job.markupPercent]);
  rateRow.getCell(2).numFmt = MONEY;
  rateRow.getCell(4).numFmt = PERCENT;
  rateRow.commit();
  sum.addRow([]).commit();
  const sh = sum.addRow(['Panel', 'Material', 'Labour h', 'Labour cost', 'Cost', 'Markup', 'Sell', 'Unmatched']);
  sh.font = { bold: true };
  sh.commit();
  const firstPanelRow = 6;
  panels.forEach((p, i) => {
    const L = layouts[i]!;
    const t = computeTotals(p.lines, job.markupPercent, job.labourRatePerHour);
    const r = sum.addRow([text(p.name)]);
    r.getCell(2).value = { formula: ref(L.sheet, `H${L.materialRow}`), result: t.materialCost };
    r.getCell(3).value = { formula: ref(L.sheet, `H${L.hoursRow}`), result: t.labourHours };
    r.getCell(4).value = { formula: ref(L.sheet, `H${L.labourCostRow}`), result: t.labourCost };
    r.getCell(5).value = { formula: ref(L.sheet, `H${L.costRow}`), result: t.cost };
    r.getCell(6).value = { formula: ref(L.sheet, `H${L.markupRow}`), result: t.markup };
    r.getCell(7).value = { formula: ref(L.sheet, `H${L.sellRow}`), result: t.sell };
    r.getCell(8).value = t.unmatchedLines;
    for (const c of [2, 4, 5, 6, 7]) r.getCell(c).numFmt = MONEY;
    r.getCell(3).numFmt = HOURS;
    r.commit();
  });
  const lastPanelRow = firstPanelRow + panels.length - 1;
  const jt = computeTotals(jobLines, job.markupPercent, job.labourRatePerHour);
  const tr = sum.addRow(['Job total']);
  tr.font = { bold: true };
  const span = (col: string) => (panels.length > 0 ? `SUM(${col}${firstPanelRow}:${col}${lastPanelRow})` : '0');
  tr.getCell(2).value = { formula: span('B'), result: jt.materialCost };
  tr.getCell(3).value = { formula: span('C'), result: jt.labourHours };
  tr.getCell(4).value = { formula: span('D'), result: jt.labourCost };
  tr.getCell(5).value = { formula: span('E'), result: jt.cost };
  tr.getCell(6).value = { formula: span('F'), result: jt.markup };
  tr.getCell(7).value = { formula: span('G'), result: jt.sell };
  tr.getCell(8).value = { formula: span('H'), result: jt.unmatchedLines };
  for (const c of [2, 4, 5, 6, 7]) tr.getCell(c).numFmt = MONEY;
  tr.getCell(3).numFmt = HOURS;
  tr.commit();
  sum.addRow([]).commit();
  sum
    .addRow([
      text("Results support, not replace, a qualified person's design. Prices are the shop's catalogue prices frozen on each line."),
    ])
    .commit();
  sum.commit();
}

/** One panel's sheet: its lines grouped by bucket with subtotals, then the panel's totals as formulas. */
function writePanelSheet(wb: Workbook, job: BomExportJob, p: BomExportPanel, L: PanelLayout): void {
  const title = jobTitle(job);
  const t = computeTotals(p.lines, job.markupPercent, job.labourRatePerHour);
  const ws = wb.addWorksheet(L.sheet, { views: [{ state: 'frozen', ySplit: PANEL_HEADER_ROW }] });
  ws.columns = PANEL_COLUMNS.map((c) => ({ width: c.width }));
  const h1 = ws.addRow([text(`${p.name} — bill of materials`)]);
  h1.font = { bold: true, size: 13 };
  h1.commit();
  const h2 = ws.addRow(['Labour rate per hour', null, 'Markup %', null, text(title)]);
  h2.getCell(2).value = { formula: ref(SUMMARY, RATE), result: job.labourRatePerHour };
  h2.getCell(2).numFmt = MONEY;
  h2.getCell(4).value = { formula: ref(SUMMARY, MARKUP), result: job.markupPercent };
  h2.getCell(4).numFmt = PERCENT;
  h2.commit();
  ws.addRow([]).commit();
  const hr = ws.addRow(PANEL_COLUMNS.map((c) => c.header));
  hr.font = { bold: true };
  hr.border = { bottom: { style: 'thin' } };
  hr.commit();
  for (const g of L.groups) {
    const gh = ws.addRow([text(g.bucket === '(panel)' ? 'Panel items' : `Bucket ${g.bucket}`)]);
    gh.font = { bold: true };
    gh.commit();
    let r = g.firstRow;
    for (const l of g.lines) {
      const row = ws.addRow([
        text(l.bucket),
        text(categoryLabel(l.category)),
        l.code ? text(l.code) : null,
        text(l.description),
        l.quantity,
        l.unit,
        l.unitCost,
        { formula: `ROUND(E${r}*G${r},2)`, result: extendedCost(l) },
        l.unitLabourHours,
        { formula: `ROUND(E${r}*I${r},4)`, result: extendedLabourHours(l) },
        l.status,
        l.source,
        text(l.status === 'unmatched' ? l.requiredRatings : l.source === 'swapped' ? l.swapReason : l.requiredRatings),
      ]);
      row.getCell(5).numFmt = l.unit === 'ft' || Number.isInteger(l.quantity) ? QTY : '#,##0.00';
      row.getCell(7).numFmt = MONEY;
      row.getCell(8).numFmt = MONEY;
      row.getCell(9).numFmt = '0.000';
      row.getCell(10).numFmt = HOURS;
      if (l.status === 'unmatched') row.getCell(11).font = { bold: true };
      row.commit();
      r++;
    }
    const st = ws.addRow([null, null, null, text(`Subtotal ${g.bucket === '(panel)' ? 'panel items' : g.bucket}`)]);
    const gt = computeTotals(g.lines, 0, 0);
    st.getCell(8).value = { formula: `SUBTOTAL(9,H${g.firstRow}:H${g.lastRow})`, result: gt.materialCost };
    st.getCell(10).value = { formula: `SUBTOTAL(9,J${g.firstRow}:J${g.lastRow})`, result: gt.labourHours };
    st.getCell(8).numFmt = MONEY;
    st.getCell(10).numFmt = HOURS;
    st.font = { italic: true };
    st.commit();
  }
  ws.addRow([]).commit();
  const range = (col: string) => `${col}${L.firstRow}:${col}${L.lastRow}`;
  const totalRows: Array<[string, ExcelJS.CellFormulaValue, string]> = [
    ['Material', { formula: `SUBTOTAL(9,${range('H')})`, result: t.materialCost }, MONEY],
    ['Labour hours', { formula: `SUBTOTAL(9,${range('J')})`, result: t.labourHours }, HOURS],
    ['Labour cost', { formula: `ROUND(H${L.hoursRow}*$B$2,2)`, result: t.labourCost }, MONEY],
    ['Cost (material + labour)', { formula: `H${L.materialRow}+H${L.labourCostRow}`, result: t.cost }, MONEY],
    ['Markup', { formula: `ROUND(H${L.costRow}*$D$2/100,2)`, result: t.markup }, MONEY],
    ['Sell', { formula: `H${L.costRow}+H${L.markupRow}`, result: t.sell }, MONEY],
  ];
  for (const [label, f, fmt] of totalRows) {
    const row = ws.addRow([null, null, null, label]);
    row.getCell(8).value = f;
    row.getCell(8).numFmt = fmt;
    row.font = { bold: true };
    row.commit();
  }
  ws.commit();
}

/** "Roll-up by part": one row per part code over the whole job, for purchasing. */
function writeRollupSheet(wb: Workbook, job: BomExportJob, jobLines: readonly BomLine[]): void {
  const title = jobTitle(job);
  const jt = computeTotals(jobLines, job.markupPercent, job.labourRatePerHour);
  const ru = wb.addWorksheet(ROLLUP, { views: [{ state: 'frozen', ySplit: 3 }] });
  ru.columns = [
    { width: 20 },
    { width: 56 },
    { width: 22 },
    { width: 6 },
    { width: 10 },
    { width: 12 },
    { width: 14 },
    { width: 40 },
    { width: 48 },
  ];
  const r1 = ru.addRow([text(`Roll-up by part code — ${title}`)]);
  r1.font = { bold: true, size: 13 };
  r1.commit();
  ru.addRow([]).commit();
  const rh = ru.addRow(['Code', 'Description', 'Category', 'Unit', 'Qty', 'Unit cost', 'Extended cost', 'Buckets', 'Needs (unmatched)']);
  rh.font = { bold: true };
  rh.commit();
  const roll = rollupByCode(jobLines);
  let rr = 4;
  for (const g of roll) {
    const row = ru.addRow([
      g.code ? text(g.code) : null,
      text(g.description),
      text(categoryLabel(g.category)),
      g.unit,
      g.quantity,
      g.unitCost,
      { formula: `ROUND(E${rr}*F${rr},2)`, result: g.extendedCost },
      text(g.buckets.join(', ')),
      text(g.requiredRatings),
    ]);
    row.getCell(5).numFmt = Number.isInteger(g.quantity) ? QTY : '#,##0.00';
    row.getCell(6).numFmt = MONEY;
    row.getCell(7).numFmt = MONEY;
    row.commit();
    rr++;
  }
  const rt = ru.addRow([null, 'Total material']);
  rt.getCell(7).value = { formula: roll.length > 0 ? `SUM(G4:G${rr - 1})` : '0', result: jt.materialCost };
  rt.getCell(7).numFmt = MONEY;
  rt.font = { bold: true };
  rt.commit();
  ru.commit();
}
