// The SVG of the supply sheet: supply, main disconnect, distribution block, control power transformer, the
// sheet list and the conductor colours. Pure string building.
import type { PanelDrawings } from './panel-drawings';
import { sheet } from './svg-sheet';
import { COPPER, INK, line, SOFT, text, wrap } from './svg-kit';

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
