// The sheet frame and title block of every drawing sheet, and sheets stacked into one document. Pure
// string building.
import type { PanelDrawings, SheetRef } from './panel-drawings';
import { COPPER, esc, FONT, HEADER, INK, line, SHEET_W, SOFT, text } from './svg-kit';

/** Frame, title block and sheet contents; height grows with the contents (at least an 11 × 17 in proportion). */
export function sheet(d: PanelDrawings, ref: SheetRef, body: string, contentHeight: number, extraClass = ''): string {
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
