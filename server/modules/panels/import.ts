// Motor-list import: a template, a preview that marks each row's problems before anything is saved,
// then an all-or-nothing commit. Columns are the selection engine's input fields.
import ExcelJS from 'exceljs';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { LoadSchema, type LoadInput } from '../../../shared/schemas/load';
import { flcRefusal } from '../../../shared/calc/flc';
import { ValidationError, zodIssues } from '../../../shared/errors';
// each row's problems in plain sentences (the same error map as the forms)
import '../../../shared/plain-messages';
import { changePanel, addLoads, requirePanel } from './service';
import { recordActivity } from '../activity/service';
import { loadsOf } from './repository';
import { UnsupportedFile, readSheetRows } from '../../http/sheet-rows';

export const MAX_IMPORT_ROWS = 2000;
export const MAX_IMPORT_BYTES = 2 * 1024 * 1024;

interface Column {
  header: string;
  key: string;
  kind: 'string' | 'number' | 'boolean' | 'integer';
  note: string;
  example: string | number | boolean;
  /** where the value sits in the answers when it is not `key` at the top (e.g. conductor.material) */
  path?: readonly [string, string];
}

export const IMPORT_COLUMNS: Column[] = [
  { header: 'tag', key: 'tag', kind: 'string', note: 'unique on the panel', example: 'P-201' },
  { header: 'description', key: 'description', kind: 'string', note: '', example: 'Backwash pump' },
  { header: 'supply', key: 'supply', kind: 'string', note: 'ac3, ac1 or dc', example: 'ac3' },
  { header: 'hp', key: 'hp', kind: 'number', note: 'or kw', example: 20 },
  { header: 'kw', key: 'kw', kind: 'number', note: 'or hp', example: '' },
  { header: 'volts', key: 'volts', kind: 'number', note: 'rated voltage', example: 460 },
  { header: 'hz', key: 'hz', kind: 'integer', note: '60 by default', example: 60 },
  { header: 'fla', key: 'fla', kind: 'number', note: 'nameplate amperes', example: 25 },
  { header: 'serviceFactor', key: 'serviceFactor', kind: 'number', note: '1.0 by default', example: 1.15 },
  { header: 'codeLetter', key: 'codeLetter', kind: 'string', note: 'NEMA code letter', example: 'G' },
  { header: 'design', key: 'design', kind: 'string', note: 'A, B, C or D', example: 'B' },
  { header: 'leads', key: 'leads', kind: 'integer', note: '3, 6, 9 or 12', example: '' },
  { header: 'connection', key: 'connection', kind: 'string', note: 'wye or delta', example: '' },
  { header: 'singlePhaseType', key: 'singlePhaseType', kind: 'string', note: 'split-phase, capacitor-start, psc, two-value-capacitor', example: '' },
  { header: 'dcField', key: 'dcField', kind: 'string', note: 'shunt, series, compound', example: '' },
  { header: 'duty', key: 'duty', kind: 'string', note: 'continuous or intermittent', example: 'continuous' },
  { header: 'reversing', key: 'reversing', kind: 'boolean', note: 'yes/no', example: 'no' },
  { header: 'jogging', key: 'jogging', kind: 'boolean', note: 'yes/no', example: 'no' },
  { header: 'speedControl', key: 'speedControl', kind: 'string', note: 'fixed or variable', example: 'fixed' },
  { header: 'turndown', key: 'turndown', kind: 'number', note: 'e.g. 10 for 10:1', example: '' },
  { header: 'torque', key: 'torque', kind: 'string', note: 'variable or constant', example: '' },
  { header: 'startingLimit', key: 'startingLimit', kind: 'string', note: 'none or reduced-inrush', example: 'none' },
  { header: 'inertia', key: 'inertia', kind: 'string', note: 'normal, high, very-high', example: 'normal' },
  { header: 'reverseRotationHazard', key: 'reverseRotationHazard', kind: 'boolean', note: 'yes/no', example: 'no' },
  { header: 'critical', key: 'critical', kind: 'boolean', note: 'yes/no', example: 'no' },
  { header: 'environment', key: 'environment', kind: 'string', note: 'indoor-dry, indoor-dusty, outdoor, washdown, corrosive, class1-div1 …', example: 'indoor-dusty' },
  { header: 'scpdType', key: 'scpdType', kind: 'string', note: 'inverse-time-breaker, instantaneous-trip-breaker, dual-element-fuse, non-time-delay-fuse', example: 'inverse-time-breaker' },
  { header: 'cableLengthFt', key: 'cableLengthFt', kind: 'number', note: 'feet', example: 80 },
  { header: 'tempRiseC', key: 'tempRiseC', kind: 'number', note: 'marked temperature rise, °C (40 or less allows 125 % overload, 430.32)', example: '' },
  { header: 'lockedRotorWithstandS', key: 'lockedRotorWithstandS', kind: 'number', note: "locked-rotor withstand (hot safe stall) time, s, from the motor maker's data: limits the trip class", example: '' },
  { header: 'energyEfficient', key: 'energyEfficient', kind: 'boolean', note: 'yes/no; Design B energy-efficient (Table 430.52 instantaneous-trip 1100 %)', example: 'no' },
  { header: 'poles', key: 'poles', kind: 'integer', note: 'even number (synchronous speed)', example: 4 },
  { header: 'rotor', key: 'rotor', kind: 'string', note: 'squirrel-cage or wound-rotor', example: 'squirrel-cage' },
  { header: 'plugging', key: 'plugging', kind: 'boolean', note: 'yes/no', example: 'no' },
  { header: 'twoSpeed', key: 'twoSpeed', kind: 'boolean', note: 'yes/no; two-speed motor', example: 'no' },
  { header: 'starterPreference', key: 'starterPreference', kind: 'string', note: 'rvss, wye-delta or part-winding (when inrush must be limited)', example: '' },
  { header: 'insideDelta', key: 'insideDelta', kind: 'boolean', note: 'yes/no; soft starter inside the delta', example: 'no' },
  { header: 'quickStop', key: 'quickStop', kind: 'boolean', note: 'yes/no; DC quick stops (dynamic braking)', example: 'no' },
  { header: 'controlScheme', key: 'controlScheme', kind: 'string', note: 'three-wire (default), two-wire or hand-off-auto', example: 'three-wire' },
  { header: 'driveInputAmps', key: 'driveInputAmps', kind: 'number', note: "the chosen drive's rated input current, A (430.122(A))", example: '' },
  { header: 'fedFrom', key: 'fedFrom', kind: 'string', note: 'a motor at another voltage than the supply: panel (a transformer or DC supply in the panel, the default) or external (a source outside the panel)', example: 'panel' },
  { header: 'conductorMaterial', key: 'conductorMaterial', kind: 'string', note: 'cu or al (cu by default)', example: 'cu', path: ['conductor', 'material'] },
  { header: 'conductorTempC', key: 'conductorTempC', kind: 'integer', note: 'insulation rating 60, 75 or 90 (75 by default)', example: 75, path: ['conductor', 'tempRatingC'] },
  { header: 'scpdOverridePercent', key: 'scpdOverridePercent', kind: 'number', note: '430.52(C)(1) Exception No. 2 limit, % (only with a reason)', example: '', path: ['scpdOverride', 'maxPercent'] },
  { header: 'scpdOverrideReason', key: 'scpdOverrideReason', kind: 'string', note: 'why the motor will not start at the normal limit', example: '', path: ['scpdOverride', 'reason'] },
];

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
  help.columns = [{ header: 'column', width: 24 }, { header: 'meaning', width: 90 }];
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

