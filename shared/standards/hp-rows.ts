// Shared helpers for tables keyed by motor horsepower.

import { round2 } from '../calc/round';

/** Horsepower rows are matched within this tolerance so that 1/3 hp typed as 0.333 finds its row. */
const HP_TOLERANCE = 0.002;

export function sameHp(a: number, b: number): boolean {
  return Math.abs(a - b) <= HP_TOLERANCE;
}

/** "1/2", "7-1/2", "25" for display in messages. */
export function formatHp(hp: number): string {
  const whole = Math.floor(hp + 1e-9);
  const frac = hp - whole;
  const fractions: Array<[number, string]> = [
    [1 / 6, '1/6'],
    [1 / 4, '1/4'],
    [1 / 3, '1/3'],
    [1 / 2, '1/2'],
    [3 / 4, '3/4'],
  ];
  if (frac < 0.002) return String(whole);
  const f = fractions.find(([v]) => Math.abs(v - frac) < 0.002);
  if (!f) return String(round2(hp));
  return whole === 0 ? f[1] : `${whole}-${f[1]}`;
}
