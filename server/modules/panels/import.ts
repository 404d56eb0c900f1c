// Motor-list import: a template, a preview that marks each row's problems before anything is saved,
// then an all-or-nothing commit. Columns are the selection engine's input fields.
import ExcelJS from 'exceljs';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { LoadSchema, type LoadInput } from '../../../shared/schemas/load';
import { flcRefusal } from '../../../shared/calc/flc';
import { ValidationError, zodIssues } from '../../../shared/errors';
// each row's problems in plain sentences (the same error map as the forms)
import '../../../shared/plain-messages';
import { changePanel, requirePanel } from './service';
import { addLoads } from './motors';
import { recordPanelActivity } from '../activity/service';
import { loadsOf } from './repository';
import { UnsupportedFile, readSheetRows } from '../../http/sheet-rows';
import { IMPORT_COLUMNS, type Column } from './import-columns';

export const MAX_IMPORT_ROWS = 2000;
export const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

export { IMPORT_COLUMNS };

/** A column's value in a motor's answers (nested columns read their path). */
export function answerValue(answers: Record<string, unknown>, c: Column): unknown {
  if (!c.path) return answers[c.key];
  const inner = answers[c.path[0]];
  return inner && typeof inner === 'object' ? (inner as Record<string, unknown>)[c.path[1]] : undefined;
}

/** The column header for an answers path ("conductor.tempRatingC" -> "conductorTempC"). */
function columnOf(path: string): string {
  return IMPORT_COLUMNS.find((c) => (c.path ? c.path.join('.') : c.key) === path)?.header ?? path;
}

function setAnswer(answers: Record<string, unknown>, c: Column, value: unknown) {
  if (!c.path) {
    answers[c.key] = value;
    return;
  }
  const inner = (answers[c.path[0]] ??= {}) as Record<string, unknown>;
  inner[c.path[1]] = value;
}

let templateBytes: Promise<Buffer> | null = null;

/** The motor-list template for one of the actor's panels (404 for anyone else's). The workbook is
 *  the same for every panel, so it is built once per process, with a fixed date inside. */
export async function importTemplate(actor: CurrentUser, panelId: number): Promise<Buffer> {
  await requirePanel(actor, panelId);
  templateBytes ??= buildTemplate().catch((e: unknown) => {
    templateBytes = null;
    throw e;
  });
  return templateBytes;
}

async function buildTemplate(): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'Panelwright';
  wb.created = wb.modified = new Date(Date.UTC(2026, 0, 1));
  const ws = wb.addWorksheet('Motors');
  ws.columns = IMPORT_COLUMNS.map((c) => ({ header: c.header, key: c.key, width: Math.max(12, c.header.length + 2) }));
  ws.getRow(1).font = { bold: true };
  ws.views = [{ state: 'frozen', ySplit: 1 }];
  ws.addRow(Object.fromEntries(IMPORT_COLUMNS.map((c) => [c.key, c.example])));
  const help = wb.addWorksheet('Columns');
  help.columns = [
    { header: 'column', width: 24 },
    { header: 'meaning', width: 90 },
  ];
  for (const c of IMPORT_COLUMNS) help.addRow([c.header, c.note]);
  return Buffer.from(await wb.xlsx.writeBuffer());
}

export interface PreviewRow {
  row: number;
  tag: string;
  answers: LoadInput | null;
  problems: Array<{ column: string; message: string }>;
}

function toValue(c: Column, raw: string): { value?: unknown; error?: string } {
  if (raw === '') return {};
  if (c.kind === 'string') return { value: raw };
  if (c.kind === 'boolean') {
    const t = raw.toLowerCase();
    if (['yes', 'y', 'true', '1', 'x'].includes(t)) return { value: true };
    if (['no', 'n', 'false', '0', ''].includes(t)) return { value: false };
    return { error: `"${raw}" is not yes or no` };
  }
  const n = Number(raw.replace(/,/g, ''));
  if (!Number.isFinite(n)) return { error: `"${raw}" is not a number` };
  if (c.kind === 'integer' && !Number.isInteger(n)) return { error: `"${raw}" is not a whole number` };
  return { value: n };
}

