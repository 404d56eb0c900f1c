// SVG sheets of the panel drawings, drawn by Panelwright's own code: sheet frame and title block in the
// product's look (Barlow, ink and copper), schematic symbols after IEEE 315 / NEMA ICS 19. Pure
// string building (no DOM), so the browser, the server and the PDF share it.
import type { NameplateResult } from '../calc/nameplate';
import type { Element, LadderLayout } from './ladder';
import type { PanelDrawings, SheetRef } from './panel-drawings';
import type { BucketSchematic, PowerBand } from './schematic';
import { terminalOf } from './schematic';

export const INK = '#1f2731';
export const SOFT = '#55606c';
export const LINE = '#dcd9d2';
export const COPPER = '#a8652f';
export const HEADER = '#263241';
export const WARN = '#9a6a00';
const FONT = "Barlow, 'Barlow Semi Condensed', Arial, sans-serif";

export const esc = (s: unknown) =>
  String(s ?? '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;');
const f1 = (n: number) => (Math.round(n * 10) / 10).toString();

function text(
  x: number,
  y: number,
  s: string,
  o: { size?: number; anchor?: 'start' | 'middle' | 'end'; weight?: number; fill?: string; cls?: string } = {},
): string {
  return `<text x="${f1(x)}" y="${f1(y)}" font-size="${o.size ?? 10}"${o.anchor && o.anchor !== 'start' ? ` text-anchor="${o.anchor}"` : ''}${o.weight ? ` font-weight="${o.weight}"` : ''}${o.fill ? ` fill="${o.fill}"` : ''}${o.cls ? ` class="${o.cls}"` : ''}>${esc(s)}</text>`;
}
const line = (x1: number, y1: number, x2: number, y2: number, extra = '') =>
  `<line x1="${f1(x1)}" y1="${f1(y1)}" x2="${f1(x2)}" y2="${f1(y2)}"${extra}/>`;

export const SHEET_W = 1224;

/** Frame, title block and sheet contents; height grows with the contents (at least an 11 × 17 in proportion). */
function sheet(d: PanelDrawings, ref: SheetRef, body: string, contentHeight: number, extraClass = ''): string {
  const h = Math.max(792, contentHeight + 150);
  const w = SHEET_W;
  const tbW = 430;
  const tbH = 96;
  const tx = w - 20 - tbW;
  const ty = h - 20 - tbH;
  const idx = d.sheets.findIndex((s) => s.number === ref.number);
  const tb = [
    `<rect x="${tx}" y="${ty}" width="${tbW}" height="${tbH}" fill="#fff" stroke="${INK}" stroke-width="1.2"/>`,
    `<rect x="${tx}" y="${ty}" width="${tbW}" height="22" fill="${HEADER}"/>`,
    text(tx + 8, ty + 15, d.title.shop, { size: 12, weight: 600, fill: '#e8ecef' }),
    text(tx + tbW - 8, ty + 15, 'PANELWRIGHT', { size: 9, anchor: 'end', fill: '#f3dfcc', weight: 600 }),
    text(tx + 8, ty + 36, `${d.title.job}`, { size: 10 }),
    text(tx + 8, ty + 50, `Panel: ${d.title.panel}`, { size: 10 }),
    text(tx + 8, ty + 66, ref.title, { size: 12, weight: 600 }),
    line(tx, ty + 72, tx + tbW, ty + 72, ` stroke="${INK}" stroke-width="0.8"`),
    text(tx + 8, ty + 88, `Dwg ${ref.number}`, { size: 10, weight: 600 }),
    text(tx + 190, ty + 88, `Sheet ${idx + 1} of ${d.sheets.length}`, { size: 10 }),
    text(tx + 290, ty + 88, `Rev ${d.title.revision}`, { size: 10 }),
    text(tx + tbW - 8, ty + 88, d.title.date, { size: 10, anchor: 'end' }),
    text(
      28,
      h - 40,
      `${d.standard}. Generated from the stored selections and the bill of materials; a qualified person verifies the design before it is built.`,
      { size: 8, fill: SOFT },
    ),
    text(
      28,
      h - 28,
      'Local codes, the authority having jurisdiction and the equipment’s listing and instructions take precedence. De-energise and lock out before work.',
      { size: 8, fill: SOFT },
    ),
  ].join('');
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${w} ${h}" width="${w}" height="${h}" font-family="${FONT}" class="pw-sheet ${extraClass}" data-sheet="${esc(ref.number)}">` +
    `<rect width="${w}" height="${h}" fill="#fff"/>` +
    `<rect x="10" y="10" width="${w - 20}" height="${h - 20}" fill="none" stroke="${INK}" stroke-width="1.5"/>` +
    `<rect x="14" y="14" width="${w - 28}" height="${h - 28}" fill="none" stroke="${COPPER}" stroke-width="0.6"/>` +
    `<g fill="${INK}" stroke="none">${body}</g>` +
    tb +
    `</svg>`
  );
}

