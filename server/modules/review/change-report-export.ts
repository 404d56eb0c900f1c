// The change report between two signed-off revisions as a workbook, for the estimator's change-order
// price: the totals with their deltas, every bill-of-materials line added, removed or changed (cost and
// labour deltas as formulas over the before/after columns), and the decisions that moved motor by motor.
import ExcelJS from 'exceljs';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { compareRevisions } from './service';
import { requirePanel } from '../panels/service';
import { CHECK_CAUTIONS } from '../../../shared/schemas/checks';

const MONEY = '#,##0.00';

export async function changeReportWorkbook(actor: CurrentUser, panelId: number, from: number, to: number) {
  const p = await requirePanel(actor, panelId);
  const r = await compareRevisions(actor, panelId, from, to);
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Panelwright';
  wb.created = new Date();

  const sum = wb.addWorksheet('Summary');
  sum.columns = [{ width: 30 }, { width: 16 }, { width: 16 }, { width: 16 }];
  sum.addRow([`Change report R${from} → R${to}`]).font = { bold: true, size: 14 };
  sum.addRow([`Job ${p.job.number} ${p.job.name}, panel ${p.name}`]);
  sum.addRow([]);
  const head = sum.addRow(['', `R${from}`, `R${to}`, 'Change']);
  head.font = { bold: true };
  const totals: Array<[string, number, number]> = [
    ['Material cost', r.totals.from.materialCost, r.totals.to.materialCost],
    ['Labour hours', r.totals.from.labourHours, r.totals.to.labourHours],
    ['Sell price', r.totals.from.sell, r.totals.to.sell],
  ];
  for (const [label, a, b] of totals) {
    const row = sum.addRow([label, a, b]);
    row.getCell(4).value = { formula: `C${row.number}-B${row.number}`, result: Math.round((b - a) * 100) / 100 };
    for (const c of [2, 3, 4]) row.getCell(c).numFmt = label === 'Labour hours' ? '0.00' : MONEY;
  }
  sum.addRow([]);
  sum.addRow(['Motors added', r.motors.added.join(', ') || 'none']);
  sum.addRow(['Motors removed', r.motors.removed.join(', ') || 'none']);
  sum.addRow(['Motors with changed answers', r.motors.changed.join(', ') || 'none']);
  sum.addRow([]);
  for (const c of CHECK_CAUTIONS) sum.addRow([c]);

  const lines = wb.addWorksheet('Lines', { views: [{ state: 'frozen', ySplit: 1 }] });
  lines.columns = [
    { header: 'Change', width: 10 },
    { header: 'Bucket', width: 12 },
    { header: 'Part', width: 20 },
    { header: 'Description', width: 50 },
    { header: 'Qty before', width: 11 },
    { header: 'Qty after', width: 11 },
    { header: 'Cost before', width: 13 },
    { header: 'Cost after', width: 13 },
    { header: 'Cost change', width: 13 },
    { header: 'Labour h change', width: 14 },
  ];
  lines.getRow(1).font = { bold: true };
  const entries = [
    ...r.bom.added.map((e) => ['added', e] as const),
    ...r.bom.removed.map((e) => ['removed', e] as const),
    ...r.bom.changed.map((e) => ['changed', e] as const),
  ];
  for (const [kind, e] of entries) {
    const row = lines.addRow([
      kind,
      e.bucket,
      e.code ?? '',
      e.description,
      e.before?.quantity ?? 0,
      e.after?.quantity ?? 0,
      e.before?.extendedCost ?? 0,
      e.after?.extendedCost ?? 0,
    ]);
    row.getCell(9).value = { formula: `H${row.number}-G${row.number}`, result: e.costDelta };
    row.getCell(10).value = e.labourHoursDelta;
    for (const c of [7, 8, 9]) row.getCell(c).numFmt = MONEY;
  }
  if (entries.length) {
    const last = lines.rowCount;
    const total = lines.addRow(['Total', '', '', '', '', '', '', '']);
    total.font = { bold: true };
    total.getCell(9).value = { formula: `SUM(I2:I${last})`, result: r.bom.materialDelta };
    total.getCell(9).numFmt = MONEY;
    total.getCell(10).value = { formula: `SUM(J2:J${last})`, result: r.bom.labourHoursDelta };
  }

  const dec = wb.addWorksheet('Decisions', { views: [{ state: 'frozen', ySplit: 1 }] });
  dec.columns = [
    { header: 'Motor', width: 12 },
    { header: 'Decision', width: 30 },
    { header: `R${from}`, width: 24 },
    { header: `R${to}`, width: 24 },
  ];
  dec.getRow(1).font = { bold: true };
  for (const m of r.motors.decisions) for (const d of m.differences) dec.addRow([m.tag, d.label, d.from, d.to]);

  return { base: `${p.job.number}-${p.name}-R${from}-R${to}-changes`, buffer: Buffer.from(await wb.xlsx.writeBuffer()) };
}
