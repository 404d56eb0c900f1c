// Catalogue export → import round trips (.xlsx and .csv) and bad import files.
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import {
  catalogueToCsv,
  catalogueToXlsxBuffer,
  checkXlsxPackage,
  IMPORT_LIMITS,
  parseCatalogueFile,
} from '../../../server/modules/catalogue/spreadsheet';
import { CATALOGUE_HEADERS, type CatalogueItem } from '../../../shared/schemas/catalogue';
import { item, seedCatalogue } from './fixtures';
import { makeZip } from './zip';

const tricky: CatalogueItem[] = [
  item({
    code: 'PW-TEST-001',
    description: '=HYPERLINK("http://example.invalid","click")',
    category: 'pilot-device',
    ratings: { kind: 'push-button', function: 'start' },
    unitCost: 10,
    leadTimeDays: 1,
  }),
  item({
    code: 'PW-TEST-002',
    description: '-20 °C rated, "quoted", with comma',
    category: 'aux-contact',
    ratings: { contacts: '1NO' },
    unitCost: 1.5,
    leadTimeDays: 0,
    active: false,
  }),
  item({
    code: 'PW-TEST-003',
    description: '@SUM(1,2)\tand a tab',
    category: 'aux-contact',
    ratings: { contacts: '1NC' },
    unitCost: 0,
    leadTimeDays: 2,
  }),
  item({
    code: 'PW-TEST-004',
    description: '+1 line\nsecond line',
    category: 'aux-contact',
    ratings: { contacts: '1NO1NC' },
    unitCost: 3,
    leadTimeDays: 2,
    sccrKa: 5,
  }),
];

const csvOf = (rows: Array<Array<string | number>>) => Buffer.from(rows.map((r) => r.join(',')).join('\n'));
const validCsvRow = (code: string, unitCost: string | number = 9): Array<string | number> => {
  const row: Record<string, string | number> = {
    code,
    description: 'Auxiliary contact block',
    category: 'aux-contact',
    unit: 'ea',
    active: 'true',
    unitCost,
    labourHours: 0,
    terminations: 2,
    leadTimeDays: 2,
    heatLossW: 0,
    contacts: '1NO',
  };
  return CATALOGUE_HEADERS.map((h) => row[h] ?? '');
};

describe('round trip', () => {
  it('.xlsx export then import gives back the same catalogue', async () => {
    const items = [...seedCatalogue(), ...tricky];
    const buf = await catalogueToXlsxBuffer(items);
    const { rows, errors } = await parseCatalogueFile(buf, 'xlsx');
    expect(errors).toEqual([]);
    expect(rows).toEqual(items);
  });

  it('.csv export then import gives back the same catalogue', async () => {
    const items = [...seedCatalogue(), ...tricky];
    const { rows, errors } = await parseCatalogueFile(Buffer.from(catalogueToCsv(items)), 'csv');
    expect(errors).toEqual([]);
    expect(rows).toEqual(items);
  });

  it('formula-like text is a string cell in the .xlsx and quote-prefixed in the .csv', async () => {
    const buf = await catalogueToXlsxBuffer(tricky);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(buf as unknown as ArrayBuffer);
    const ws = wb.getWorksheet('Catalogue')!;
    const cell = ws.getRow(2).getCell(2);
    expect(cell.type).toBe(ExcelJS.ValueType.String);
    expect(cell.formula).toBeUndefined();
    expect(cell.value).toBe('=HYPERLINK("http://example.invalid","click")');
    expect(ws.views[0]).toMatchObject({ state: 'frozen', ySplit: 1 });
    const csv = catalogueToCsv(tricky);
    expect(csv).toContain(`"'=HYPERLINK(""http://example.invalid"",""click"")"`);
    expect(csv).toContain(`"'-20 °C rated, ""quoted"", with comma"`);
    expect(csv).toContain(`'@SUM(1`);
  });
});

