// Catalogue import and export as .xlsx (exceljs) and .csv.
// An import returns the valid items and every problem by row and column; the caller writes nothing
// unless `errors` is empty (one transaction).
import { PassThrough, type Writable } from 'node:stream';
import { inflateRawSync } from 'node:zlib';
import { CsvError, parse } from 'csv-parse/sync';
import ExcelJS from 'exceljs';
import {
  CATALOGUE_COLUMNS,
  CATALOGUE_HEADERS,
  CATEGORIES,
  catalogueItemToRow,
  catalogueRowToItem,
  type CatalogueItem,
  type CatalogueRow,
} from '../../../shared/schemas/catalogue';

export interface ImportError {
  /** spreadsheet row number, 1-based; the header is row 1 (0 for a problem with the file itself) */
  row: number;
  /** column header, or '' for the whole row/file */
  column: string;
  message: string;
}
export interface ImportResult {
  rows: CatalogueItem[];
  errors: ImportError[];
}

export const IMPORT_LIMITS = {
  /** size of the uploaded file */
  maxFileBytes: 10 * 1024 * 1024,
  /** data rows (the header not counted) */
  maxRows: 20_000,
  maxColumns: 100,
  /** entries in an .xlsx package */
  maxZipEntries: 500,
  /** total expanded size of an .xlsx package */
  maxExpandedBytes: 100 * 1024 * 1024,
  /** give up on a workbook exceljs cannot read in this time */
  loadTimeoutMs: 20_000,
};

const CATALOGUE_SHEET = 'Catalogue';

// ------------------------------------------------------------------------------------------------
// Formula neutralisation (shared with the bill-of-materials export)

const FORMULA_START = /^[=+\-@\t\r]/;

/** Does a text value start like a formula (=, +, -, @, tab, CR) when a spreadsheet reads it? */
export function looksLikeFormula(text: string): boolean {
  return FORMULA_START.test(text);
}

/** For CSV: prefix a formula-like text with a single quote so a spreadsheet shows it as text. */
export function neutraliseCsvText(text: string): string {
  return looksLikeFormula(text) ? `'${text}` : text;
}

/** Undo neutraliseCsvText on import. */
export function unneutraliseCsvText(text: string): string {
  return text.length > 1 && text[0] === "'" && FORMULA_START.test(text.slice(1)) ? text.slice(1) : text;
}

/** Remove characters XML 1.0 cannot carry (they would corrupt the .xlsx). */
export function xmlSafe(text: string): string {
  // biome-ignore lint/suspicious/noControlCharactersInRegex: these are exactly the control characters XML 1.0 forbids
  return text.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g, '');
}

/** One CSV field: neutralised when it is text, quoted when needed (RFC 4180). */
export function csvField(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  const s = neutraliseCsvText(value);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

// ------------------------------------------------------------------------------------------------
// Export

/** Write the catalogue as .xlsx (streamed): a "Catalogue" sheet with one row per item, and a "Categories" sheet. */
export async function writeCatalogueXlsx(items: readonly CatalogueItem[], stream: Writable): Promise<void> {
  const wb = new ExcelJS.stream.xlsx.WorkbookWriter({ stream, useStyles: true, useSharedStrings: false });
  const ws = wb.addWorksheet(CATALOGUE_SHEET, { views: [{ state: 'frozen', ySplit: 1, xSplit: 1 }] });
  ws.columns = CATALOGUE_COLUMNS.map((c) => ({ key: c.header, width: c.width ?? 10 }));
  const header = ws.addRow(CATALOGUE_HEADERS);
  header.font = { bold: true };
  header.commit();
  for (const item of items) {
    const row = catalogueItemToRow(item);
    const r = ws.addRow(
      CATALOGUE_COLUMNS.map((c) => {
        const v = row[c.header];
        return typeof v === 'string' ? xmlSafe(v) : (v ?? null);
      }),
    );
    r.getCell('unitCost').numFmt = '#,##0.00';
    r.commit();
  }
  ws.commit();
  const cats = wb.addWorksheet('Categories', { views: [{ state: 'frozen', ySplit: 1 }] });
  cats.columns = [{ width: 26 }, { width: 48 }];
  const ch = cats.addRow(['category', 'label']);
  ch.font = { bold: true };
  ch.commit();
  for (const c of CATEGORIES) cats.addRow([c.id, c.label]).commit();
  cats.commit();
  await wb.commit();
}

export async function catalogueToXlsxBuffer(items: readonly CatalogueItem[]): Promise<Buffer> {
  const pass = new PassThrough();
  const chunks: Buffer[] = [];
  pass.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    pass.on('end', resolve);
    pass.on('error', reject);
  });
  await writeCatalogueXlsx(items, pass);
  await done;
  return Buffer.concat(chunks);
}