// ------------------------------------------------------------------------------------------ ladder

const ROW_H = 48;
const RAIL_L = 440;
const RAIL_R = 1060;

function symbol(e: Element, x: number, y: number, xref: string | null): string {
  // x: centre of the cell, y: rung line
  const s = ` stroke="${INK}" stroke-width="1.3" fill="none"`;
  const parts: string[] = [];
  const tagAbove = (label: string) => text(x, y - 14, label, { size: 9, anchor: 'middle', weight: 600 });
  const under = (label: string) => text(x, y + 20, label, { size: 8, anchor: 'middle', fill: SOFT });
  const stub = (gap: number) => line(x - 24, y, x - gap, y, s) + line(x + gap, y, x + 24, y, s);
  const termNos = () =>
    text(x - 20, y + 10, terminalOf(e, 'left'), { size: 7, fill: SOFT }) +
    text(x + 20, y + 10, terminalOf(e, 'right'), { size: 7, anchor: 'end', fill: SOFT });
  switch (e.kind) {
    case 'contact':
    case 'overload': {
      parts.push(stub(6), line(x - 6, y - 8, x - 6, y + 8, s), line(x + 6, y - 8, x + 6, y + 8, s));
      const closed = e.kind === 'overload' || e.contact === 'nc' || e.contact === 'nc-to';
      if (closed) parts.push(line(x - 10, y + 9, x + 10, y - 9, s));
      if (e.kind === 'contact' && (e.contact === 'no-tc' || e.contact === 'nc-to')) {
        // timed contact: the arc of the time-delay symbol, opening upward for "on-delay closes" (TC) / "on-delay opens" (TO)
        parts.push(`<path d="M ${x - 8} ${y - 14} Q ${x} ${e.contact === 'no-tc' ? y - 6 : y - 22} ${x + 8} ${y - 14}"${s}/>`);
      }
      parts.push(
        tagAbove(
          e.kind === 'overload' ? `${e.device} OL` : e.device + (e.contact === 'no-tc' ? ' TC' : e.contact === 'nc-to' ? ' TO' : ''),
        ),
      );
      parts.push(termNos());
      if (e.kind === 'contact' && e.label) parts.push(under(e.label + (xref ? ` (${xref})` : '')));
      else if (xref) parts.push(under(`(${xref})`));
      else if (e.kind === 'overload') parts.push(under('trip'));
      break;
    }
    case 'push': {
      const nc = e.contact === 'nc';
      parts.push(
        line(x - 24, y, x - 10, y, s),
        line(x + 10, y, x + 24, y, s),
        `<circle cx="${x - 10}" cy="${y}" r="2"${s}/>`,
        `<circle cx="${x + 10}" cy="${y}" r="2"${s}/>`,
      );
      const by = nc ? y + 4 : y - 5;
      parts.push(line(x - 12, by, x + 12, by, s), line(x, by, x, y - 12, s), line(x - 5, y - 12, x + 5, y - 12, s));
      parts.push(text(x, y - 16, `${e.device} ${e.label}`, { size: 9, anchor: 'middle', weight: 600 }), termNos());
      break;
    }
    case 'selector': {
      parts.push(
        line(x - 24, y, x - 10, y, s),
        line(x + 10, y, x + 24, y, s),
        `<circle cx="${x - 10}" cy="${y}" r="2"${s}/>`,
        `<circle cx="${x + 10}" cy="${y}" r="2"${s}/>`,
      );
      parts.push(line(x - 10, y - 4, x + 10, y - 4, s));
      parts.push(tagAbove(`${e.device} ${e.label}`), under(e.position === 'H' ? 'H: X  O: –  A: –' : 'H: –  O: –  A: X'), termNos());
      break;
    }
    case 'field': {
      parts.push(line(x - 24, y, x - 14, y, s), line(x + 14, y, x + 24, y, s));
      parts.push(
        `<circle cx="${x - 14}" cy="${y}" r="3" fill="#fff" stroke="${COPPER}" stroke-width="1.3"/>`,
        `<circle cx="${x + 14}" cy="${y}" r="3" fill="#fff" stroke="${COPPER}" stroke-width="1.3"/>`,
      );
      parts.push(
        `<rect x="${x - 10}" y="${y - 9}" width="20" height="18" fill="none" stroke="${COPPER}" stroke-dasharray="3 2" stroke-width="1"/>`,
      );
      parts.push(line(x - 6, y - 5, x - 6, y + 5, s), line(x + 6, y - 5, x + 6, y + 5, s));
      parts.push(text(x, y - 14, 'FIELD', { size: 8, anchor: 'middle', fill: COPPER, weight: 600 }), under(e.label));
      break;
    }
    case 'coil': {
      parts.push(
        stub(11),
        `<circle cx="${x}" cy="${y}" r="11"${s}/>`,
        text(x, y + 3.5, e.label, { size: 9, anchor: 'middle', weight: 600 }),
        tagAbove(e.device),
        termNos(),
      );
      break;
    }
    case 'light': {
      parts.push(stub(10), `<circle cx="${x}" cy="${y}" r="10"${s}/>`);
      for (let k = 0; k < 4; k++) {
        const a = (Math.PI / 4) * (2 * k + 1);
        parts.push(line(x + Math.cos(a) * 10, y + Math.sin(a) * 10, x + Math.cos(a) * 14, y + Math.sin(a) * 14, s));
      }
      parts.push(text(x, y + 3.5, e.colour, { size: 9, anchor: 'middle', weight: 600 }), tagAbove(e.device), under(e.label), termNos());
      break;
    }
    case 'input': {
      parts.push(
        stub(12),
        `<rect x="${x - 12}" y="${y - 8}" width="24" height="16"${s}/>`,
        text(x, y + 3, 'IN', { size: 8, anchor: 'middle' }),
        tagAbove(e.device),
        under(e.label),
      );
      break;
    }
    case 'terminal': {
      parts.push(
        line(x - 24, y, x + 24, y, s),
        `<circle cx="${x}" cy="${y}" r="3.5" fill="#fff" stroke="${COPPER}" stroke-width="1.3"/>`,
        under(e.label),
      );
      break;
    }
    case 'fuse': {
      parts.push(stub(10), `<rect x="${x - 10}" y="${y - 4}" width="20" height="8"${s}/>`, tagAbove(e.device), under(e.label));
      break;
    }
  }
  return parts.join('');
}

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