describe('bad import files give clear errors and no rows', () => {
  it('an empty file', async () => {
    expect(await parseCatalogueFile(Buffer.alloc(0), 'csv')).toEqual({
      rows: [],
      errors: [{ row: 0, column: '', message: 'the file is empty' }],
    });
    expect((await parseCatalogueFile(Buffer.alloc(0), 'xlsx')).errors[0]!.message).toBe('the file is empty');
    expect((await parseCatalogueFile(Buffer.from('\n\n  \n'), 'csv')).errors[0]!.message).toMatch(/no header row/);
  });

  it('a header with no items', async () => {
    const r = await parseCatalogueFile(csvOf([CATALOGUE_HEADERS]), 'csv');
    expect(r.rows).toEqual([]);
    expect(r.errors).toEqual([{ row: 0, column: '', message: 'the file has a header but no items' }]);
  });

  it('wrong columns', async () => {
    const headers = CATALOGUE_HEADERS.map((h) => (h === 'code' ? 'kode' : h));
    const r = await parseCatalogueFile(csvOf([headers, validCsvRow('PW-AX-9')]), 'csv');
    expect(r.rows).toEqual([]);
    expect(r.errors.map((e) => [e.row, e.column])).toEqual([
      [1, 'kode'],
      [1, 'code'],
    ]);
    expect(r.errors[0]!.message).toMatch(/unknown column "kode"/);
    expect(r.errors[1]!.message).toBe('missing required column "code"');
  });

  it('bad numbers, by row and column', async () => {
    const bad = validCsvRow('PW-AX-8', 'twelve');
    const r = await parseCatalogueFile(csvOf([CATALOGUE_HEADERS, validCsvRow('PW-AX-7'), bad]), 'csv');
    expect(r.errors).toEqual([{ row: 3, column: 'unitCost', message: '"twelve" is not a number' }]);
    expect(r.rows.map((i) => i.code)).toEqual(['PW-AX-7']); // the caller writes nothing while errors is non-empty
  });

  it('a negative price and a missing rating are reported against their columns', async () => {
    const row = validCsvRow('PW-AX-6', -1);
    row[CATALOGUE_HEADERS.indexOf('contacts')] = '';
    const r = await parseCatalogueFile(csvOf([CATALOGUE_HEADERS, row]), 'csv');
    expect(r.errors.map((e) => [e.row, e.column])).toEqual([
      [2, 'unitCost'],
      [2, 'contacts'],
    ]);
  });

  it('duplicate codes', async () => {
    const r = await parseCatalogueFile(
      csvOf([CATALOGUE_HEADERS, validCsvRow('PW-AX-5'), validCsvRow('PW-AX-4'), validCsvRow('PW-AX-5')]),
      'csv',
    );
    expect(r.errors).toEqual([{ row: 4, column: 'code', message: 'duplicate code PW-AX-5 (first on row 2)' }]);
  });

  it('an unknown category', async () => {
    const row = validCsvRow('PW-AX-3');
    row[CATALOGUE_HEADERS.indexOf('category')] = 'gizmo';
    const r = await parseCatalogueFile(csvOf([CATALOGUE_HEADERS, row]), 'csv');
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toMatchObject({ row: 2, column: 'category' });
  });

  it('bad cells in an .xlsx are reported by row and column', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Catalogue');
    ws.addRow(CATALOGUE_HEADERS);
    ws.addRow(validCsvRow('PW-AX-2', 'abc'));
    ws.addRow(validCsvRow('PW-AX-2'));
    const buf = Buffer.from(await wb.xlsx.writeBuffer());
    const r = await parseCatalogueFile(buf, 'xlsx');
    expect(r.errors).toEqual([{ row: 2, column: 'unitCost', message: '"abc" is not a number' }]);
    // the first good PW-AX-2 is on row 3; nothing is written while errors exist
    expect(r.rows.map((i) => i.code)).toEqual(['PW-AX-2']);
  });

  it('a file that is not a spreadsheet', async () => {
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex');
    expect((await parseCatalogueFile(png, 'xlsx')).errors[0]!.message).toMatch(/not an \.xlsx workbook/);
    expect((await parseCatalogueFile(png, 'csv')).errors[0]!.message).toMatch(/binary/);
    const random = Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 7919 + 13) % 256));
    expect((await parseCatalogueFile(random, 'xlsx')).errors[0]!.message).toMatch(/not an \.xlsx workbook/);
    const xlsx = await catalogueToXlsxBuffer(tricky);
    expect((await parseCatalogueFile(xlsx, 'csv')).errors[0]!.message).toMatch(/\.xlsx workbook, not a CSV/);
  });

  it('a zip that is not a workbook', async () => {
    const zip = makeZip([{ name: 'readme.txt', data: Buffer.from('hello') }]);
    expect((await parseCatalogueFile(zip, 'xlsx')).errors[0]!.message).toBe('not an .xlsx workbook (a zip file without a workbook)');
  });

  it('a truncated workbook', async () => {
    const xlsx = await catalogueToXlsxBuffer(seedCatalogue());
    const r = await parseCatalogueFile(xlsx.subarray(0, Math.floor(xlsx.length / 2)), 'xlsx');
    expect(r.rows).toEqual([]);
    expect(r.errors[0]!.message).toMatch(/not an \.xlsx workbook/);
  });

  it('a workbook package with damaged XML fails fast instead of hanging', async () => {
    const zip = makeZip([
      { name: '[Content_Types].xml', data: Buffer.from('<?xml version="1.0"?><Types') },
      { name: 'xl/workbook.xml', data: Buffer.from('<<<not xml>>>') },
    ]);
    const t0 = Date.now();
    const r = await parseCatalogueFile(zip, 'xlsx');
    expect(Date.now() - t0).toBeLessThan(3000);
    expect(r.rows).toEqual([]);
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]!.message).toBe('the workbook could not be read (it is damaged or not an .xlsx file)');
  });
});

