// The SVG of the backplate layout sheet: each section's usable backplate drawn to a stated scale, its wire
// ducts and DIN rails, every placed part with its tag and part number, the clearances kept free above and
// below drives and soft starters, the plate's overall dimensions, a scale bar, and the parts not placed.
// Pure string building.
import type { BackplateLayout } from '../calc/layout/backplate';
import { partRects, type Rect } from '../calc/layout/layout-place';
import { NOT_ON_PLATE } from '../calc/layout/layout-units';
import { CATEGORY_LABELS, type Category } from '../schemas/catalogue';
import { BACKPLATE } from '../standards/panel-layout';
import type { PanelDrawings, SheetRef } from './panel-drawings-model';
import { COPPER, esc, f1, INK, LINE, line, SHEET_W, SOFT, text, WARN, wrap } from './svg-kit';
import { sheet } from './svg-sheet';

/** Points per mm on paper: the sheet is drawn at 72 units per inch (11 × 17 in). */
const PT_PER_MM = 72 / 25.4;
/** The scales tried, largest first (1:n). */
const SCALES = [5, 10, 15, 20, 25, 30, 40, 50] as const;
const AREA_W = SHEET_W - 80;
const AREA_H = 560;
const SECTION_GAP = 40;

/** The largest usual scale at which one section's plate fits the drawing area. */
export function layoutScale(plate: { widthMm: number; heightMm: number }): number {
  for (const n of SCALES) if ((plate.widthMm / n) * PT_PER_MM <= AREA_W && (plate.heightMm / n) * PT_PER_MM <= AREA_H) return n;
  return SCALES[SCALES.length - 1];
}

const rectSvg = (x: number, y: number, w: number, h: number, extra: string) =>
  `<rect x="${f1(x)}" y="${f1(y)}" width="${f1(w)}" height="${f1(h)}"${extra}/>`;

/** A dimension line with its text, horizontal or vertical. */
function dimension(x1: number, y1: number, x2: number, y2: number, label: string): string {
  const stroke = ` stroke="${SOFT}" stroke-width="0.6"`;
  const vertical = x1 === x2;
  const tick = (x: number, y: number) => (vertical ? line(x - 4, y, x + 4, y, stroke) : line(x, y - 4, x, y + 4, stroke));
  const mid = { x: (x1 + x2) / 2, y: (y1 + y2) / 2 };
  const t = vertical
    ? `<text x="${f1(mid.x - 5)}" y="${f1(mid.y)}" font-size="8" text-anchor="middle" fill="${SOFT}" transform="rotate(-90 ${f1(mid.x - 5)} ${f1(mid.y)})">${esc(label)}</text>`
    : text(mid.x, mid.y - 4, label, { size: 8, anchor: 'middle', fill: SOFT });
  return line(x1, y1, x2, y2, stroke) + tick(x1, y1) + tick(x2, y2) + t;
}

/** Text that fits a part: across it when wide enough, else up its side. */
function partLabel(x: number, y: number, w: number, h: number, tag: string, code: string): string {
  const size = 6.5;
  if (w >= Math.max(tag.length, code.length) * size * 0.5 + 4 && h >= 2 * size + 4) {
    return (
      text(x + w / 2, y + h / 2 - 1, tag, { size, anchor: 'middle', weight: 600 }) +
      text(x + w / 2, y + h / 2 + size, code, { size: size - 1.5, anchor: 'middle', fill: SOFT })
    );
  }
  const cx = x + w / 2 + size / 3;
  const cy = y + h / 2;
  return `<text x="${f1(cx)}" y="${f1(cy)}" font-size="${size - 1}" text-anchor="middle" font-weight="600" transform="rotate(-90 ${f1(cx)} ${f1(cy)})">${esc(h >= (tag.length + code.length + 1) * size * 0.5 ? `${tag} ${code}` : tag)}</text>`;
}

