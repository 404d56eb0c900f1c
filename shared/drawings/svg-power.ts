// The SVG of a bucket's power circuit: protective device, contactors, overload, controllers, terminals and
// the motor, with the wire numbers. Pure string building.
import type { BucketSchematic, PowerBand } from './schematic-model';
import { COPPER, INK, line, SOFT, text, wrap } from './svg-kit';

const BAND_H = 64;
const PH = 24;

interface BandTools {
  band: PowerBand;
  y: number;
  /** stroke attributes of the band's lines */
  s: string;
  /** x of each line through the band */
  xs: number[];
  out: string[];
  mid: number;
  right: number;
  label: (t: string, sub?: string) => void;
  through: (gapTop: number, gapBottom: number) => void;
}

function bandTools(band: PowerBand, x0: number, y: number, n: number): BandTools {
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
  return { band, y, s, xs, out, mid, right, label, through };
}

/** One band of the power circuit: a device across every line, with the wire numbers below it. */
function powerBand(band: PowerBand, x0: number, y: number, n: number): string {
  const k = bandTools(band, x0, y, n);
  if (band.kind === 'pmr' || band.kind === 'star') tappedBand(k);
  else seriesBand(k);
  // wire numbers below the band
  if (band.kind !== 'terminals' && band.kind !== 'pmr')
    band.wires.forEach((w, i) => {
      k.xs[i] !== undefined &&
        k.out.push(text(k.xs[i]! - 3, y + BAND_H - 4, w, { size: 7, anchor: 'end', fill: COPPER, weight: 600, cls: 'wire-no' }));
    });
  return k.out.join('');
}

/** devices in series with the lines: breaker, fuses, contacts, overload, terminals, controllers */
function seriesBand(k: BandTools): void {
  const { band, y, s, xs, out, mid, right, label, through } = k;
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
}

/** devices tapped off the lines: the phase monitor relay and the star point of a wye-delta starter */
function tappedBand(k: BandTools): void {
  const { band, y, s, xs, out, mid, right } = k;
  switch (band.kind) {
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
  }
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
