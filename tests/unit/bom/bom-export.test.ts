// The exported bill of materials opened back with exceljs: sheets, cells, formulas, formats, neutralised text; and CSV.
import { PassThrough } from 'node:stream';
import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { sheetNames, writeBomWorkbook, type BomExportJob, type BomExportPanel } from '../../../server/modules/bom/export';
import { bomCsv, writeBomCsv } from '../../../server/modules/bom/export-csv';
import { buildBom, computeTotals, rollupByCode } from '../../../shared/calc/bom';
import type { BomLine } from '../../../shared/schemas/catalogue';
import { makePanel, makeSelection, seedCatalogue, seedLabourUnits, SUPPLY_480 } from './fixtures';

const job: BomExportJob = {
  number: 'J-2041',
  name: 'North basin pump station',
  customer: 'Eastfield Water Works (fictional)',
  revision: 'R1',
  markupPercent: 15,
  labourRatePerHour: 85,
};

const evil: BomLine[] = [
  {
    bucket: '(panel)',
    category: 'freight',
    code: null,
    description: '=HYPERLINK("http://example.invalid","x")',
    quantity: 1,
    unit: 'ea',
    unitCost: 150,
    unitLabourHours: 0,
    heatLossW: 0,
    sccrKa: null,
    status: 'manual',
    requiredRatings: null,
    source: 'manual',
    swapReason: null,
  },
  {
    bucket: '(panel)',
    category: 'other',
    code: null,
    description: '@SUM(A1:A2)',
    quantity: 2,
    unit: 'ea',
    unitCost: 10,
    unitLabourHours: 0.5,
    heatLossW: 0,
    sccrKa: null,
    status: 'manual',
    requiredRatings: null,
    source: 'manual',
    swapReason: null,
  },
  {
    bucket: '(panel)',
    category: 'spares',
    code: 'PW-FU-CC-TD-2A',
    description: '-spare fuses',
    quantity: 5,
    unit: 'ea',
    unitCost: 8.7,
    unitLabourHours: 0,
    heatLossW: 0,
    sccrKa: 200,
    status: 'matched',
    requiredRatings: null,
    source: 'swapped',
    swapReason: '+cmd|/c calc',
  },
  {
    bucket: '(panel)',
    category: 'other',
    code: null,
    description: '\tTab start\r',
    quantity: 1,
    unit: 'ea',
    unitCost: 0,
    unitLabourHours: 0,
    heatLossW: 0,
    sccrKa: null,
    status: 'manual',
    requiredRatings: null,
    source: 'manual',
    swapReason: null,
  },
];

function panels(): BomExportPanel[] {
  const common = {
    panel: makePanel(),
    supply: SUPPLY_480,
    enclosureType: '12',
    catalogue: seedCatalogue(),
    labourUnits: seedLabourUnits(),
  };
  const a = buildBom({
    panelName: 'MCC-1',
    selections: [makeSelection(), makeSelection({ tag: 'M-102', starter: { nemaSize: '7' } })],
    ...common,
  });
  const b = buildBom({ panelName: 'MCC-2', selections: [makeSelection({ tag: 'M-201', starter: { type: 'FVR' } })], ...common });
  return [
    { name: 'MCC-1', lines: [...a.lines, ...evil] },
    { name: 'MCC-2', lines: b.lines },
  ];
}

async function toBuffer(write: (s: PassThrough) => Promise<void>): Promise<Buffer> {
  const s = new PassThrough();
  const chunks: Buffer[] = [];
  s.on('data', (c: Buffer) => chunks.push(c));
  const ended = new Promise((r) => s.on('end', r));
  await write(s);
  await ended;
  return Buffer.concat(chunks);
}