describe('zip bomb and size limits', () => {
  it('an entry that expands beyond its declared size is refused before exceljs sees it', () => {
    const zeros = Buffer.alloc(5 * 1024 * 1024); // deflates to a few kB
    const zip = makeZip([
      { name: '[Content_Types].xml', data: Buffer.from('<Types/>') },
      { name: 'xl/workbook.xml', data: zeros, declaredSize: 1000 },
    ]);
    expect(zip.length).toBeLessThan(64 * 1024);
    expect(checkXlsxPackage(zip)).toBe('workbook part xl/workbook.xml is damaged or expands beyond its declared size');
  });

  it('a package declaring more than the expansion limit is refused', async () => {
    const zip = makeZip([
      { name: '[Content_Types].xml', data: Buffer.from('<Types/>') },
      { name: 'xl/worksheets/sheet1.xml', data: Buffer.from('x'), declaredSize: IMPORT_LIMITS.maxExpandedBytes + 1 },
      { name: 'xl/workbook.xml', data: Buffer.from('<workbook/>') },
    ]);
    expect((await parseCatalogueFile(zip, 'xlsx')).errors[0]!.message).toMatch(/expands to more than 100 MB/);
  });

  it('too many parts', () => {
    const parts = Array.from({ length: IMPORT_LIMITS.maxZipEntries + 1 }, (_, i) => ({
      name: `p${i}`,
      data: Buffer.from('a'),
      stored: true,
    }));
    expect(checkXlsxPackage(makeZip(parts))).toMatch(/too many parts/);
  });

  it('a CSV with too many rows or columns', async () => {
    const rows = Buffer.from(`code\n${'x\n'.repeat(IMPORT_LIMITS.maxRows + 1)}`);
    expect((await parseCatalogueFile(rows, 'csv')).errors[0]!.message).toBe(`the file has more than ${IMPORT_LIMITS.maxRows} rows`);
    const cols = Buffer.from(Array.from({ length: IMPORT_LIMITS.maxColumns + 1 }, (_, i) => `c${i}`).join(','));
    expect((await parseCatalogueFile(cols, 'csv')).errors[0]!.message).toBe(`the file has more than ${IMPORT_LIMITS.maxColumns} columns`);
  });

  it('a file over the size limit', async () => {
    const big = Buffer.alloc(IMPORT_LIMITS.maxFileBytes + 1, 0x41);
    expect((await parseCatalogueFile(big, 'csv')).errors[0]!.message).toMatch(/larger than 10 MB/);
  });
});

describe('a CSV that ends inside a quoted field', () => {
  it('is refused with a row error and no rows', async () => {
    const { parseCatalogueFile } = await import('../../../server/modules/catalogue/spreadsheet');
    const { CATALOGUE_HEADERS } = await import('../../../shared/schemas/catalogue');
    const text = `${CATALOGUE_HEADERS.join(',')}\r\nPW-CN-N1-120,"Contactor, size 1\r\n`;
    const r = await parseCatalogueFile(Buffer.from(text), 'csv');
    expect(r.rows).toEqual([]);
    expect(r.errors.map((e) => e.message).join(' ')).toMatch(/ends inside a quoted field/);
  });
});
