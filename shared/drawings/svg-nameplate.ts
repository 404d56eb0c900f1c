// The SVG of the panel's nameplate label. Pure string building.
import type { NameplateResult } from '../calc/nameplate';
import { FONT, HEADER, INK, LINE, line, SOFT, text } from './svg-kit';

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
