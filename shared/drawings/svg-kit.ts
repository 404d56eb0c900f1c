// The drawing kit of the SVG sheets: the product's ink and copper, the font, text and line elements and
// word wrapping. Pure string building.

export const INK = '#1f2731';
export const SOFT = '#55606c';
export const LINE = '#dcd9d2';
export const COPPER = '#a8652f';
export const HEADER = '#263241';
export const WARN = '#9a6a00';
export const FONT = "Barlow, 'Barlow Semi Condensed', Arial, sans-serif";

export const esc = (s: unknown) =>
  String(s ?? '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;');
export const f1 = (n: number) => (Math.round(n * 10) / 10).toString();

export function text(
  x: number,
  y: number,
  s: string,
  o: { size?: number; anchor?: 'start' | 'middle' | 'end'; weight?: number; fill?: string; cls?: string } = {},
): string {
  return `<text x="${f1(x)}" y="${f1(y)}" font-size="${o.size ?? 10}"${o.anchor && o.anchor !== 'start' ? ` text-anchor="${o.anchor}"` : ''}${o.weight ? ` font-weight="${o.weight}"` : ''}${o.fill ? ` fill="${o.fill}"` : ''}${o.cls ? ` class="${o.cls}"` : ''}>${esc(s)}</text>`;
}
export const line = (x1: number, y1: number, x2: number, y2: number, extra = '') =>
  `<line x1="${f1(x1)}" y1="${f1(y1)}" x2="${f1(x2)}" y2="${f1(y2)}"${extra}/>`;

export const SHEET_W = 1224;

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
