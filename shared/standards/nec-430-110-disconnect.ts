// NEC 2023 430.110(A): the ampere rating of a motor-circuit disconnecting means is at least
// 115 % of the full-load current rating of the motor; 430.109(A) (horsepower-rated switch,
// breaker or listed manual motor controller) and 430.110(C) for combined loads.
// Same clauses in NEC 2020.

import { OutsideTableError } from '../errors';

export const CLAUSE_430_110 = '430.110(A)';
export const DISCONNECT_PERCENT_OF_FLC = 115;

export function disconnectMinAmps(flcAmps: number): number {
  if (!(flcAmps > 0)) throw new OutsideTableError(CLAUSE_430_110, `full-load current must be positive (got ${flcAmps})`);
  return (flcAmps * DISCONNECT_PERCENT_OF_FLC) / 100;
}