describe('writeBomWorkbook', () => {
  const ps = panels();
  let wb: ExcelJS.Workbook;
  beforeAll(async () => {
    const buf = await toBuffer((s) => writeBomWorkbook(job, ps, s));
    wb = new ExcelJS.Workbook();
    await wb.xlsx.load(buf as unknown as ArrayBuffer);
  });

  const findRow = (ws: ExcelJS.Worksheet, col: number, text: string): number => {
    for (let r = 1; r <= ws.rowCount; r++) if (ws.getRow(r).getCell(col).value === text) return r;
    // XML may carry a CR as LF; match such a text without its line ends
    for (let r = 1; r <= ws.rowCount; r++) {
      const v = ws.getRow(r).getCell(col).value;
      if (typeof v === 'string' && v.replace(/[\r\n]/g, '') === text.replace(/[\r\n]/g, '')) return r;
    }
    throw new Error(`no row with ${text}`);
  };

  it('has a summary, one sheet per panel and a roll-up', () => {
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Summary', 'MCC-1', 'MCC-2', 'Roll-up by part']);
  });

  it('panel sheet: frozen header, bucket groups, extended-cost formulas with cached values', () => {
    const ws = wb.getWorksheet('MCC-1')!;
    expect(ws.views[0]).toMatchObject({ state: 'frozen', ySplit: 4 });
    // biome-ignore lint/suspicious/noSparseArray: exceljs numbers the cells of a row from 1, so slot 0 is empty
    expect(ws.getRow(4).values).toEqual([
      ,
      'Bucket',
      'Category',
      'Code',
      'Description',
      'Qty',
      'Unit',
      'Unit cost',
      'Extended cost',
      'Labour h / unit',
      'Labour h',
      'Status',
      'Source',
      'Needs / reason',
    ]);
    expect(ws.getCell('A5').value).toBe('Bucket M-101');
    expect(ws.getCell('C6').value).toBe('PW-CN-N1-120');
    expect(ws.getCell('E6').value).toBe(1);
    expect(ws.getCell('G6').value).toBe(96);
    expect(ws.getCell('G6').numFmt).toBe('#,##0.00');
    expect(ws.getCell('H6').formula).toBe('ROUND(E6*G6,2)');
    expect(ws.getCell('H6').result).toBe(96);
    expect(ws.getCell('J6').formula).toBe('ROUND(E6*I6,4)');
    expect(ws.getColumn(4).width).toBe(56);
  });

  it('bucket subtotals and panel totals are formulas that agree with computeTotals', () => {
    const ws = wb.getWorksheet('MCC-1')!;
    const t = computeTotals(ps[0]!.lines, 15, 85);
    const sub = findRow(ws, 4, 'Subtotal M-101');
    expect(ws.getCell(`H${sub}`).formula).toBe(`SUBTOTAL(9,H6:H${sub - 1})`);
    const m = findRow(ws, 4, 'Material');
    expect(ws.getCell(`H${m}`).formula).toMatch(/^SUBTOTAL\(9,H5:H\d+\)$/);
    expect(ws.getCell(`H${m}`).result).toBe(t.materialCost);
    expect(ws.getCell(`H${m + 1}`).result).toBe(t.labourHours);
    expect(ws.getCell(`H${m + 2}`).formula).toBe(`ROUND(H${m + 1}*$B$2,2)`);
    expect(ws.getCell(`H${m + 2}`).result).toBe(t.labourCost);
    expect(ws.getCell(`H${m + 3}`).formula).toBe(`H${m}+H${m + 2}`);
    expect(ws.getCell(`H${m + 4}`).formula).toBe(`ROUND(H${m + 3}*$D$2/100,2)`);
    expect(ws.getCell(`H${m + 5}`).formula).toBe(`H${m + 3}+H${m + 4}`);
    expect(ws.getCell(`H${m + 5}`).result).toBe(t.sell);
    expect(ws.getCell('B2').formula).toBe("'Summary'!$B$3");
  });

  it('the sum of extended-cost cells equals the material total', () => {
    const ws = wb.getWorksheet('MCC-2')!;
    let sum = 0;
    ws.eachRow((row) => {
      const h = row.getCell(8);
      if (typeof h.formula === 'string' && h.formula.startsWith('ROUND(E')) sum += h.result as number;
    });
    expect(sum).toBeCloseTo(computeTotals(ps[1]!.lines, 0).materialCost, 6);
  });

  it('unmatched lines carry their needs', () => {
    const ws = wb.getWorksheet('MCC-1')!;
    const r = findRow(ws, 11, 'unmatched');
    expect(ws.getCell(`C${r}`).value).toBeNull();
    expect(ws.getCell(`M${r}`).value).toBe('Contactors: NEMA size 7; coil 120 V; rated for 460 V');
  });

  it("summary rows point at each panel's totals; job totals are SUMs", () => {
    const ws = wb.getWorksheet('Summary')!;
    expect(ws.views[0]).toMatchObject({ state: 'frozen', ySplit: 5 });
    expect(ws.getCell('B3').value).toBe(85);
    expect(ws.getCell('D3').value).toBe(15);
    expect(ws.getCell('A6').value).toBe('MCC-1');
    const panelWs = wb.getWorksheet('MCC-1')!;
    const m = findRow(panelWs, 4, 'Material');
    expect(ws.getCell('B6').formula).toBe(`'MCC-1'!H${m}`);
    expect(ws.getCell('G6').formula).toBe(`'MCC-1'!H${m + 5}`);
    expect(ws.getCell('A8').value).toBe('Job total');
    expect(ws.getCell('B8').formula).toBe('SUM(B6:B7)');
    const all = computeTotals([...ps[0]!.lines, ...ps[1]!.lines], 15, 85);
    expect(ws.getCell('B8').result).toBe(all.materialCost);
    expect(ws.getCell('G8').result).toBe(all.sell);
    expect(ws.getCell('H8').result).toBe(1);
  });

  it('roll-up by part code with extended formulas and a SUM total', () => {
    const ws = wb.getWorksheet('Roll-up by part')!;
    const roll = rollupByCode([...ps[0]!.lines, ...ps[1]!.lines]);
    expect(ws.getCell('A4').value).toBe(roll[0]!.code);
    expect(ws.getCell('G4').formula).toBe('ROUND(E4*F4,2)');
    const contactor = findRow(ws, 1, 'PW-CN-N1-120');
    expect(ws.getCell(`E${contactor}`).value).toBe(3); // 1 in M-101 + 2 in M-201 (FVR)
    const total = 4 + roll.length;
    expect(ws.getCell(`G${total}`).formula).toBe(`SUM(G4:G${total - 1})`);
    expect(ws.getCell(`G${total}`).result).toBe(computeTotals([...ps[0]!.lines, ...ps[1]!.lines], 0).materialCost);
  });

  it('text beginning with =, +, -, @, tab or CR reads back as a string, never a formula', () => {
    const ws = wb.getWorksheet('MCC-1')!;
    const texts = ['=HYPERLINK("http://example.invalid","x")', '@SUM(A1:A2)', '-spare fuses', '\tTab start\r'];
    for (const t of texts) {
      const r = findRow(ws, 4, t);
      const cell = ws.getCell(`D${r}`);
      expect(cell.type).toBe(ExcelJS.ValueType.String);
      expect(cell.formula).toBeUndefined();
    }
    const swapped = findRow(ws, 4, '-spare fuses');
    expect(ws.getCell(`M${swapped}`).value).toBe('+cmd|/c calc');
    expect(ws.getCell(`M${swapped}`).type).toBe(ExcelJS.ValueType.String);
  });

  it('an empty job still gives a readable workbook with zero totals', async () => {
    const buf = await toBuffer((s) => writeBomWorkbook(job, [], s));
    const w = new ExcelJS.Workbook();
    await w.xlsx.load(buf as unknown as ArrayBuffer);
    expect(w.worksheets.map((x) => x.name)).toEqual(['Summary', 'Roll-up by part']);
  });
});

