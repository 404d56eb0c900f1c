// NEC 2023 Table 430.248, Full-Load Currents in Amperes, Single-Phase Alternating-Current Motors.
// Same values in NEC 2020. Values transcribed from memory of the published table.
// The voltages listed are rated motor voltages; the currents apply to system voltage ranges
// 110–120 and 220–240 V (table heading).

import { OutsideTableError } from '../errors';
import { formatHp, sameHp } from './hp-rows';

export const TABLE_430_248 = 'Table 430.248';

export const COLUMNS_430_248 = [115, 200, 208, 230] as const;
export type Column430248 = (typeof COLUMNS_430_248)[number];

type Row = readonly [hp: number, a115: number, a200: number, a208: number, a230: number];

export const ROWS_430_248: readonly Row[] = [
  [1 / 6, 4.4, 2.5, 2.4, 2.2],
  [1 / 4, 5.8, 3.3, 3.2, 2.9],
  [1 / 3, 7.2, 4.1, 4.0, 3.6],
  [1 / 2, 9.8, 5.6, 5.4, 4.9],
  [3 / 4, 13.8, 7.9, 7.6, 6.9],
  [1, 16, 9.2, 8.8, 8],
  [1.5, 20, 11.5, 11, 10],
  [2, 24, 13.8, 13.2, 12],
  [3, 34, 19.6, 18.7, 17],
  [5, 56, 32.2, 30.8, 28],
  [7.5, 80, 46, 44, 40],
  [10, 100, 57.5, 55, 50],
];

export function column430248(volts: number): Column430248 {
  if (volts >= 110 && volts <= 120) return 115;
  if (volts === 200) return 200;
  if (volts === 208) return 208;
  if (volts >= 220 && volts <= 240) return 230;
  throw new OutsideTableError(TABLE_430_248, `${volts} V is not a rated voltage or system range of the table`);
}

export function hpRows430248(): number[] {
  return ROWS_430_248.map((r) => r[0]);
}

export function singlePhaseFlc(hp: number, column: Column430248): number {
  const row = ROWS_430_248.find((r) => sameHp(r[0], hp));
  if (!row) throw new OutsideTableError(TABLE_430_248, `${formatHp(hp)} hp is not a row of the table`);
  return row[COLUMNS_430_248.indexOf(column) + 1] as number;
}
