// NEC 2023 Table 450.3(B), Maximum Rating or Setting of Overcurrent Protection for Transformers
// 1000 Volts and Less (as a percentage of transformer-rated current). Same rows in NEC 2020
// (where the heading reads 600 volts). Transcribed from memory of the published table.
//
//   Protection method            | Primary ≥ 9 A | Primary < 9 A | Primary < 2 A | Secondary ≥ 9 A | Secondary < 9 A
//   Primary only protection      | 125 % (Note 1)| 167 %         | 300 %         | not required    | not required
//   Primary and secondary        | 250 % (Note 3)| 250 % (Note 3)| 250 % (Note 3)| 125 % (Note 1)  | 167 %
//
// Note 1: where 125 % of the current does not correspond to a standard rating of a fuse or
// nonadjustable circuit breaker, a higher rating that does not exceed the next higher standard
// rating is permitted. Note 3 (a transformer with coordinated thermal overload protection by its
// maker) is not modelled here.

import { OutsideTableError } from '../errors';

export const TABLE_450_3B = 'Table 450.3(B)';

export type TransformerProtectionMethod = 'primary-only' | 'primary-and-secondary';

export interface Limit450 {
  /** maximum rating, % of the transformer's rated current on that side */
  percent: number;
  /** Note 1: the next higher standard rating is permitted where percent × current is not a standard rating */
  nextHigherPermitted: boolean;
  /** the table row, in the table's words */
  row: string;
}

/** The primary device limit of Table 450.3(B) for a rated primary current. */
export function primaryLimit(method: TransformerProtectionMethod, primaryAmps: number): Limit450 {
  if (!(primaryAmps > 0) || !Number.isFinite(primaryAmps))
    throw new OutsideTableError(TABLE_450_3B, `rated primary current ${primaryAmps} A is not a current`);
  if (method === 'primary-and-secondary')
    return { percent: 250, nextHigherPermitted: false, row: 'primary and secondary protection, primary' };
  if (primaryAmps >= 9) return { percent: 125, nextHigherPermitted: true, row: 'primary only protection, currents of 9 A or more' };
  if (primaryAmps >= 2) return { percent: 167, nextHigherPermitted: false, row: 'primary only protection, currents less than 9 A' };
  return { percent: 300, nextHigherPermitted: false, row: 'primary only protection, currents less than 2 A' };
}

/** The secondary device limit of Table 450.3(B) (only with primary-and-secondary protection). */
export function secondaryLimit(secondaryAmps: number): Limit450 {
  if (!(secondaryAmps > 0) || !Number.isFinite(secondaryAmps))
    throw new OutsideTableError(TABLE_450_3B, `rated secondary current ${secondaryAmps} A is not a current`);
  if (secondaryAmps >= 9) return { percent: 125, nextHigherPermitted: true, row: 'secondary, currents of 9 A or more' };
  return { percent: 167, nextHigherPermitted: false, row: 'secondary, currents less than 9 A' };
}
