// The SVG of a bucket's control circuit: rails, rung numbers, symbols, wire numbers, terminal references,
// cross-references and mechanical interlocks. Pure string building.
import type { LadderLayout } from './ladder';
import type { BucketSchematic } from './schematic-model';
import { symbol } from './svg-symbols';
import { COPPER, f1, INK, line, SOFT, text, wrap } from './svg-kit';

export const ROW_H = 48;
export const RAIL_L = 440;
export const RAIL_R = 1060;

/** The control circuit of one bucket, its top-left at (x0, y0); returns the markup and its height. */
export function ladderSvg(b: BucketSchematic, y0: number, terminalRefs: Map<string, string>): { svg: string; height: number } {
  const L: LadderLayout = b.layout;
  const cw = (RAIL_R - RAIL_L) / L.cols;
  const s = ` stroke="${INK}" stroke-width="1.3"`;
  const colX = (c: number) => RAIL_L + c * cw;
  const rowY = (r: number) => y0 + 36 + r * ROW_H;
  const out: string[] = [];
  const xrefOf = new Map(b.xrefs.map((x) => [x.device, x]));
  const bottom = rowY(L.rows - 1) + 24;
  // rails: the bucket's fused rail (from X1) and X2
  out.push(text(RAIL_L, y0 + 4, `X1 → ${b.index}CFU`, { size: 9, anchor: 'middle', weight: 600 }));
  out.push(`<rect x="${RAIL_L - 4}" y="${y0 + 8}" width="8" height="14" fill="none"${s}/>`);
  out.push(text(RAIL_L - 8, y0 + 19, `${b.index}CFU`, { size: 8, anchor: 'end', fill: SOFT }));
  out.push(text(RAIL_L + 6, y0 + 30, b.nodeWire[0]!, { size: 8, fill: COPPER, weight: 600 }));
  const railRows = L.railRows.filter((r) => r.left).map((r) => r.row);
  const lastRail = Math.max(...railRows, 0);
  out.push(line(RAIL_L, y0 + 22, RAIL_L, rowY(lastRail), s));
  out.push(text(RAIL_R, y0 + 4, 'X2', { size: 9, anchor: 'middle', weight: 600 }));
  out.push(line(RAIL_R, y0 + 8, RAIL_R, rowY(lastRail), s));
  // rung numbers
  for (let r = 0; r < L.rows; r++)
    out.push(text(RAIL_L - 30, rowY(r) + 3, String(b.firstRung + r), { size: 9, anchor: 'end', fill: SOFT, weight: 600 }));
  for (const n of L.notes)
    wrap(n.text, 30)
      .slice(0, 2)
      .forEach((c, i) => {
        out.push(text(RAIL_R + 10, rowY(n.row) - 20 + i * 9, c, { size: 7, fill: SOFT }));
      });
  // wires
  for (const w of L.wires) out.push(line(colX(w.x1), rowY(w.y1), colX(w.x2), rowY(w.y2), s));
  for (const j of L.junctions) out.push(`<circle cx="${f1(colX(j.x))}" cy="${f1(rowY(j.y))}" r="2.4"/>`);
  // wire numbers: once per node per row, at the left of the first element on that node
  const labelled = new Set<string>();
  const sorted = [...L.elements].sort((a, z) => a.row - z.row || a.col - z.col);
  for (const e of sorted) {
    const key = `${e.left}|${e.row}`;
    const shared = L.elements.filter((o) => o.left === e.left || o.right === e.left).length > 1;
    if (e.left > 1 && !labelled.has(key) && shared) {
      labelled.add(key);
      out.push(text(colX(e.col) + 2, rowY(e.row) - 3, b.nodeWire[e.left]!, { size: 8, fill: COPPER, weight: 600, cls: 'wire-no' }));
    }
  }
  for (const e of sorted) {
    const cx = colX(e.col) + cw / 2;
    const cy = rowY(e.row);
    // cell wire outside the 48-unit symbol
    if (cw > 48) out.push(line(colX(e.col), cy, cx - 24, cy, s), line(cx + 24, cy, colX(e.col + 1), cy, s));
    let xref: string | null = null;
    if (e.el.kind === 'contact' || e.el.kind === 'overload') {
      const x = xrefOf.get(e.el.device);
      if (x) xref = String(x.coilRung);
    }
    out.push(symbol(e.el, cx, cy, xref));
    if (e.el.kind === 'terminal' || e.el.kind === 'field') {
      const wires =
        e.el.kind === 'field'
          ? [b.nodeWire[e.left]!, b.nodeWire[e.right]!]
          : [
              b.nodeWire[
                e.left === e.right
                  ? e.left
                  : L.elements.some((o) => o !== e && (o.left === e.left || o.right === e.left))
                    ? e.left
                    : e.right
              ]!,
            ];
      const refs = wires.map((w) => terminalRefs.get(`${b.tag}|${w}`) ?? '?');
      out.push(
        text(cx, cy - 14 - (e.el.kind === 'field' ? 10 : 0), refs.join(' / '), {
          size: 8,
          anchor: 'middle',
          fill: COPPER,
          weight: 600,
          cls: 'tb-ref',
        }),
      );
    }
    if (e.el.kind === 'coil') {
      const x = xrefOf.get(e.el.device)!;
      const t = [x.no.length ? `NO ${x.no.join(', ')}` : '', x.nc.length ? `NC ${x.nc.join(', ')}` : ''].filter(Boolean).join('  ');
      out.push(text(RAIL_R + 10, cy + 3, `${e.el.device}: ${t || 'no contacts'}`, { size: 8, cls: 'xref' }));
    }
  }
  // mechanical interlock between interlocked coils
  for (const [a, z] of b.interlocked) {
    const ca = L.elements.find((e) => e.el.kind === 'coil' && e.el.device === a);
    const cz = L.elements.find((e) => e.el.kind === 'coil' && e.el.device === z);
    if (!ca || !cz) continue;
    const x = colX(ca.col) + cw / 2 + 16;
    out.push(line(x, rowY(ca.row) + 6, x, rowY(cz.row) - 6, ` stroke="${COPPER}" stroke-width="1.2" stroke-dasharray="4 3"`));
    out.push(
      text(x + 4, (rowY(ca.row) + rowY(cz.row)) / 2 + 3, 'MECH. INTERLOCK', { size: 7, fill: COPPER, weight: 600, cls: 'mech-interlock' }),
    );
  }
  return { svg: out.join(''), height: bottom - y0 };
}