// ------------------------------------------------------------------------------------------ power

const BAND_H = 64;
const PH = 24;

function powerBand(band: PowerBand, x0: number, y: number, n: number): string {
  const s = ` stroke="${INK}" stroke-width="1.3" fill="none"`;
  const count = band.kind === 'terminals' ? Math.max(n, band.marks?.length ?? 0) : n;
  const xs = Array.from({ length: count }, (_, i) => x0 + i * PH);
  const out: string[] = [];
  const mid = y + BAND_H / 2;
  const right = xs[xs.length - 1]! + 12;
  const label = (t: string, sub?: string) =>
    out.push(text(right + 4, mid - 2, t, { size: 9, weight: 600 }), sub ? text(right + 4, mid + 10, sub, { size: 8, fill: SOFT }) : '');
  const through = (gapTop: number, gapBottom: number) =>
    xs.forEach((x) => {
      out.push(line(x, y, x, mid - gapTop, s), line(x, mid + gapBottom, x, y + BAND_H, s));
    });
  switch (band.kind) {
    case 'cb':
    case 'mcp':
      through(10, 10);
      xs.forEach((x) => {
        out.push(`<path d="M ${x} ${mid - 10} A 12 12 0 0 1 ${x} ${mid + 10}"${s}/>`);
      });
      out.push(line(xs[0]! + 6, mid, right - 6, mid, ` stroke="${INK}" stroke-dasharray="3 2"`));
      label(band.device, band.kind === 'cb' ? `breaker ${band.label}` : `MCP ${band.label}`);
      break;
    case 'fuse':
      through(10, 10);
      xs.forEach((x) => {
        out.push(`<rect x="${x - 4}" y="${mid - 10}" width="8" height="20"${s}/>`);
      });
      label(band.device, `fuses ${band.label}`);
      break;
    case 'contactor':
      through(6, 6);
      xs.forEach((x) => {
        out.push(line(x - 7, mid - 6, x + 7, mid - 6, s), line(x - 7, mid + 6, x + 7, mid + 6, s));
      });
      label(band.device, 'main contacts');
      break;
    case 'ol':
      through(10, 10);
      xs.forEach((x) => {
        out.push(`<path d="M ${x} ${mid - 10} q 6 3 0 6 q -6 3 0 6 q 6 3 0 6"${s}/>`, line(x, mid + 8, x, mid + 10, s));
      });
      label(band.device, `overload ${band.label}`);
      break;
    case 'pmr': {
      xs.forEach((x) => {
        out.push(
          line(x, y, x, y + BAND_H, s),
          `<circle cx="${x}" cy="${mid}" r="2.2" fill="${INK}"/>`,
          line(x, mid, right + 2, mid - 10 + 0 * x, ` stroke="${INK}" stroke-width="0.8"`),
        );
      });
      out.push(
        `<rect x="${right + 2}" y="${mid - 20}" width="46" height="20" fill="#fff" stroke="${INK}" stroke-width="1.2"/>`,
        text(right + 25, mid - 6, band.device, { size: 8, anchor: 'middle', weight: 600 }),
      );
      break;
    }
    case 'star': {
      xs.forEach((x) => {
        out.push(
          line(x, y, x, y + BAND_H, s),
          `<circle cx="${x}" cy="${mid - 12}" r="2.2" fill="${INK}"/>`,
          line(x, mid - 12, x + 12, mid - 12, s),
        );
      });
      // the S contacts joined at the star point
      const sx = right + 8;
      xs.forEach((x, i) => {
        out.push(
          line(x + 12, mid - 12, x + 12, mid - 2 + i * 0, s),
          line(x + 6, mid - 2, x + 18, mid - 2, s),
          line(x + 6, mid + 6, x + 18, mid + 6, s),
          line(x + 12, mid + 6, x + 12, mid + 16, s),
        );
      });
      out.push(line(xs[0]! + 12, mid + 16, xs[xs.length - 1]! + 12, mid + 16, s));
      out.push(
        text(sx + 12, mid + 2, `${band.device} star`, { size: 9, weight: 600 }),
        text(sx + 12, mid + 14, band.label, { size: 8, fill: COPPER, weight: 600, cls: 'mech-interlock' }),
      );
      break;
    }
    case 'terminals':
      xs.forEach((x, i) => {
        out.push(
          line(x, y, x, mid - 4, s),
          `<circle cx="${x}" cy="${mid}" r="4" fill="#fff" stroke="${COPPER}" stroke-width="1.3"/>`,
          line(x, mid + 4, x, y + BAND_H, ` stroke="${INK}" stroke-width="1.3" stroke-dasharray="5 3"`),
        );
        out.push(text(x, y + BAND_H - 4, band.marks?.[i] ?? '', { size: 8, anchor: 'middle', weight: 600 }));
      });
      label(band.device, 'field terminals');
      break;
    default: {
      // boxes: soft starter, drives, DC starter, filter
      xs.forEach((x) => {
        out.push(line(x, y, x, mid - 14, s), line(x, mid + 14, x, y + BAND_H, s));
      });
      out.push(
        `<rect x="${xs[0]! - 10}" y="${mid - 14}" width="${right - xs[0]! + 8}" height="28" fill="#fbf3ec" stroke="${INK}" stroke-width="1.3"/>`,
      );
      out.push(text((xs[0]! + right) / 2 - 1, mid + 3, band.kind.toUpperCase(), { size: 8, anchor: 'middle', weight: 600 }));
      label(band.device, band.label);
    }
  }
  // wire numbers below the band
  if (band.kind !== 'terminals' && band.kind !== 'pmr')
    band.wires.forEach((w, i) => {
      xs[i] !== undefined &&
        out.push(text(xs[i]! - 3, y + BAND_H - 4, w, { size: 7, anchor: 'end', fill: COPPER, weight: 600, cls: 'wire-no' }));
    });
  return out.join('');
}