export async function previewImport(buffer: Buffer, filename: string, existingTags: string[] = []): Promise<{ rows: PreviewRow[]; ok: boolean; columns: string[] }> {
  const raw = (await readRows(buffer, filename)).filter((r, i) => i === 0 || r.some((c) => c !== ''));
  if (raw.length < 2) throw new ValidationError('The file has no motor rows under the header', [{ path: 'file', message: 'no rows' }]);
  const header = raw[0].map((h) => h.trim());
  const unknown = header.filter((h) => h && !IMPORT_COLUMNS.some((c) => c.header.toLowerCase() === h.toLowerCase()));
  const missing = ['tag', 'supply', 'volts'].filter((h) => !header.some((x) => x.toLowerCase() === h.toLowerCase()));
  if (unknown.length || missing.length) {
    throw new ValidationError(
      `The header row does not match the template${unknown.length ? `: unknown column${unknown.length > 1 ? 's' : ''} ${unknown.join(', ')}` : ''}${missing.length ? `; missing ${missing.join(', ')}` : ''}`,
      [...unknown.map((u) => ({ path: `columns.${u}`, message: 'unknown column' })), ...missing.map((m) => ({ path: `columns.${m}`, message: 'missing column' }))],
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
    if (tag && seen.has(tag.toLowerCase())) problems.push({ column: 'tag', message: `tag ${tag} is already on the panel or earlier in the file` });
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
    const n = await addLoads(actor, panelId, answers, t, p);
    await recordActivity(actor, { entity: 'panel', entityId: p.id, jobId: p.jobId, panelId: p.id, action: 'imported', summary: `Imported ${n} motors from ${filename}` }, t);
    return n;
  });
  return { imported: count };
}
