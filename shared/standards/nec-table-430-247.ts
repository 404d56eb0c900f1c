// NEC 2023 Table 430.247, Full-Load Current in Amperes, Direct-Current Motors.
// Same values in NEC 2020. Values transcribed from memory of the published table.
// Columns are rated armature voltages; the table gives no system ranges, so only these
// voltages are accepted.

import { OutsideTableError } from '../errors';
import { formatHp, sameHp } from './hp-rows';

export const TABLE_430_247 = 'Table 430.247';

export const COLUMNS_430_247 = [90, 120, 180, 240, 500, 550] as const;
export type Column430247 = (typeof COLUMNS_430_247)[number];

type Row = readonly [
  hp: number,
  a90: number | null,
  a120: number | null,
  a180: number | null,
  a240: number | null,
  a500: number | null,
  a550: number | null,
];

const _ = null;
export const ROWS_430_247: readonly Row[] = [
  [1 / 4, 4.0, 3.1, 2.0, 1.6, _, _],
  [1 / 3, 5.2, 4.1, 2.6, 2.0, _, _],
  [1 / 2, 6.8, 5.4, 3.4, 2.7, _, _],
  [3 / 4, 9.6, 7.6, 4.8, 3.8, _, _],
  [1, 12.2, 9.5, 6.1, 4.7, _, _],
  [1.5, _, 13.2, 8.3, 6.6, _, _],
  [2, _, 17, 10.8, 8.5, _, _],
  [3, _, 25, 16, 12.2, _, _],
  [5, _, 40, 27, 20, _, _],
  [7.5, _, 58, _, 29, 13.6, 12.2],
  [10, _, 76, _, 38, 18, 16],
  [15, _, _, _, 55, 27, 24],
  [20, _, _, _, 72, 34, 31],
  [25, _, _, _, 89, 43, 38],
  [30, _, _, _, 106, 51, 46],
  [40, _, _, _, 140, 67, 61],
  [50, _, _, _, 173, 83, 75],
  [60, _, _, _, 206, 99, 90],
  [75, _, _, _, 255, 123, 111],
  [100, _, _, _, 341, 164, 148],
  [125, _, _, _, 425, 205, 185],
  [150, _, _, _, 506, 246, 222],
  [200, _, _, _, 675, 330, 294],
];

export function column430247(volts: number): Column430247 {
  const c = COLUMNS_430_247.find((v) => v === volts);
  if (c === undefined) {
    throw new OutsideTableError(TABLE_430_247, `${volts} V is not a rated armature voltage of the table (${COLUMNS_430_247.join(', ')} V)`);
  }
  return c;
}

export function hpRows430247(column: Column430247): number[] {
  const i = COLUMNS_430_247.indexOf(column) + 1;
  return ROWS_430_247.filter((r) => r[i] !== null).map((r) => r[0]);
}

export function dcFlc(hp: number, column: Column430247): number {
  const row = ROWS_430_247.find((r) => sameHp(r[0], hp));
  if (!row) throw new OutsideTableError(TABLE_430_247, `${formatHp(hp)} hp is not a row of the table`);
  const v = row[COLUMNS_430_247.indexOf(column) + 1];
  if (v === null || v === undefined) throw new OutsideTableError(TABLE_430_247, `no value for ${formatHp(hp)} hp at ${column} V`);
  return v;
}
