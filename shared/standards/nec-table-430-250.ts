// NEC 2023 Table 430.250, Full-Load Current, Three-Phase Alternating-Current Motors
// (induction-type squirrel-cage and wound-rotor columns; the synchronous unity-power-factor
// columns are not carried). Values in amperes. Same values in NEC 2020.
// Values transcribed from memory of the published table; checked row by row against the
// worked examples in tests/unit/standards.
// The voltages listed are rated motor voltages; the currents apply to system voltage ranges
// 110–120, 220–240, 440–480 and 550–600 V (table heading). 200 V and 208 V columns stand alone.

import { OutsideTableError } from '../errors';
import { formatHp, sameHp } from './hp-rows';

export const TABLE_430_250 = 'Table 430.250';

export const COLUMNS_430_250 = [115, 200, 208, 230, 460, 575, 2300] as const;
export type Column430250 = (typeof COLUMNS_430_250)[number];

type Row = readonly [
  hp: number,
  a115: number | null,
  a200: number | null,
  a208: number | null,
  a230: number | null,
  a460: number | null,
  a575: number | null,
  a2300: number | null,
];

const _ = null;
export const ROWS_430_250: readonly Row[] = [
  [0.5, 4.4, 2.5, 2.4, 2.2, 1.1, 0.9, _],
  [0.75, 6.4, 3.7, 3.5, 3.2, 1.6, 1.3, _],
  [1, 8.4, 4.8, 4.6, 4.2, 2.1, 1.7, _],
  [1.5, 12.0, 6.9, 6.6, 6.0, 3.0, 2.4, _],
  [2, 13.6, 7.8, 7.5, 6.8, 3.4, 2.7, _],
  [3, _, 11.0, 10.6, 9.6, 4.8, 3.9, _],
  [5, _, 17.5, 16.7, 15.2, 7.6, 6.1, _],
  [7.5, _, 25.3, 24.2, 22, 11, 9, _],
  [10, _, 32.2, 30.8, 28, 14, 11, _],
  [15, _, 48.3, 46.2, 42, 21, 17, _],
  [20, _, 62.1, 59.4, 54, 27, 22, _],
  [25, _, 78.2, 74.8, 68, 34, 27, _],
  [30, _, 92, 88, 80, 40, 32, _],
  [40, _, 120, 114, 104, 52, 41, _],
  [50, _, 150, 143, 130, 65, 52, _],
  [60, _, 177, 169, 154, 77, 62, 16],
  [75, _, 221, 211, 192, 96, 77, 20],
  [100, _, 285, 273, 248, 124, 99, 26],
  [125, _, 359, 343, 312, 156, 125, 31],
  [150, _, 414, 396, 360, 180, 144, 37],
  [200, _, 552, 528, 480, 240, 192, 49],
  [250, _, _, _, _, 302, 242, 60],
  [300, _, _, _, _, 361, 289, 72],
  [350, _, _, _, _, 414, 336, 83],
  [400, _, _, _, _, 477, 382, 95],
  [450, _, _, _, _, 515, 412, 103],
  [500, _, _, _, _, 590, 472, 118],
];

/** System voltage -> table column (table heading: 110–120, 220–240, 440–480, 550–600 V). */
export function column430250(volts: number): Column430250 {
  if (volts >= 110 && volts <= 120) return 115;
  if (volts === 200) return 200;
  if (volts === 208) return 208;
  if (volts >= 220 && volts <= 240) return 230;
  if (volts >= 440 && volts <= 480) return 460;
  if (volts >= 550 && volts <= 600) return 575;
  if (volts >= 2200 && volts <= 2400) return 2300;
  throw new OutsideTableError(TABLE_430_250, `${volts} V is not a rated voltage or system range of the table`);
}

export function hpRows430250(column: Column430250): number[] {
  const i = COLUMNS_430_250.indexOf(column) + 1;
  return ROWS_430_250.filter((r) => r[i] !== null).map((r) => r[0]);
}

/** Table full-load current for a horsepower row and a table column. Throws outside the table. */
export function threePhaseFlc(hp: number, column: Column430250): number {
  const row = ROWS_430_250.find((r) => sameHp(r[0], hp));
  if (!row) throw new OutsideTableError(TABLE_430_250, `${formatHp(hp)} hp is not a row of the table`);
  const v = row[COLUMNS_430_250.indexOf(column) + 1];
  if (v === null || v === undefined) {
    throw new OutsideTableError(TABLE_430_250, `no value for ${formatHp(hp)} hp at ${column} V`);
  }
  return v;
}