export function catalogueToCsv(items: readonly CatalogueItem[]): string {
  const lines = [CATALOGUE_HEADERS.map(csvField).join(',')];
  for (const item of items) {
    const row = catalogueItemToRow(item);
    lines.push(CATALOGUE_COLUMNS.map((c) => csvField(row[c.header])).join(','));
  }
  return `${lines.join('\r\n')}\r\n`;
}

// ------------------------------------------------------------------------------------------------
// Import

const fileError = (message: string): ImportResult => ({ rows: [], errors: [{ row: 0, column: '', message }] });

/** Parse an uploaded catalogue file. Never throws for bad input: every problem comes back in `errors`. */
export async function parseCatalogueFile(buffer: Buffer, kind: 'xlsx' | 'csv'): Promise<ImportResult> {
  if (!Buffer.isBuffer(buffer) || buffer.length === 0) return fileError('the file is empty');
  if (buffer.length > IMPORT_LIMITS.maxFileBytes)
    return fileError(`the file is larger than ${IMPORT_LIMITS.maxFileBytes / 1024 / 1024} MB`);
  const table: Table = kind === 'xlsx' ? await readXlsx(buffer) : readCsv(buffer);
  if (table.error) return fileError(table.error);
  return validateTable(table.cells, table.cellErrors ?? []);
}

interface Table {
  cells: CellValue[][];
  error?: string;
  /** unreadable cells: 0-based row and column */
  cellErrors?: Array<{ r: number; c: number; message: string }>;
}

type CellValue = string | number | boolean | null;

function validateTable(cells: CellValue[][], cellErrors: NonNullable<Table['cellErrors']>): ImportResult {
  const errors: ImportError[] = [];
  const isBlank = (r: CellValue[] | undefined) => !r || r.every((v) => v === null || (typeof v === 'string' && v.trim() === ''));
  if (cells.length === 0 || isBlank(cells[0])) return fileError('the file has no header row (the first row must name the columns)');
  const headers = cells[0]!.map((v) => (v === null ? '' : String(v).trim()));
  const known = new Set(CATALOGUE_HEADERS);
  const seen = new Map<string, number>();
  headers.forEach((h, i) => {
    if (h === '') return;
    if (!known.has(h))
      errors.push({
        row: 1,
        column: h,
        message: `unknown column "${h}" (expected columns: ${CATALOGUE_HEADERS.slice(0, 6).join(', ')} …)`,
      });
    if (seen.has(h)) errors.push({ row: 1, column: h, message: `column "${h}" appears twice` });
    seen.set(h, i);
  });
  for (const col of CATALOGUE_COLUMNS) {
    if (col.required && !seen.has(col.header))
      errors.push({ row: 1, column: col.header, message: `missing required column "${col.header}"` });
  }
  if (errors.length > 0) return { rows: [], errors };
  for (const e of cellErrors) errors.push({ row: e.r + 1, column: headers[e.c] || `column ${e.c + 1}`, message: e.message });

  const rows: CatalogueItem[] = [];
  const codes = new Map<string, number>();
  let dataRows = 0;
  for (let r = 1; r < cells.length; r++) {
    const raw = cells[r];
    if (isBlank(raw)) continue;
    dataRows++;
    const rowNo = r + 1;
    const row: CatalogueRow = {};
    headers.forEach((h, i) => {
      if (h !== '') row[h] = raw![i] ?? null;
    });
    const extra = raw!.slice(headers.length).some((v) => v !== null && String(v).trim() !== '');
    if (extra) errors.push({ row: rowNo, column: '', message: 'values beyond the last named column' });
    const { item, issues } = catalogueRowToItem(row);
    for (const i of issues) errors.push({ row: rowNo, column: i.column, message: i.message });
    if (item) {
      const first = codes.get(item.code);
      if (first !== undefined) errors.push({ row: rowNo, column: 'code', message: `duplicate code ${item.code} (first on row ${first})` });
      else {
        codes.set(item.code, rowNo);
        rows.push(item);
      }
    }
  }
  if (dataRows === 0) errors.push({ row: 0, column: '', message: 'the file has a header but no items' });
  return { rows, errors };
}