/** The sheet body of one section's plate at (ox, oy), k points per mm. */
function sectionSvg(layout: BackplateLayout, section: number, ox: number, oy: number, k: number): string {
  const p = layout.placement!;
  const { plate } = p;
  const out: string[] = [];
  const onSheet = (r: { x: number; y: number; w: number; h: number }) => [ox + r.x * k, oy + r.y * k, r.w * k, r.h * k] as const;
  out.push(rectSvg(ox, oy, plate.widthMm * k, plate.heightMm * k, ` fill="#fbfaf7" stroke="${INK}" stroke-width="1.2"`));
  for (const d of p.ducts.filter((x) => x.section === section)) {
    const [x, y, w, h] = onSheet(d);
    out.push(rectSvg(x, y, w, h, ` fill="#e4e0d6" stroke="${LINE}" stroke-width="0.5" class="pw-duct"`));
  }
  const span = { x: p.ductWidthMm, w: plate.widthMm - 2 * p.ductWidthMm };
  for (const row of p.rows.filter((r) => r.section === section)) {
    const [x, y, w, h] = onSheet({ x: span.x, y: row.railMm - BACKPLATE.railHeightMm / 2, w: span.w, h: BACKPLATE.railHeightMm });
    out.push(rectSvg(x, y, w, h, ` fill="none" stroke="${SOFT}" stroke-width="0.5" stroke-dasharray="3 2" class="pw-rail"`));
  }
  const strips: string[] = [];
  for (const placed of p.placed.filter((x) => x.rect.section === section)) {
    const u = placed.unit;
    if (u.clearanceAboveMm > 0 || u.clearanceBelowMm > 0) {
      const above: Rect = { ...placed.rect, y: placed.rect.y - u.clearanceAboveMm, h: u.clearanceAboveMm };
      const below: Rect = { ...placed.rect, y: placed.rect.y + placed.rect.h, h: u.clearanceBelowMm };
      for (const c of [above, below].filter((c) => c.h > 0)) {
        const [x, y, w, h] = onSheet(c);
        out.push(rectSvg(x, y, w, h, ` fill="none" stroke="${COPPER}" stroke-width="0.5" stroke-dasharray="2 2" class="pw-clearance"`));
        out.push(text(x + w / 2, y + h / 2 + 3, `keep clear ${c.h} mm`, { size: 5.5, anchor: 'middle', fill: COPPER }));
      }
    }
    for (const { part, rect } of partRects(placed)) {
      const [x, y, w, h] = onSheet(rect);
      out.push(
        rectSvg(
          x,
          y,
          w,
          h,
          ` fill="#fff" stroke="${INK}" stroke-width="0.7" class="pw-part" data-tag="${esc(part.tag)}" data-code="${esc(part.code)}"`,
        ),
      );
      if (u.terminal) continue;
      out.push(partLabel(x, y, w, h, part.tag, part.code));
    }
    if (u.terminal && u.strip && !strips.includes(u.strip)) {
      strips.push(u.strip);
      // strip tags above and below in turn, so narrow strips side by side keep their tags apart
      const [x, y, , h] = onSheet(placed.rect);
      out.push(text(x, strips.length % 2 ? y - 3 : y + h + 7, u.strip, { size: 6, weight: 600, cls: 'pw-strip' }));
    }
  }
  const [w, h] = [plate.widthMm * k, plate.heightMm * k];
  out.push(dimension(ox, oy - 12, ox + w, oy - 12, `${plate.widthMm} mm`));
  out.push(dimension(ox - 12, oy, ox - 12, oy + h, `${plate.heightMm} mm`));
  if (p.sections > 1) out.push(text(ox, oy + h + 14, `Section ${section} of ${p.sections}`, { size: 9, weight: 600 }));
  return out.join('');
}

/** A scale bar of 500 mm (or 200 mm at the larger scales) in 100 mm steps. */
function scaleBar(x: number, y: number, k: number, n: number): string {
  const total = n <= 10 ? 200 : 500;
  const out: string[] = [];
  for (let i = 0; i < total / 100; i++)
    out.push(rectSvg(x + i * 100 * k, y, 100 * k, 5, ` fill="${i % 2 ? '#fff' : INK}" stroke="${INK}" stroke-width="0.5"`));
  out.push(text(x, y + 15, '0', { size: 7 }), text(x + total * k, y + 15, `${total} mm`, { size: 7, anchor: 'end' }));
  out.push(text(x + total * k + 10, y + 6, `Scale 1:${n} on an 11 × 17 in sheet`, { size: 9, weight: 600 }));
  return out.join('');
}

/** Each terminal strip's blocks by part number, e.g. "TB1 3 × PW-TB-12-FT, 1 × PW-TB-12-GR". */
function terminalStrips(layout: BackplateLayout | null): string {
  const byStrip = new Map<string, Map<string, number>>();
  for (const p of layout?.placement?.placed ?? []) {
    if (!p.unit.terminal || !p.unit.strip) continue;
    const codes = byStrip.get(p.unit.strip) ?? new Map<string, number>();
    const code = p.unit.parts[0]!.code;
    codes.set(code, (codes.get(code) ?? 0) + 1);
    byStrip.set(p.unit.strip, codes);
  }
  return [...byStrip].map(([strip, codes]) => `${strip} ${[...codes].map(([code, n]) => `${n} × ${code}`).join(', ')}`).join('; ');
}

