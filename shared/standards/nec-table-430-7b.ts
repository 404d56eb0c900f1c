// NEC 2023 Table 430.7(B), Locked-Rotor Indicating Code Letters (kilovolt-amperes per
// horsepower with locked rotor). Same values in NEC 2020. Transcribed from memory.
// Letter V is open-ended ("22.4 and up"): its max is reported equal to its min.

import { OutsideTableError } from '../errors';

export const TABLE_430_7B = 'Table 430.7(B)';

export const CODE_LETTERS = ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'J', 'K', 'L', 'M', 'N', 'P', 'R', 'S', 'T', 'U', 'V'] as const;
export type CodeLetter = (typeof CODE_LETTERS)[number];

const RANGES: Record<CodeLetter, readonly [min: number, max: number | null]> = {
  A: [0, 3.14],
  B: [3.15, 3.54],
  C: [3.55, 3.99],
  D: [4.0, 4.49],
  E: [4.5, 4.99],
  F: [5.0, 5.59],
  G: [5.6, 6.29],
  H: [6.3, 7.09],
  J: [7.1, 7.99],
  K: [8.0, 8.99],
  L: [9.0, 9.99],
  M: [10.0, 11.19],
  N: [11.2, 12.49],
  P: [12.5, 13.99],
  R: [14.0, 15.99],
  S: [16.0, 17.99],
  T: [18.0, 19.99],
  U: [20.0, 22.39],
  V: [22.4, null],
};

/** kVA per horsepower with locked rotor; `max` is null for letter V (no upper limit). */
export function lockedRotorKvaPerHp(letter: string): { min: number; max: number | null } {
  const r = (RANGES as Record<string, readonly [number, number | null] | undefined>)[letter];
  if (!r) throw new OutsideTableError(TABLE_430_7B, `"${letter}" is not a code letter of the table`);
  return { min: r[0], max: r[1] };
}
