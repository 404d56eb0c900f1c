// NEC 2023 Table 430.72(B), Maximum Rating of Overcurrent Protective Device in Amperes, for motor
// control-circuit conductors (430.72(B)). Same values in NEC 2020. Transcribed from memory of the
// published table; check against the edition in force.
//   Column A: separate protection provided (430.72(B)(1)).
//   Column B: conductors within the enclosure, protected by the motor branch-circuit short-circuit and
//             ground-fault protective device (430.72(B)(2)).
//   Column C: conductors extending beyond the enclosure, so protected (430.72(B)(2)).
// Notes (from memory): 1 (column A, 14 AWG and larger) the value specified in 310.14/310.15 as
// applicable, read here as the 60 °C ampacity of Table 310.16; 2 (column B above 10 AWG) 400 % of the
// 60 °C value of Table 310.17, a table this product does not carry, so refused; 3 (column C above
// 10 AWG) 300 % of the 60 °C value of Table 310.16.

import { OutsideTableError } from '../errors';
import { ampacity310_16, type ConductorMaterial } from './nec-table-310-16';

export const TABLE_430_72B = 'Table 430.72(B)';

export type ControlColumn = 'A' | 'B' | 'C';

export const CONTROL_COLUMN_WORDS: Record<ControlColumn, string> = {
  A: 'column A, separate protection provided',
  B: 'column B, within the enclosure, protected by the branch device',
  C: 'column C, extending beyond the enclosure, protected by the branch device',
};

type Row = { A: number | 'note-1'; B: number; C: number };

const CU: Record<string, Row> = {
  '18 AWG': { A: 7, B: 25, C: 7 },
  '16 AWG': { A: 10, B: 40, C: 10 },
  '14 AWG': { A: 'note-1', B: 100, C: 45 },
  '12 AWG': { A: 'note-1', B: 120, C: 60 },
  '10 AWG': { A: 'note-1', B: 160, C: 90 },
};
const AL: Record<string, Row> = {
  '12 AWG': { A: 'note-1', B: 100, C: 45 },
  '10 AWG': { A: 'note-1', B: 140, C: 75 },
};

/** "14", "#14", "14 AWG" -> "14 AWG"; kcmil sizes keep their unit. */
export function controlConductorSize(raw: string): string {
  const t = raw.trim().replace(/^#/, '');
  if (/^\d+(\/0)?$/.test(t)) return `${t} AWG`;
  return t;
}

export interface ControlConductorLimit {
  maxAmps: number;
  basis: string;
}

/** The largest protective device for a control conductor in a column of Table 430.72(B); refuses a size or material outside it. */
export function controlConductorMaxAmps(size: string, material: ConductorMaterial, column: ControlColumn): ControlConductorLimit {
  const s = controlConductorSize(size);
  const row = (material === 'cu' ? CU : AL)[s];
  const label = `${s} ${material === 'cu' ? 'Cu' : 'Al'}`;
  if (row) {
    const v = row[column];
    if (v === 'note-1') {
      return {
        maxAmps: ampacity310_16(s, material, 60),
        basis: `NEC 2023 ${TABLE_430_72B}, ${CONTROL_COLUMN_WORDS[column]}, Note 1: ${label} at its ampacity (Table 310.16, 60 °C; from memory)`,
      };
    }
    return { maxAmps: v, basis: `NEC 2023 ${TABLE_430_72B}, ${CONTROL_COLUMN_WORDS[column]}: ${label} ${v} A (from memory)` };
  }
  // larger than 10 AWG: the table's notes
  let larger = false;
  try {
    ampacity310_16(s, material, 60);
    larger = !['18 AWG', '16 AWG', '14 AWG'].includes(s);
  } catch {
    larger = false;
  }
  if (!larger) throw new OutsideTableError(TABLE_430_72B, `${label} is not in the table`);
  if (column === 'A')
    return {
      maxAmps: ampacity310_16(s, material, 60),
      basis: `NEC 2023 ${TABLE_430_72B}, ${CONTROL_COLUMN_WORDS.A}, Note 1: ${label} at its ampacity (Table 310.16, 60 °C; from memory)`,
    };
  if (column === 'C') {
    const a = ampacity310_16(s, material, 60) * 3;
    return {
      maxAmps: a,
      basis: `NEC 2023 ${TABLE_430_72B}, ${CONTROL_COLUMN_WORDS.C}, Note 3: 300 % of the Table 310.16 60 °C ampacity of ${label} (from memory)`,
    };
  }
  throw new OutsideTableError(
    TABLE_430_72B,
    `${label} in column B takes Note 2 (400 % of Table 310.17 at 60 °C), which this product does not carry`,
  );
}