// --- CSV ---------------------------------------------------------------------------------------

/**
 * RFC 4180 CSV through csv-parse: quoted fields, doubled quotes, CRLF, LF or CR line ends. A quote inside an
 * unquoted field stays as text (12" rail); blank lines stay as rows so row numbers match the file. The column
 * and row limits are checked as each record is read.
 */
function readCsv(buffer: Buffer): Table {
  if (buffer[0] === 0x50 && buffer[1] === 0x4b) return { cells: [], error: 'this looks like an .xlsx workbook, not a CSV file' };
  if (buffer.includes(0)) return { cells: [], error: 'not a CSV text file (it contains binary data)' };
  let records = 0;
  try {
    const cells: CellValue[][] = parse(buffer.toString('utf8'), {
      bom: true,
      record_delimiter: ['\r\n', '\n', '\r'],
      relax_quotes: true,
      relax_column_count: true,
      on_record: (record: string[]) => {
        if (record.length > IMPORT_LIMITS.maxColumns) throw new CsvLimit(`more than ${IMPORT_LIMITS.maxColumns} columns`);
        if (++records > IMPORT_LIMITS.maxRows + 1) throw new CsvLimit(`more than ${IMPORT_LIMITS.maxRows} rows`);
        return record.map((v) => unneutraliseCsvText(v));
      },
    });
    return { cells };
  } catch (e) {
    if (e instanceof CsvLimit) return { cells: [], error: `the file has ${e.message}` };
    if (e instanceof CsvError) {
      if (e.code === 'CSV_QUOTE_NOT_CLOSED') return { cells: [], error: 'the CSV ends inside a quoted field (a closing " is missing)' };
      return { cells: [], error: `the CSV could not be read: ${e.message}` };
    }
    throw e;
  }
}

class CsvLimit extends Error {}

// --- XLSX --------------------------------------------------------------------------------------

/**
 * Inspect the zip package before exceljs inflates it: entry count, declared sizes, and each entry really
 * inflated with an output cap, so a zip bomb or a lying header is refused instead of exhausting memory.
 */
export function checkXlsxPackage(buf: Buffer): string | null {
  if (buf.length < 22 || buf.readUInt32LE(0) !== 0x04034b50) return 'not an .xlsx workbook (not a zip package)';
  let eocd = -1;
  for (let i = buf.length - 22; i >= Math.max(0, buf.length - 22 - 0xffff); i--) {
    if (buf.readUInt32LE(i) === 0x06054b50) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) return 'not an .xlsx workbook (the zip package is damaged or truncated)';
  const entries = buf.readUInt16LE(eocd + 10);
  const cdSize = buf.readUInt32LE(eocd + 12);
  const cdOffset = buf.readUInt32LE(eocd + 16);
  if (entries === 0xffff || cdOffset === 0xffffffff) return 'the workbook uses a zip64 package, which is not accepted';
  if (entries > IMPORT_LIMITS.maxZipEntries) return `the workbook has too many parts (${entries})`;
  if (cdOffset + cdSize > buf.length) return 'not an .xlsx workbook (the zip package is damaged or truncated)';
  let p = cdOffset;
  let total = 0;
  const names = new Set<string>();
  for (let n = 0; n < entries; n++) {
    if (p + 46 > buf.length || buf.readUInt32LE(p) !== 0x02014b50) return 'not an .xlsx workbook (damaged zip directory)';
    const method = buf.readUInt16LE(p + 10);
    const compSize = buf.readUInt32LE(p + 20);
    const size = buf.readUInt32LE(p + 24);
    const nameLen = buf.readUInt16LE(p + 28);
    const extraLen = buf.readUInt16LE(p + 30);
    const commentLen = buf.readUInt16LE(p + 32);
    const local = buf.readUInt32LE(p + 42);
    const name = buf.toString('utf8', p + 46, p + 46 + nameLen);
    names.add(name);
    p += 46 + nameLen + extraLen + commentLen;
    total += size;
    if (total > IMPORT_LIMITS.maxExpandedBytes)
      return `the workbook expands to more than ${IMPORT_LIMITS.maxExpandedBytes / 1024 / 1024} MB`;
    if (local + 30 > buf.length || buf.readUInt32LE(local) !== 0x04034b50) return 'not an .xlsx workbook (damaged zip entry)';
    const dataStart = local + 30 + buf.readUInt16LE(local + 26) + buf.readUInt16LE(local + 28);
    if (dataStart + compSize > buf.length) return 'not an .xlsx workbook (the zip package is truncated)';
    const data = buf.subarray(dataStart, dataStart + compSize);
    if (method === 0) {
      if (compSize !== size) return 'not an .xlsx workbook (damaged zip entry)';
    } else if (method === 8) {
      try {
        const out = inflateRawSync(data, { maxOutputLength: Math.max(1, size) });
        if (out.length !== size) return `workbook part ${name} does not match its declared size`;
      } catch {
        return `workbook part ${name} is damaged or expands beyond its declared size`;
      }
    } else return `workbook part ${name} uses an unsupported compression method`;
  }
  if (!names.has('[Content_Types].xml') || !names.has('xl/workbook.xml')) return 'not an .xlsx workbook (a zip file without a workbook)';
  return null;
}