export function powerSvg(b: BucketSchematic, x0: number, y0: number): { svg: string; height: number } {
  const p = b.power;
  const n = p.lines.length;
  const out: string[] = [];
  const s = ` stroke="${INK}" stroke-width="1.3" fill="none"`;
  out.push(text(x0 - 10, y0, 'POWER', { size: 10, weight: 600, fill: COPPER }));
  p.lines.forEach((l, i) => {
    out.push(text(x0 + i * PH, y0 + 16, l, { size: 8, anchor: 'middle', weight: 600 }));
  });
  let y = y0 + 20;
  for (const band of p.head) {
    out.push(powerBand(band, x0, y, n));
    y += BAND_H;
  }
  if (p.split) {
    const rx = x0 + 130;
    // bus to both columns
    const sw = p.split.swap;
    for (let i = 0; i < n; i++) {
      const xl = x0 + i * PH;
      const j = sw ? n - 1 - i : i;
      const xr = rx + j * PH;
      out.push(
        `<circle cx="${xl}" cy="${y + 6 + i * 5}" r="2.2" fill="${INK}"/>`,
        line(xl, y, xl, y + 6 + i * 5, s),
        line(xl, y + 6 + i * 5, xr, y + 6 + i * 5, s),
        line(xr, y + 6 + i * 5, xr, y + 24, s),
        line(xl, y + 6 + i * 5, xl, y + 24, s),
      );
    }
    if (sw) out.push(text(rx + n * PH + 4, y + 18, 'L1 ↔ L3', { size: 8, fill: COPPER, weight: 600 }));
    y += 24;
    let yl = y;
    let yr = y;
    for (const band of p.split.left.bands) {
      out.push(powerBand(band, x0, yl, n));
      yl += BAND_H;
    }
    for (const band of p.split.right.bands) {
      out.push(powerBand(band, rx, yr, n));
      yr += BAND_H;
    }
    if (p.split.interlock) {
      const cy = y + BAND_H / 2;
      out.push(
        line(x0 + (n - 1) * PH + 10, cy, rx - 10, cy, ` stroke="${COPPER}" stroke-width="1.2" stroke-dasharray="4 3"`),
        text((x0 + (n - 1) * PH + rx) / 2, cy - 16, 'mech. interlock', {
          size: 7,
          anchor: 'middle',
          fill: COPPER,
          weight: 600,
          cls: 'mech-interlock',
        }),
      );
    }
    y = Math.max(yl, yr);
    if (p.split.rejoin) {
      for (let i = 0; i < n; i++) {
        const xl = x0 + i * PH;
        const xr = rx + i * PH;
        out.push(
          line(xl, y, xl, y + 16, s),
          line(xr, y, xr, y + 10 + i * 2, s),
          line(xr, y + 10 + i * 2, xl, y + 10 + i * 2, s),
          `<circle cx="${xl}" cy="${y + 10 + i * 2}" r="2.2" fill="${INK}"/>`,
        );
      }
      y += 16;
    }
  }
  for (const band of p.tail) {
    out.push(powerBand(band, x0, y, n));
    y += BAND_H;
  }
  // motor
  const width = p.split && !p.split.rejoin ? 130 + n * PH : n * PH;
  const mx = x0 + width / 2 - 12;
  out.push(
    `<circle cx="${mx}" cy="${y + 30}" r="26" fill="#fff" stroke="${INK}" stroke-width="1.5"/>`,
    text(mx, y + 28, 'MTR', { size: 10, anchor: 'middle', weight: 600 }),
    text(mx, y + 40, b.tag, { size: 8, anchor: 'middle' }),
  );
  out.push(text(x0 - 10, y + 70, p.motorLabel, { size: 9, weight: 600 }));
  out.push(text(x0 - 10, y + 82, `leads ${p.motorLeads.join(' ')} (NEMA MG 1)`, { size: 8, fill: SOFT }));
  let ey = y + 100;
  for (const e of p.extras) {
    for (const chunk of wrap(e, 62)) {
      out.push(text(x0 - 10, ey, chunk, { size: 8, fill: SOFT }));
      ey += 11;
    }
  }
  return { svg: out.join(''), height: ey - y0 };
}

