// SVG sheets of the panel drawings, drawn by Panelwright's own code: sheet frame and title block in the
// product's look (Barlow, ink and copper), schematic symbols after IEEE 315 / NEMA ICS 19. Pure
// string building (no DOM), so the browser, the server and the PDF share it.
import type { PanelDrawings } from './panel-drawings';
import { RAIL_L, ladderSvg } from './svg-ladder';
import { powerSvg } from './svg-power';
import { sheet } from './svg-sheet';
import { COPPER, SOFT, text, wrap } from './svg-kit';

export { COPPER, esc, HEADER, INK, LINE, SHEET_W, SOFT, WARN, wrap } from './svg-kit';
export { ladderSvg } from './svg-ladder';
export { nameplateSvg } from './svg-nameplate';
export { powerSvg } from './svg-power';
export { stackSheets } from './svg-sheet';
export { supplySheetSvg } from './svg-supply';

export function terminalRefMap(d: PanelDrawings): Map<string, string> {
  const m = new Map<string, string>();
  for (const t of d.terminals)
    if (t.wire) m.set(`${t.bucket}|${t.wire}`, m.has(`${t.bucket}|${t.wire}`) ? `${m.get(`${t.bucket}|${t.wire}`)}` : t.ref);
  return m;
}

/** One bucket's schematic sheet. */
export function bucketSheetSvg(d: PanelDrawings, tag: string, refs: Map<string, string> = terminalRefMap(d)): string {
  const b = d.buckets.find((x) => x.tag === tag);
  if (!b) throw new RangeError(`no bucket ${tag}`);
  const ref = d.sheets.find((s) => s.tag === tag)!;
  const header = [
    text(30, 40, `${b.title}`, { size: 16, weight: 600 }),
    text(30, 56, `${b.starter} · ${b.scheme} control · bucket ${b.index} · control ${d.controlVolts} V from X1 (fused) to X2 (grounded)`, {
      size: 10,
      fill: SOFT,
    }),
    text(1194, 40, d.standard, { size: 9, anchor: 'end', fill: SOFT }),
    text(1194, 54, 'Wire numbers in copper; terminal references TBn:k; (n) rung of the coil', { size: 9, anchor: 'end', fill: SOFT }),
  ].join('');
  const power = powerSvg(b, 60, 90);
  const lad = ladderSvg(b, 90, refs);
  let ny = 90 + Math.max(lad.height + 30, 0);
  const notes: string[] = [text(RAIL_L - 40, ny, 'NOTES', { size: 10, weight: 600, fill: COPPER })];
  ny += 14;
  b.notes.forEach((nt, i) => {
    for (const [k, chunk] of wrap(nt, 120).entries()) {
      notes.push(text(RAIL_L - 40, ny, `${k === 0 ? `${i + 1}. ` : '    '}${chunk}`, { size: 9 }));
      ny += 12;
    }
  });
  ny += 10;
  notes.push(text(RAIL_L - 40, ny, 'DEVICES', { size: 10, weight: 600, fill: COPPER }));
  ny += 14;
  for (const dv of b.devices) {
    notes.push(text(RAIL_L - 40, ny, dv.tag, { size: 9, weight: 600 }), text(RAIL_L + 10, ny, dv.description, { size: 9 }));
    ny += 12;
  }
  const h = Math.max(90 + power.height, ny) + 20;
  return sheet(d, ref, header + power.svg + lad.svg + notes.join(''), h, 'pw-schematic');
}

/** Every bucket's schematic sheet, one SVG per sheet. */
export function schematicSheets(d: PanelDrawings): string[] {
  const refs = terminalRefMap(d);
  return d.buckets.map((b) => bucketSheetSvg(d, b.tag, refs));
}