function cellToValue(v: ExcelJS.CellValue): CellValue | { error: string } {
  if (v === null || v === undefined) return null;
  if (typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean') return v;
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  if (typeof v === 'object') {
    if ('richText' in v) return v.richText.map((t) => t.text).join('');
    if ('formula' in v || 'sharedFormula' in v) {
      const result = (v as { result?: unknown }).result;
      if (typeof result === 'string' || typeof result === 'number' || typeof result === 'boolean') return result;
      return { error: 'a formula without a value; enter the value itself' };
    }
    if ('text' in v && typeof (v as { text: unknown }).text === 'string') return (v as { text: string }).text;
    if ('error' in v) return { error: `cell error ${(v as { error: string }).error}` };
  }
  return { error: 'unreadable cell' };
}

async function readXlsx(buffer: Buffer): Promise<Table> {
  const bad = checkXlsxPackage(buffer);
  if (bad) return { cells: [], error: bad };
  const wb = new ExcelJS.Workbook();
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    await Promise.race([
      wb.xlsx.load(new Uint8Array(buffer).buffer), // exceljs types its input as an ArrayBuffer (JSZip reads either)
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error('timeout')), IMPORT_LIMITS.loadTimeoutMs);
      }),
    ]);
  } catch (e) {
    return {
      cells: [],
      error: `the workbook could not be read (${e instanceof Error && e.message === 'timeout' ? 'it took too long' : 'it is damaged or not an .xlsx file'})`,
    };
  } finally {
    if (timer) clearTimeout(timer);
  }
  const ws = wb.getWorksheet(CATALOGUE_SHEET) ?? wb.worksheets[0];
  if (!ws) return { cells: [], error: 'the workbook has no sheets' };
  if (ws.rowCount > IMPORT_LIMITS.maxRows + 1) return { cells: [], error: `the sheet has more than ${IMPORT_LIMITS.maxRows} rows` };
  if (ws.columnCount > IMPORT_LIMITS.maxColumns) return { cells: [], error: `the sheet has more than ${IMPORT_LIMITS.maxColumns} columns` };
  const cells: CellValue[][] = [];
  const cellErrors: NonNullable<Table['cellErrors']> = [];
  for (let r = 1; r <= ws.rowCount; r++) {
    const row = ws.getRow(r);
    const out: CellValue[] = [];
    for (let c = 1; c <= ws.columnCount; c++) {
      const v = cellToValue(row.getCell(c).value);
      if (v !== null && typeof v === 'object') {
        cellErrors.push({ r: r - 1, c: c - 1, message: v.error });
        out.push(null);
      } else out.push(v);
    }
    cells.push(out);
  }
  return { cells, cellErrors };
}
