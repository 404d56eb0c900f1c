// Spreadsheet rows of the catalogue: one flat row per item, one column per field (ratings flattened).
import { z } from 'zod';
import { CatalogueItemSchema, HP_VOLTS, type CatalogueItem, type Ratings } from './catalogue-items';

export type ColumnKind = 'string' | 'number' | 'integer' | 'boolean' | 'numberList' | 'stringList';
export interface CatalogueColumn {
  /** header text in the file */
  header: string;
  kind: ColumnKind;
  /** where the value goes in a CatalogueItem */
  target:
    | { top: Exclude<keyof CatalogueItem, 'ratings'> }
    | { rating: Exclude<keyof Ratings, 'hpByVolts'> }
    | { hp: (typeof HP_VOLTS)[number] };
  required?: boolean;
  width?: number;
}

const top = (header: Exclude<keyof CatalogueItem, 'ratings'>, kind: ColumnKind, required = false, width = 10): CatalogueColumn => ({
  header,
  kind,
  target: { top: header },
  required,
  width,
});
const rating = (header: Exclude<keyof Ratings, 'hpByVolts'>, kind: ColumnKind, width = 9): CatalogueColumn => ({
  header,
  kind,
  target: { rating: header },
  width,
});

/** Column order of the catalogue .xlsx/.csv; headers are the field names. */
export const CATALOGUE_COLUMNS: CatalogueColumn[] = [
  top('code', 'string', true, 20),
  top('description', 'string', true, 48),
  top('category', 'string', true, 22),
  top('unit', 'string', true, 6),
  top('active', 'boolean', true, 8),
  top('unitCost', 'number', true, 11),
  top('labourHours', 'number', true, 11),
  top('terminations', 'integer', true, 12),
  top('leadTimeDays', 'integer', true, 12),
  top('heatLossW', 'number', true, 10),
  top('sccrKa', 'number', false, 8),
  top('outlineWidthMm', 'number', false, 10),
  top('outlineHeightMm', 'number', false, 10),
  top('outlineDepthMm', 'number', false, 10),
  top('clearanceAboveMm', 'number', false, 10),
  top('clearanceBelowMm', 'number', false, 10),
  rating('volts', 'number'),
  rating('voltsMin', 'number'),
  rating('poles', 'integer'),
  rating('coilVolts', 'number'),
  rating('nemaSize', 'string'),
  rating('amps', 'number'),
  rating('iecAc3Amps', 'number'),
  rating('iecAc4Amps', 'number'),
  ...HP_VOLTS.map((v): CatalogueColumn => ({ header: `hp@${v}`, kind: 'number', target: { hp: v }, width: 8 })),
  rating('settingMinAmps', 'number', 12),
  rating('settingMaxAmps', 'number', 12),
  rating('tripClasses', 'numberList'),
  rating('electronic', 'boolean'),
  rating('detectsPhaseLoss', 'boolean'),
  rating('detectsPhaseReversal', 'boolean'),
  rating('detectsImbalance', 'boolean'),
  rating('fuseClass', 'string'),
  rating('timeDelay', 'boolean'),
  rating('kaic', 'number'),
  rating('va', 'number'),
  rating('sealedVa', 'number'),
  rating('inrushVa', 'number'),
  rating('secondaryVolts', 'number'),
  rating('normalDutyAmps', 'number'),
  rating('heavyDutyAmps', 'number'),
  rating('inputAmps', 'number'),
  rating('wireSize', 'string'),
  rating('wireMin', 'string'),
  rating('wireMax', 'string'),
  rating('nemaType', 'string'),
  rating('nemaTypes', 'stringList'),
  rating('heightMm', 'number'),
  rating('widthMm', 'number'),
  rating('depthMm', 'number'),
  rating('cfm', 'number'),
  rating('coolingW', 'number'),
  rating('outputs', 'integer'),
  rating('kind', 'string', 14),
  rating('function', 'string', 14),
  rating('contacts', 'string'),
  rating('color', 'string'),
  rating('ohms', 'number'),
  rating('watts', 'number'),
  rating('internalBypass', 'boolean'),
  rating('builtInOverload', 'boolean'),
];
export const CATALOGUE_HEADERS = CATALOGUE_COLUMNS.map((c) => c.header);

