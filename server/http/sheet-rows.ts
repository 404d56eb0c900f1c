// An uploaded table as rows of text: a .csv (RFC 4180 through csv-parse) or the first sheet of an
// .xlsx (its package checked for expansion bombs first, a formula cell taken by its value). Shared by
// the motor-list import and the combination-table import; the catalogue import keeps typed cells.
import ExcelJS from 'exceljs';
import { parse } from 'csv-parse/sync';
import { DomainError, ValidationError } from '../../shared/errors';
import { checkXlsxPackage } from '../modules/catalogue/spreadsheet';

/** 415: a file the server will not read. */
export class UnsupportedFile extends DomainError {
  constructor(message: string) {
    super('unsupported_file', message, [{ path: 'file', message }]);
  }
}

const MAX_COLUMNS = 200;

/** A cell's value as trimmed text: rich text joined, a hyperlink's text, a formula's stored result. */
export function cellText(v: unknown): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'object') {
    const o = v as { text?: unknown; result?: unknown; richText?: Array<{ text: string }>; formula?: unknown };
    if (o.richText) return o.richText.map((r) => r.text).join('');
    if (o.text !== undefined) return String(o.text);
    if (o.result !== undefined) return String(o.result);
    if (o.formula !== undefined) return '';
  }
  return String(v).trim();
}

/** The rows of an uploaded .csv or .xlsx; at most `maxRows` under the header (`what` names them in the refusal). */
export async function readSheetRows(buffer: Buffer, kind: 'xlsx' | 'csv', limits: { maxRows: number; what: string }): Promise<string[][]> {
  const tooMany = () =>
    new ValidationError(`At most ${limits.maxRows} ${limits.what} and ${MAX_COLUMNS} columns per file`, [
      { path: 'file', message: 'too many rows or columns' },
    ]);
  if (kind === 'csv') {
    const text = buffer.toString('utf8').replace(/^\uFEFF/, '');
    if (text.includes('\u0000')) throw new UnsupportedFile('The file is not a text CSV');
    let rows: string[][];
    try {
      rows = parse(text, { relax_column_count: true, trim: true, skip_empty_lines: true, to_line: limits.maxRows + 2 }) as string[][];
    } catch (err) {
      throw new ValidationError(`The CSV could not be read: ${(err as Error).message}`, [{ path: 'file', message: 'not a readable CSV' }]);
    }
    if (rows.length > limits.maxRows + 1) throw tooMany();
    return rows;
  }
  const packageProblem = checkXlsxPackage(buffer);
  if (packageProblem) throw new UnsupportedFile(`The file was refused: ${packageProblem}`);
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(new Uint8Array(buffer).buffer); // exceljs types its input as an ArrayBuffer (JSZip reads either)
  } catch {
    throw new UnsupportedFile('The workbook could not be read: save it again as .xlsx');
  }
  const ws = wb.worksheets[0];
  if (!ws) return [];
  if (ws.rowCount > limits.maxRows + 1 || ws.columnCount > MAX_COLUMNS) throw tooMany();
  const rows: string[][] = [];
  ws.eachRow({ includeEmpty: true }, (row, n) => {
    const cells: string[] = [];
    for (let i = 1; i <= ws.columnCount; i++) cells.push(cellText(row.getCell(i).value));
    rows[n - 1] = cells;
  });
  return Array.from(rows, (r) => r ?? []);
}
