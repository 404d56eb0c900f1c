// NEMA MG 1 Part 14, 14.35 and 14.36: three-phase induction motors on unbalanced voltages.
// Percent unbalance = 100 × (maximum deviation of a line voltage from the average) ÷ average.
// The derating factor is read from Figure 14-1 (medium motors): no derating up to 1 %, and operation
// above 5 % unbalance is not recommended. The curve points below are written from memory of the
// figure (1 % 1.00, 2 % 0.95, 3 % 0.88, 4 % 0.82, 5 % 0.75), joined by straight lines: check them
// against the published edition.

import { round2, roundHalfUp } from '../calc/round';

/** Up to this unbalance, %, the figure asks no derating; above it a drive's input is checked too (common practice). */
export const UNBALANCE_NO_DERATING_PERCENT = 1;

/** Above this unbalance, %, the figure ends: operation is not recommended and no factor is given. */
export const UNBALANCE_MAX_PERCENT = 5;

export const UNBALANCE_BASIS = 'NEMA MG 1 14.35, Figure 14-1 (curve values from memory)';

/** Percent voltage unbalance of three measured line-to-line voltages (NEMA MG 1 14.36), two decimals. */
export function percentUnbalance(v: readonly [number, number, number]): number {
  if (v.some((x) => !(x > 0))) throw new RangeError('three positive line voltages are needed');
  const avg = (v[0] + v[1] + v[2]) / 3;
  const maxDev = Math.max(...v.map((x) => Math.abs(x - avg)));
  return round2((100 * maxDev) / avg);
}

const CURVE: ReadonlyArray<readonly [number, number]> = [
  [0, 1],
  [1, 1],
  [2, 0.95],
  [3, 0.88],
  [4, 0.82],
  [5, 0.75],
];

export interface UnbalanceDerating {
  percent: number;
  /** multiply the motor's rated horsepower by this; null above 5 % (operation not recommended) */
  factor: number | null;
  basis: string;
}

/** The derating factor for a percent voltage unbalance; null beyond the figure's 5 %. */
export function unbalanceDerating(percent: number): UnbalanceDerating {
  if (!(percent >= 0)) throw new RangeError('percent unbalance must be 0 or more');
  if (percent > UNBALANCE_MAX_PERCENT) return { percent, factor: null, basis: UNBALANCE_BASIS };
  for (let i = 1; i < CURVE.length; i++) {
    const [x1, y1] = CURVE[i]!;
    const [x0, y0] = CURVE[i - 1]!;
    if (percent <= x1) {
      const f = y0 + ((y1 - y0) * (percent - x0)) / (x1 - x0);
      return { percent, factor: roundHalfUp(f, 3), basis: UNBALANCE_BASIS };
    }
  }
  return { percent, factor: CURVE[CURVE.length - 1]![1], basis: UNBALANCE_BASIS };
}

/** A motor's unbalance result in words, for the protection card and the submittal. */
export function unbalanceText(u: { percent: number; deratingFactor: number | null; deratedHp: number | null }): string {
  if (u.deratingFactor === null) return `${u.percent} %: above ${UNBALANCE_MAX_PERCENT} %, operation not recommended`;
  return `${u.percent} %: derate to ${u.deratingFactor} × rating${u.deratedHp !== null ? ` = ${u.deratedHp} hp` : ''}`;
}