export function wrap(s: string, n: number): string[] {
  const words = s.split(' ');
  const out: string[] = [];
  let cur = '';
  for (const w of words) {
    if (`${cur} ${w}`.trim().length > n && cur) {
      out.push(cur);
      cur = w;
    } else cur = `${cur} ${w}`.trim();
  }
  if (cur) out.push(cur);
  return out;
}

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

/** Several sheets stacked into one SVG document (the schematic.svg download). */
export function stackSheets(sheets: string[]): string {
  let y = 0;
  const parts: string[] = [];
  for (const s of sheets) {
    const m = /viewBox="0 0 (\d+) (\d+)"/.exec(s);
    const h = m ? Number(m[2]) : 792;
    parts.push(s.replace('<svg ', `<svg x="0" y="${y}" `));
    y += h + 20;
  }
  return `<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${SHEET_W} ${Math.max(0, y - 20)}" width="${SHEET_W}" height="${Math.max(0, y - 20)}">${parts.join('')}</svg>`;
}

/** Sheet 1: supply, main device, distribution block and control power transformer. */
export function supplySheetSvg(d: PanelDrawings, mainText: string, cptText: string): string {
  const ref = d.sheets[0]!;
  const s = ` stroke="${INK}" stroke-width="1.3" fill="none"`;
  const out: string[] = [
    text(30, 40, 'Supply, main disconnect and control power', { size: 16, weight: 600 }),
    text(30, 56, `${d.supply.volts} V, ${d.supply.phases === 1 ? '1' : '3'} phase, ${d.supply.hz} Hz · control ${d.controlVolts} V`, {
      size: 10,
      fill: SOFT,
    }),
  ];
  const n = d.supply.phases === 1 ? 2 : 3;
  const x0 = 120;
  const lines = n === 2 ? ['L1', 'L2'] : ['L1', 'L2', 'L3'];
  lines.forEach((l, i) => {
    out.push(text(x0 + i * 30, 96, l, { size: 10, anchor: 'middle', weight: 600 }), line(x0 + i * 30, 100, x0 + i * 30, 330, s));
  });
  out.push(text(x0 - 16, 120, 'Supply (field)', { size: 8, anchor: 'end', fill: SOFT }));
  for (let i = 0; i < n; i++) out.push(`<path d="M ${x0 + i * 30} 150 A 14 14 0 0 1 ${x0 + i * 30} 174"${s}/>`);
  out.push(
    line(x0 + 6, 162, x0 + (n - 1) * 30 + 14, 162, ` stroke="${INK}" stroke-dasharray="3 2"`),
    text(x0 + n * 30, 160, 'MAIN', { size: 10, weight: 600 }),
    text(x0 + n * 30, 172, mainText, { size: 9, fill: SOFT }),
  );
  for (let i = 0; i < n; i++)
    out.push(text(x0 + i * 30 - 3, 200, `1${lines[i]}`, { size: 8, anchor: 'end', fill: COPPER, weight: 600, cls: 'wire-no' }));
  out.push(
    `<rect x="${x0 - 14}" y="230" width="${(n - 1) * 30 + 28}" height="26" fill="#fbf3ec" stroke="${INK}" stroke-width="1.3"/>`,
    text(x0 + n * 30, 248, 'PDB — to the branch devices of every bucket', { size: 9, weight: 600 }),
  );
  // CPT
  const cx = 520;
  out.push(
    line(x0, 290, cx, 290, s),
    line(x0 + 30, 310, cx + 60, 310, s),
    `<circle cx="${x0}" cy="290" r="2.2" fill="${INK}"/>`,
    `<circle cx="${x0 + 30}" cy="310" r="2.2" fill="${INK}"/>`,
  );
  out.push(
    line(cx, 290, cx, 340, s),
    line(cx + 60, 310, cx + 60, 340, s),
    `<rect x="${cx - 4}" y="320" width="8" height="16"${s}/>`,
    `<rect x="${cx + 56}" y="320" width="8" height="16"${s}/>`,
    text(cx + 70, 332, 'CPT-FU (primary)', { size: 8, fill: SOFT }),
  );
  out.push(
    line(cx, 336, cx, 360, s),
    line(cx + 60, 336, cx + 60, 360, s),
    text(cx - 4, 356, 'H1', { size: 8, anchor: 'end' }),
    text(cx + 64, 356, 'H2', { size: 8 }),
  );
  out.push(
    `<path d="M ${cx} 360 q 10 -8 20 0 q 10 -8 20 0 q 10 -8 20 0"${s}/>`,
    line(cx - 4, 370, cx + 64, 370, s),
    line(cx - 4, 374, cx + 64, 374, s),
    `<path d="M ${cx} 384 q 10 8 20 0 q 10 8 20 0 q 10 8 20 0"${s}/>`,
  );
  out.push(text(cx + 80, 376, `CPT ${cptText}`, { size: 10, weight: 600 }));
  out.push(
    text(cx - 4, 398, 'X1', { size: 8, anchor: 'end' }),
    text(cx + 64, 398, 'X2', { size: 8 }),
    line(cx, 384, cx, 440, s),
    line(cx + 60, 384, cx + 60, 470, s),
  );
  out.push(
    `<rect x="${cx - 4}" y="410" width="8" height="16"${s}/>`,
    text(cx - 10, 422, 'X1-FU', { size: 8, anchor: 'end', fill: SOFT }),
    text(cx + 3, 406, '15', { size: 7, fill: COPPER, weight: 600 }),
  );
  out.push(
    line(cx, 440, cx + 420, 440, s),
    text(cx + 430, 443, 'X1 → the control fuse of every bucket', { size: 9, weight: 600 }),
    text(cx + 6, 436, 'X1', { size: 8, fill: COPPER, weight: 600, cls: 'wire-no' }),
  );
  out.push(
    line(cx + 60, 470, cx + 420, 470, s),
    text(cx + 430, 473, 'X2 grounded rail', { size: 9, weight: 600 }),
    text(cx + 66, 466, 'X2', { size: 8, fill: COPPER, weight: 600, cls: 'wire-no' }),
  );
  out.push(
    line(cx + 60, 470, cx + 60, 500, s),
    line(cx + 48, 500, cx + 72, 500, s),
    line(cx + 52, 505, cx + 68, 505, s),
    line(cx + 56, 510, cx + 64, 510, s),
    text(cx + 80, 506, 'X2 bonded to the ground bar (NEC 250 / NFPA 79)', { size: 8, fill: SOFT }),
  );
  out.push(text(30, 560, 'SHEETS', { size: 10, weight: 600, fill: COPPER }));
  d.sheets.forEach((sh, i) => {
    out.push(text(30, 576 + i * 13, `${sh.number}`, { size: 9, weight: 600 }), text(200, 576 + i * 13, sh.title, { size: 9 }));
  });
  const ly = 576 + d.sheets.length * 13 + 16;
  out.push(text(30, ly, 'CONDUCTOR COLOURS', { size: 10, weight: 600, fill: COPPER }));
  wrap(d.colourPractice, 150).forEach((c, i) => {
    out.push(text(30, ly + 14 + i * 12, c, { size: 9 }));
  });
  return sheet(d, ref, out.join(''), ly + 60);
}

