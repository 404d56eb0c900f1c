// NEC Table 240.6(A), Standard Ampere Ratings for Fuses and Inverse Time Circuit Breakers.
// NEC 2023: the table starts at 10 A; additional standard ratings for fuses are 1, 3, 6 and 601 A.
// NEC 2020: the table starts at 15 A; additional standard ratings for fuses are 1, 3, 6, 10 and 601 A.
// Transcribed from memory of the published tables.

import { OutsideTableError } from '../errors';
import type { CodeEdition } from './code-edition';

export const TABLE_240_6A = 'Table 240.6(A)';

const COMMON = [
  15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350, 400, 450, 500, 600, 700, 800, 1000,
  1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000,
];

export type DeviceFamily = 'fuse' | 'breaker';

/** Standard ratings in ascending order for the edition and device family. */
export function standardRatings(edition: CodeEdition, family: DeviceFamily): number[] {
  const base = edition === '2023' ? [10, ...COMMON] : [...COMMON];
  const extra = family === 'fuse' ? (edition === '2023' ? [1, 3, 6, 601] : [1, 3, 6, 10, 601]) : [];
  return [...new Set([...extra, ...base])].sort((a, b) => a - b);
}

/** Smallest standard rating >= amps (430.52(C)(1) Exception 1 "next higher"). */
export function nextHigherStandard(amps: number, edition: CodeEdition, family: DeviceFamily): number {
  const r = standardRatings(edition, family).find((v) => v >= amps - 1e-9);
  if (r === undefined) throw new OutsideTableError(TABLE_240_6A, `${amps} A is above the largest standard rating`);
  return r;
}

/** Largest standard rating <= amps (430.62(A) "not greater than"). */
export function nextLowerStandard(amps: number, edition: CodeEdition, family: DeviceFamily): number {
  const list = standardRatings(edition, family);
  let best: number | undefined;
  for (const v of list) if (v <= amps + 1e-9) best = v;
  if (best === undefined) throw new OutsideTableError(TABLE_240_6A, `${amps} A is below the smallest standard rating`);
  return best;
}