describe('sheetNames', () => {
  it('sanitises, truncates to 31 characters and de-duplicates', () => {
    expect(sheetNames(['MCC/1', 'MCC:1', 'summary', 'A'.repeat(40), "'quoted'"])).toEqual([
      'MCC-1',
      'MCC-1 (2)',
      'summary (2)',
      'A'.repeat(31),
      'quoted',
    ]);
  });
});

describe('CSV export', () => {
  const csv = bomCsv([{ name: 'MCC-1', lines: evil }]);
  it('neutralises formula-like text with a leading quote', () => {
    expect(csv).toContain(`"'=HYPERLINK(""http://example.invalid"",""x"")"`);
    expect(csv).toContain(`'@SUM(A1:A2)`);
    expect(csv).toContain(`'-spare fuses`);
    expect(csv).toContain(`'+cmd|/c calc`);
    expect(csv).toContain(`"'\tTab start\r"`);
  });
  it('numbers stay numbers and extended values are computed', () => {
    const row = csv.split('\r\n').find((l) => l.includes('spare fuses'))!;
    expect(row).toBe(`MCC-1,(panel),spares,PW-FU-CC-TD-2A,'-spare fuses,5,ea,8.7,43.5,0,0,matched,swapped,,'+cmd|/c calc`);
  });
  it('writeBomCsv streams the same text with a byte-order mark', async () => {
    const buf = await toBuffer((s) => writeBomCsv(job, [{ name: 'MCC-1', lines: evil }], s));
    expect(buf.toString('utf8')).toBe(`\uFEFF${csv}`);
  });
});