/** The panel's marking (NEC 409.110, UL 508A) as a label to print: 5 × 3 in at 96 units per inch. */
export function nameplateSvg(np: NameplateResult, o: { shopName?: string; drawingNumber: string; fullLoadWorking: string }): string {
  const W = 480;
  const lines = np.lines.map((l) => (l.label === 'Manufacturer' && o.shopName?.trim() ? { ...l, value: o.shopName.trim() } : l));
  if (!lines.some((l) => l.label === 'Wiring diagram'))
    lines.push({ label: 'Wiring diagram', value: o.drawingNumber, basis: 'NEC 2023 409.110(5)' });
  const H = 70 + lines.length * 24 + 56;
  const out: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${W} ${H}" width="${W}" height="${H}" font-family="${FONT}" class="pw-nameplate">`,
    `<rect x="1" y="1" width="${W - 2}" height="${H - 2}" rx="8" fill="#fff" stroke="${INK}" stroke-width="2"/>`,
    `<rect x="8" y="8" width="${W - 16}" height="38" rx="4" fill="${HEADER}"/>`,
    text(W / 2, 33, 'INDUSTRIAL CONTROL PANEL', { size: 18, anchor: 'middle', weight: 700, fill: '#e8ecef' }),
  ];
  let y = 72;
  for (const l of lines) {
    out.push(
      text(20, y, l.label.toUpperCase(), { size: 10, weight: 600, fill: SOFT }),
      text(210, y, l.value, {
        size: 14,
        weight: 700,
        fill: l.value === 'NOT ESTABLISHED' ? '#a23b2a' : INK,
        cls: `np-${l.label.toLowerCase().replace(/[^a-z]+/g, '-')}`,
      }),
    );
    out.push(line(20, y + 8, W - 20, y + 8, ` stroke="${LINE}" stroke-width="1"`));
    y += 24;
  }
  out.push(text(20, y + 6, o.fullLoadWorking, { size: 8, fill: SOFT }));
  out.push(
    text(20, y + 20, 'Marking per NEC 2023 409.110 and UL 508A. Not suitable as service equipment unless so listed and marked.', {
      size: 8,
      fill: SOFT,
    }),
  );
  out.push(text(20, y + 32, 'A qualified person verifies these values before the label is fixed.', { size: 8, fill: SOFT }));
  out.push('</svg>');
  return out.join('');
}
