// The terminal plan and the wire list as table rows and CSV (cells that a spreadsheet would read as a
// formula are quoted with a leading apostrophe). Pure TypeScript.
import type { PanelDrawings } from './panel-drawings-model';

const csvCell = (v: unknown) => {
  const s = String(v ?? '');
  return /[",\n\r]/.test(s) || /^[=+\-@]/.test(s) ? `"${(/^[=+\-@]/.test(s) ? `'${s}` : s).replace(/"/g, '""')}"` : s;
};

export const TERMINAL_COLUMNS = [
  'terminal',
  'strip',
  'number',
  'block',
  'wire',
  'purpose',
  'group',
  'panel side',
  'field side',
  'conductor',
  'colour',
  'in bill of materials',
  'bucket',
] as const;
export const WIRE_COLUMNS = ['wire', 'from', 'to', 'conductor', 'colour', 'bucket', 'sheet'] as const;

export function terminalRowsFor(d: PanelDrawings): unknown[][] {
  return d.terminals.map((t) => [
    t.ref,
    t.strip,
    t.number,
    t.block,
    t.wire,
    t.purpose,
    t.group,
    t.panelSide,
    t.field,
    t.conductor,
    t.colour,
    t.inBom ? 'yes' : 'NO',
    t.bucket,
  ]);
}
export function wireRowsFor(d: PanelDrawings): unknown[][] {
  return d.wires.map((w) => [w.wire, w.from, w.to, w.conductor, w.colour, w.bucket, w.sheet]);
}

export function toCsv(header: readonly string[], rows: unknown[][]): string {
  return `${[header, ...rows].map((r) => r.map(csvCell).join(',')).join('\r\n')}\r\n`;
}