/** The backplate layout sheet. */
export function layoutSheetSvg(d: PanelDrawings, ref: SheetRef): string {
  const layout = d.layout;
  const out: string[] = [text(30, 40, 'Backplate layout', { size: 16, weight: 600 })];
  let y = 64;
  if (!layout?.enclosure || !layout.placement) {
    out.push(
      text(30, y, 'No enclosure with dimensions in the bill of materials: the backplate cannot be laid out.', { size: 11, fill: WARN }),
    );
    y += 20;
  } else {
    const e = layout.enclosure;
    const p = layout.placement;
    const n = layoutScale(p.plate);
    const k = PT_PER_MM / n;
    out.push(
      text(
        30,
        y,
        `${e.code}: ${e.heightMm} × ${e.widthMm} × ${e.depthMm} mm (H × W × D)${e.nemaType ? `, NEMA Type ${e.nemaType}` : ''}${layout.sections > 1 ? `, ${layout.sections} sections` : ''}. Usable backplate ${p.plate.widthMm} × ${p.plate.heightMm} mm (W × H) per section.`,
        { size: 10 },
      ),
    );
    y += 14;
    out.push(
      text(
        30,
        y,
        `Wire duct ${p.ductWidthMm} mm wide; ${BACKPLATE.ductGapMm} mm from duct to part; ${BACKPLATE.partGapMm} mm between parts; parts centred on 35 mm DIN rails or mounting lines (common practice). Deepest part ${p.deepestMm} mm; the enclosure is ${e.depthMm} mm deep.`,
        { size: 8.5, fill: SOFT },
      ),
    );
    y += 14;
    out.push(scaleBar(30, y, k, n));
    y += 40;
    const secW = p.plate.widthMm * k;
    const secH = p.plate.heightMm * k;
    const perLine = Math.max(1, Math.floor((AREA_W + SECTION_GAP) / (secW + SECTION_GAP)));
    for (let s = 1; s <= p.sections; s++) {
      const col = (s - 1) % perLine;
      const lineNo = Math.floor((s - 1) / perLine);
      out.push(sectionSvg(layout, s, 50 + col * (secW + SECTION_GAP), y + lineNo * (secH + 50), k));
    }
    y += Math.ceil(p.sections / perLine) * (secH + 50) + 6;
  }
  const placedText = layout ? `${layout.placedCount} parts placed.` : '';
  out.push(text(30, y, placedText, { size: 9, weight: 600 }));
  y += 14;
  if (layout && layout.unplaced.length > 0) {
    out.push(text(30, y, `Not placed (${layout.unplaced.length}):`, { size: 10, weight: 600, fill: WARN }));
    y += 13;
    for (const u of layout.unplaced) {
      out.push(
        text(40, y, `⚠ ${u.tag} ${u.code ?? CATEGORY_LABELS[u.category]} (${u.bucket}): ${u.reason}`, {
          size: 8.5,
          fill: WARN,
          cls: 'pw-unplaced',
        }),
      );
      y += 12;
    }
  }
  const legend = (layout?.placement?.placed ?? [])
    .filter((p) => !p.unit.terminal)
    .flatMap((p) => p.unit.parts.map((part) => `${part.tag} ${part.code}`))
    .join(' · ');
  if (legend) {
    for (const l of wrap(`Parts: ${legend}.`, 190)) {
      out.push(text(30, y, l, { size: 8.5, cls: 'pw-legend' }));
      y += 12;
    }
  }
  const strips = terminalStrips(layout);
  if (strips) {
    for (const l of wrap(`Terminal strips: ${strips}.`, 190)) {
      out.push(text(30, y, l, { size: 8.5 }));
      y += 12;
    }
  }
  const elsewhere = Object.entries(NOT_ON_PLATE)
    .filter(([c]) => c !== 'enclosure')
    .map(([c, where]) => `${CATEGORY_LABELS[c as Category].toLowerCase()} ${where}`)
    .join('; ');
  for (const l of wrap(`Not on the backplate: ${elsewhere}.`, 190)) {
    out.push(text(30, y, l, { size: 8, fill: SOFT }));
    y += 11;
  }
  return sheet(d, ref, out.join(''), y, 'pw-layout');
}
