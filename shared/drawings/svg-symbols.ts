// Schematic symbols of the ladder after IEEE 315 / NEMA ICS 19, drawn in the product's look. Pure string
// building.
import type { Element } from './ladder';
import { terminalOf } from './field-points';
import { COPPER, INK, line, SOFT, text } from './svg-kit';

interface SymbolTools {
  /** stroke attributes of a symbol's lines */
  s: string;
  tagAbove: (label: string) => string;
  under: (label: string) => string;
  stub: (gap: number) => string;
  termNos: () => string;
}

function symbolTools(e: Element, x: number, y: number): SymbolTools {
  const s = ` stroke="${INK}" stroke-width="1.3" fill="none"`;
  const tagAbove = (label: string) => text(x, y - 14, label, { size: 9, anchor: 'middle', weight: 600 });
  const under = (label: string) => text(x, y + 20, label, { size: 8, anchor: 'middle', fill: SOFT });
  const stub = (gap: number) => line(x - 24, y, x - gap, y, s) + line(x + gap, y, x + 24, y, s);
  const termNos = () =>
    text(x - 20, y + 10, terminalOf(e, 'left'), { size: 7, fill: SOFT }) +
    text(x + 20, y + 10, terminalOf(e, 'right'), { size: 7, anchor: 'end', fill: SOFT });
  return { s, tagAbove, under, stub, termNos };
}

/** A ladder element's symbol centred on (x, y), the rung line. */
export function symbol(e: Element, x: number, y: number, xref: string | null): string {
  // x: centre of the cell, y: rung line
  switch (e.kind) {
    case 'contact':
    case 'overload':
    case 'push':
    case 'selector':
    case 'field':
      return switchingSymbol(e, x, y, xref);
    default:
      return deviceSymbol(e, x, y);
  }
}

/** contacts, push-buttons, selector positions and field contacts */
function switchingSymbol(e: Element, x: number, y: number, xref: string | null): string {
  const { s, tagAbove, under, stub, termNos } = symbolTools(e, x, y);
  const parts: string[] = [];
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
  }
  return parts.join('');
}

/** coils, pilot lights, controller inputs, terminals and fuses */
function deviceSymbol(e: Element, x: number, y: number): string {
  const { s, tagAbove, under, stub, termNos } = symbolTools(e, x, y);
  const parts: string[] = [];
  switch (e.kind) {
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
