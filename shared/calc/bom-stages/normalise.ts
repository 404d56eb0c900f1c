// Names as people and the engine write them, in the catalogue's words: enclosure types, conductor sizes
// (with parallel sets) and the horsepower columns a catalogue item is rated in.
import { HP_VOLTS, WIRE_SIZES } from '../../schemas/catalogue';

export type WireSize = (typeof WIRE_SIZES)[number];
type HpVolts = (typeof HP_VOLTS)[number];

/** Normalise an enclosure type as written by people ("NEMA 4x", "Type 12") to the catalogue's ("4X", "12"). */
export function normaliseEnclosureType(t: string): string {
  return t
    .toUpperCase()
    .replace(/NEMA|TYPE/g, '')
    .replace(/\s+/g, '');
}

/** Normalise a conductor size ("10 AWG", "#1/0", "250 kcmil") to the catalogue's ("10", "1/0", "250"); null if unknown. */
export function normaliseWireSize(size: string): WireSize | null {
  const s = size.replace(/awg|kcmil|mcm|#/gi, '').trim();
  return (WIRE_SIZES as readonly string[]).includes(s) ? (s as WireSize) : null;
}

/** A conductor as the engine writes it: "10 AWG", or parallel sets "3 × 350 kcmil per phase". */
export function parseConductor(text: string): { size: WireSize; sets: number } | null {
  const m = /^\s*(\d+)\s*[×x]\s*(.+?)(\s+per\s+phase)?\s*$/i.exec(text);
  const size = normaliseWireSize(m ? m[2]! : text);
  const sets = m ? Number(m[1]) : 1;
  return size && sets >= 1 ? { size, sets } : null;
}

/** The catalogue's horsepower column for a voltage, or null where the catalogue rates none at it. */
export const hpColumn = (volts: number | null): HpVolts | null =>
  volts !== null && (HP_VOLTS as readonly string[]).includes(String(volts)) ? (String(volts) as HpVolts) : null;
