// Stage 7 of the bill of materials, the diff: the change report between two bills of materials, lines
// matched by bucket and part code (unmatched lines by what they need, manual lines by description).
import type { BomCategory, BomLine } from '../../schemas/catalogue';
import { round2, round4 } from '../round';
import { extendedCost, extendedLabourHours } from './totals';

export interface DiffSide {
  quantity: number;
  unitCost: number;
  extendedCost: number;
  labourHours: number;
}
export interface DiffEntry {
  key: string;
  bucket: string;
  category: BomCategory;
  code: string | null;
  description: string;
  before: DiffSide | null;
  after: DiffSide | null;
  /** after − before, material */
  costDelta: number;
  labourHoursDelta: number;
}
export interface BomDiff {
  added: DiffEntry[];
  removed: DiffEntry[];
  changed: DiffEntry[];
  materialDelta: number;
  labourHoursDelta: number;
}

function lineKey(l: BomLine): string {
  if (l.code !== null) return `${l.bucket}|${l.code}`;
  if (l.status === 'unmatched') return `${l.bucket}|unmatched|${l.category}|${l.requiredRatings ?? ''}`;
  return `${l.bucket}|manual|${l.category}|${l.description}`;
}

function collapse(lines: readonly BomLine[]): Map<string, { line: BomLine; side: DiffSide }> {
  const m = new Map<string, { line: BomLine; side: DiffSide }>();
  for (const l of lines) {
    const k = lineKey(l);
    const e = m.get(k);
    if (e) {
      e.side.quantity = round4(e.side.quantity + l.quantity);
      e.side.extendedCost = round2(e.side.extendedCost + extendedCost(l));
      e.side.labourHours = round4(e.side.labourHours + extendedLabourHours(l));
      e.side.unitCost = e.side.quantity > 0 ? round4(e.side.extendedCost / e.side.quantity) : l.unitCost;
    } else {
      m.set(k, {
        line: l,
        side: { quantity: l.quantity, unitCost: l.unitCost, extendedCost: extendedCost(l), labourHours: extendedLabourHours(l) },
      });
    }
  }
  return m;
}

/** Change report between two bills of materials (a = before, b = after), matched by bucket and part code. */
export function diffBoms(a: readonly BomLine[], b: readonly BomLine[]): BomDiff {
  const A = collapse(a);
  const B = collapse(b);
  const added: DiffEntry[] = [];
  const removed: DiffEntry[] = [];
  const changed: DiffEntry[] = [];
  const entry = (key: string, line: BomLine, before: DiffSide | null, after: DiffSide | null): DiffEntry => ({
    key,
    bucket: line.bucket,
    category: line.category,
    code: line.code,
    description: line.description,
    before,
    after,
    costDelta: round2((after?.extendedCost ?? 0) - (before?.extendedCost ?? 0)),
    labourHoursDelta: round4((after?.labourHours ?? 0) - (before?.labourHours ?? 0)),
  });
  for (const [k, { line, side }] of A) {
    const other = B.get(k);
    if (!other) removed.push(entry(k, line, side, null));
    else if (other.side.quantity !== side.quantity || other.side.unitCost !== side.unitCost || other.side.labourHours !== side.labourHours)
      changed.push(entry(k, other.line, side, other.side));
  }
  for (const [k, { line, side }] of B) if (!A.has(k)) added.push(entry(k, line, null, side));
  const sum = (xs: DiffEntry[], f: (e: DiffEntry) => number) => xs.reduce((s, e) => s + f(e), 0);
  const all = [...added, ...removed, ...changed];
  return {
    added,
    removed,
    changed,
    materialDelta: round2(sum(all, (e) => e.costDelta)),
    labourHoursDelta: round4(sum(all, (e) => e.labourHoursDelta)),
  };
}