async function readRows(buffer: Buffer, filename: string): Promise<string[][]> {
  const lower = filename.toLowerCase();
  const kind = lower.endsWith('.csv') ? 'csv' : lower.endsWith('.xlsx') ? 'xlsx' : null;
  if (!kind) throw new UnsupportedFile('Upload an .xlsx or .csv file');
  return readSheetRows(buffer, kind, { maxRows: MAX_IMPORT_ROWS, what: 'motors' });
}

export async function previewImport(
  buffer: Buffer,
  filename: string,
  existingTags: string[] = [],
): Promise<{ rows: PreviewRow[]; ok: boolean; columns: string[] }> {
  const raw = (await readRows(buffer, filename)).filter((r, i) => i === 0 || r.some((c) => c !== ''));
  if (raw.length < 2) throw new ValidationError('The file has no motor rows under the header', [{ path: 'file', message: 'no rows' }]);
  const header = raw[0].map((h) => h.trim());
  const unknown = header.filter((h) => h && !IMPORT_COLUMNS.some((c) => c.header.toLowerCase() === h.toLowerCase()));
  const missing = ['tag', 'supply', 'volts'].filter((h) => !header.some((x) => x.toLowerCase() === h.toLowerCase()));
  if (unknown.length || missing.length) {
    throw new ValidationError(
      `The header row does not match the template${unknown.length ? `: unknown column${unknown.length > 1 ? 's' : ''} ${unknown.join(', ')}` : ''}${missing.length ? `; missing ${missing.join(', ')}` : ''}`,
      [
        ...unknown.map((u) => ({ path: `columns.${u}`, message: 'unknown column' })),
        ...missing.map((m) => ({ path: `columns.${m}`, message: 'missing column' })),
      ],
    );
  }
  const index = header.map((h) => IMPORT_COLUMNS.find((c) => c.header.toLowerCase() === h.toLowerCase()) ?? null);
  const seen = new Set(existingTags.map((t) => t.toLowerCase()));
  const rows: PreviewRow[] = raw.slice(1).map((cells, i) => {
    const problems: PreviewRow['problems'] = [];
    const answers: Record<string, unknown> = {};
    index.forEach((c, j) => {
      if (!c) return;
      const { value, error } = toValue(c, cells[j] ?? '');
      if (error) problems.push({ column: c.header, message: error });
      else if (value !== undefined) setAnswer(answers, c, value);
    });
    const tag = String(answers.tag ?? '');
    let parsed: LoadInput | null = null;
    if (problems.length === 0) {
      const r = LoadSchema.safeParse(answers);
      const refusal = r.success ? flcRefusal(r.data) : null;
      if (refusal) problems.push({ column: columnOf(refusal.path), message: refusal.message });
      else if (r.success) parsed = answers as LoadInput;
      else for (const iss of zodIssues(r.error.issues)) problems.push({ column: columnOf(iss.path) || 'row', message: iss.message });
    }
    if (tag && seen.has(tag.toLowerCase()))
      problems.push({ column: 'tag', message: `tag ${tag} is already on the panel or earlier in the file` });
    if (tag) seen.add(tag.toLowerCase());
    return { row: i + 2, tag, answers: problems.length ? null : parsed, problems };
  });
  return { rows, ok: rows.every((r) => r.problems.length === 0), columns: header };
}

export async function panelPreview(actor: CurrentUser, panelId: number, buffer: Buffer, filename: string) {
  const p = await requirePanel(actor, panelId);
  const tags = (await loadsOf(p.id)).map((l) => l.tag);
  return previewImport(buffer, filename, tags);
}

export async function commitImport(actor: CurrentUser, panelId: number, buffer: Buffer, filename: string) {
  const preview = await panelPreview(actor, panelId, buffer, filename);
  if (!preview.ok) {
    const bad = preview.rows.filter((r) => r.problems.length);
    throw new ValidationError(
      `${bad.length} row${bad.length > 1 ? 's have' : ' has'} problems: nothing was imported`,
      bad.flatMap((r) => r.problems.map((p) => ({ path: `rows[${r.row}].${p.column}`, message: p.message }))),
    );
  }
  const answers = preview.rows.map((r) => r.answers!);
  const count = await changePanel(actor, panelId, null, `imported ${answers.length} motors`, async (p, t) => {
    const n = await addLoads(actor, answers, t, p);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'imported',
        summary: `Imported ${n} motors from ${filename}`,
      },
      t,
    );
    return n;
  });
  return { imported: count };
}