/** A catalogue row as read from a file: header → cell value (strings, numbers, booleans or empty). */
export const CatalogueRowSchema = z.record(z.string(), z.union([z.string(), z.number(), z.boolean(), z.null()]));
export type CatalogueRow = z.infer<typeof CatalogueRowSchema>;

export interface RowIssue {
  column: string;
  message: string;
}

const LIST_SEPARATOR = '/';

function parseCell(raw: string | number | boolean | null | undefined, kind: ColumnKind): { value?: unknown; error?: string } {
  if (raw === null || raw === undefined || (typeof raw === 'string' && raw.trim() === '')) return {};
  switch (kind) {
    case 'string':
      return { value: String(raw).trim() };
    case 'number':
    case 'integer': {
      const n = typeof raw === 'number' ? raw : Number(String(raw).trim());
      if (typeof raw === 'boolean' || !Number.isFinite(n)) return { error: `"${String(raw)}" is not a number` };
      if (kind === 'integer' && !Number.isInteger(n)) return { error: `"${String(raw)}" is not a whole number` };
      return { value: n };
    }
    case 'boolean': {
      if (typeof raw === 'boolean') return { value: raw };
      const s = String(raw).trim().toLowerCase();
      if (['true', 'yes', 'y', '1'].includes(s)) return { value: true };
      if (['false', 'no', 'n', '0'].includes(s)) return { value: false };
      return { error: `"${String(raw)}" is not yes/no (true/false)` };
    }
    case 'numberList': {
      const parts = String(raw)
        .split(LIST_SEPARATOR)
        .map((p) => p.trim())
        .filter(Boolean);
      const nums = parts.map(Number);
      if (nums.some((n) => !Number.isFinite(n)))
        return { error: `"${String(raw)}" is not a list of numbers separated by "${LIST_SEPARATOR}"` };
      return { value: nums };
    }
    case 'stringList':
      return {
        value: String(raw)
          .split(LIST_SEPARATOR)
          .map((p) => p.trim())
          .filter(Boolean),
      };
  }
}

function columnOfPath(path: PropertyKey[]): string {
  if (path[0] === 'ratings') {
    if (path[1] === 'hpByVolts') return path[2] !== undefined ? `hp@${String(path[2])}` : 'hp@…';
    return String(path[1] ?? 'ratings');
  }
  return String(path[0] ?? '(row)');
}

/** Turn one flat spreadsheet row into a validated catalogue item, or the list of its problems by column. */
export function catalogueRowToItem(row: CatalogueRow): { item: CatalogueItem | null; issues: RowIssue[] } {
  const issues: RowIssue[] = [];
  const out: Record<string, unknown> = {};
  const ratings: Record<string, unknown> = {};
  const hp: Record<string, unknown> = {};
  for (const col of CATALOGUE_COLUMNS) {
    const { value, error } = parseCell(row[col.header], col.kind);
    if (error) {
      issues.push({ column: col.header, message: error });
      continue;
    }
    if (value === undefined) {
      if (col.required) issues.push({ column: col.header, message: 'required' });
      continue;
    }
    if ('top' in col.target) out[col.target.top] = value;
    else if ('rating' in col.target) ratings[col.target.rating] = value;
    else hp[col.target.hp] = value;
  }
  if (Object.keys(hp).length > 0) ratings.hpByVolts = hp;
  out.ratings = ratings;
  if (!('sccrKa' in out)) out.sccrKa = null;
  if (issues.length > 0) return { item: null, issues };
  const parsed = CatalogueItemSchema.safeParse(out);
  if (!parsed.success) {
    return {
      item: null,
      issues: parsed.error.issues.map((i) => ({ column: columnOfPath(i.path), message: i.message })),
    };
  }
  return { item: parsed.data, issues: [] };
}

/** Flatten an item into spreadsheet cells, header → value (undefined for an empty cell). */
export function catalogueItemToRow(item: CatalogueItem): Record<string, string | number | boolean | undefined> {
  const row: Record<string, string | number | boolean | undefined> = {};
  for (const col of CATALOGUE_COLUMNS) {
    let v: unknown;
    if ('top' in col.target) v = item[col.target.top];
    else if ('rating' in col.target) v = item.ratings[col.target.rating];
    else v = item.ratings.hpByVolts?.[col.target.hp];
    if (v === null || v === undefined) row[col.header] = undefined;
    else if (Array.isArray(v)) row[col.header] = v.join(LIST_SEPARATOR);
    else row[col.header] = v as string | number | boolean;
  }
  return row;
}
